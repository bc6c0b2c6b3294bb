// Line settings: name, owner, unit system (entry and display only: storage stays SI), notes; remove the line.
import { useState } from 'preact/hooks';
import type { LineRecord } from '../../../core/records/line';
import type { UnitSystem } from '../../../core/units';
import { useData, useLineRecords } from '../../app/context';
import { href, navigate } from '../../app/router';
import { Button } from '../../components/button/Button';
import { Crumbs } from '../../components/crumbs/Crumbs';
import { TextField } from '../../components/field/TextField';
import { UnitChoice } from '../../components/unit-choice/UnitChoice';

function SettingsForm({ line }: { line: LineRecord }) {
  const data = useData();
  const [name, setName] = useState(line.name);
  const [owner, setOwner] = useState(line.owner ?? '');
  const [notes, setNotes] = useState(line.notes ?? '');
  const [units, setUnits] = useState<UnitSystem>(line.unitSystem);
  const [error, setError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const [confirmRemove, setConfirmRemove] = useState(false);

  const save = async (): Promise<void> => {
    if (name.trim() === '') {
      setError('The line needs a name.');
      return;
    }
    await data.save('line', {
      ...line,
      name: name.trim(),
      unitSystem: units,
      owner: owner.trim() === '' ? undefined : owner.trim(),
      notes: notes.trim() === '' ? undefined : notes.trim(),
    });
    setError(null);
    setSaved(true);
  };

  return (
    <>
      <form
        class="panel"
        onSubmit={(event) => {
          event.preventDefault();
          void save();
        }}
      >
        <TextField
          id="line-name"
          label="Line name"
          value={name}
          onInput={(text) => (setName(text), setSaved(false))}
          error={error}
        />
        <TextField
          id="line-owner"
          label="Owner (optional)"
          value={owner}
          onInput={(text) => (setOwner(text), setSaved(false))}
        />
        <UnitChoice value={units} onChange={(value) => (setUnits(value), setSaved(false))} />
        <p class="muted small">
          Units change how figures are typed and shown. Stored values do not change: switching back and forth
          loses nothing.
        </p>
        <TextField
          id="line-notes"
          label="Notes"
          multiline
          value={notes}
          onInput={(text) => (setNotes(text), setSaved(false))}
        />
        <div class="btn-row">
          <Button look="primary" type="submit">
            Save settings
          </Button>
          {saved && (
            <span role="status" class="value small">
              Saved.
            </span>
          )}
        </div>
      </form>
      <div class="btn-row">
        {confirmRemove ? (
          <>
            <Button
              look="danger"
              onClick={() => void data.remove('line', line.id).then(() => navigate(href()))}
            >
              Yes, remove “{line.name}”
            </Button>
            <Button onClick={() => setConfirmRemove(false)}>Keep it</Button>
          </>
        ) : (
          <Button look="danger" onClick={() => setConfirmRemove(true)}>
            Remove this line
          </Button>
        )}
      </div>
    </>
  );
}

export function LineSettingsScreen({ lineId }: { lineId: string }) {
  const [loaded] = useLineRecords(lineId);
  if (loaded.state === 'loading') return <p class="muted">Opening the line…</p>;
  if (loaded.state === 'failed')
    return <p class="error-text">This line could not be read: {loaded.message}</p>;
  const line = loaded.value?.line[0];
  if (!line) return <p class="empty">This line is not on this phone.</p>;
  return (
    <section>
      <Crumbs
        items={[
          { label: 'Lines', to: href() },
          { label: line.name, to: href('line', line.id) },
        ]}
      />
      <h1>Line settings</h1>
      <SettingsForm key={line.id} line={line} />
    </section>
  );
}
