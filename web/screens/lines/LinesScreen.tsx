// Start screen: the lines on this phone, a new line, and the demo line.
import { useEffect, useState } from 'preact/hooks';
import type { LineRecord } from '../../../core/records/line';
import type { UnitSystem } from '../../../core/units';
import { useData, type Loaded } from '../../app/context';
import { showTime } from '../../app/format';
import { href, navigate } from '../../app/router';
import { Badge } from '../../components/badge/Badge';
import { Button } from '../../components/button/Button';
import { Caution } from '../../components/caution/Caution';
import { TextField } from '../../components/field/TextField';
import { UnitChoice } from '../../components/unit-choice/UnitChoice';
import { AllLinesFiles } from './AllLinesFiles';
import './lines.css';

function NewLineForm({ onCancel }: { onCancel: () => void }) {
  const data = useData();
  const [name, setName] = useState('');
  const [units, setUnits] = useState<UnitSystem>('metric');
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const create = async (): Promise<void> => {
    if (name.trim() === '') {
      setError('Give the line a name, e.g. the feeder or circuit name.');
      return;
    }
    setBusy(true);
    try {
      const line = await data.save('line', { name: name.trim(), unitSystem: units });
      navigate(href('line', line.id));
    } catch (failure) {
      setError(`Could not save: ${String(failure)}`);
      setBusy(false);
    }
  };
  return (
    <form
      class="panel"
      onSubmit={(event) => {
        event.preventDefault();
        void create();
      }}
    >
      <h2>New line</h2>
      <TextField id="line-name" label="Line name" value={name} onInput={setName} error={error} />
      <UnitChoice value={units} onChange={setUnits} />
      <div class="btn-row">
        <Button look="primary" type="submit" disabled={busy}>
          Create line
        </Button>
        <Button onClick={onCancel}>Cancel</Button>
      </div>
    </form>
  );
}

export function LinesScreen() {
  const data = useData();
  const [lines, setLines] = useState<Loaded<LineRecord[]>>({ state: 'loading' });
  const [creating, setCreating] = useState(false);
  const [demoBusy, setDemoBusy] = useState(false);
  const [demoError, setDemoError] = useState<string | null>(null);
  const [generation, setGeneration] = useState(0);

  useEffect(() => {
    data
      .listLines()
      .then((value) => setLines({ state: 'ready', value }))
      .catch((error: unknown) => setLines({ state: 'failed', message: String(error) }));
  }, [data, generation]);

  const loadDemo = async (): Promise<void> => {
    setDemoBusy(true);
    try {
      // Loaded on demand: the demo (and the state-change code it uses) stays out of the first download.
      const { buildDemoLine } = await import('../../demo/demo-line');
      const demo = buildDemoLine({ now: new Date(), newId: () => crypto.randomUUID(), deviceId: 'demo' });
      await data.putAll(demo.records);
      navigate(href('line', demo.lineId));
    } catch (error) {
      setDemoError(`The demo line could not be loaded: ${String(error)}`);
      setDemoBusy(false);
    }
  };

  return (
    <section>
      <h1>Lines</h1>
      {lines.state === 'loading' && <p class="muted">Opening the lines kept on this phone…</p>}
      {lines.state === 'failed' && <p class="error-text">Storage could not be read: {lines.message}</p>}
      {lines.state === 'ready' && lines.value.length === 0 && (
        <p class="empty">
          No lines on this phone yet. Start a new line, or try the demo line to see a finished job.
        </p>
      )}
      {lines.state === 'ready' && lines.value.length > 0 && (
        <ul class="list">
          {[...lines.value]
            .sort((a, b) => b.updatedAt.localeCompare(a.updatedAt))
            .map((line) => (
              <li key={line.id}>
                <a class="line-card" href={href('line', line.id)}>
                  <span class="line-card__name">{line.name}</span>
                  <span class="line-card__meta">
                    <Badge tone="info">{line.unitSystem === 'us' ? 'US units' : 'Metric'}</Badge>
                    <span class="muted small">changed {showTime(line.updatedAt)}</span>
                  </span>
                </a>
              </li>
            ))}
        </ul>
      )}
      {creating ? (
        <NewLineForm onCancel={() => setCreating(false)} />
      ) : (
        <div class="btn-row">
          <Button look="primary" onClick={() => setCreating(true)}>
            + New line
          </Button>
          <Button onClick={() => void loadDemo()} disabled={demoBusy}>
            {demoBusy ? 'Loading demo…' : 'Try a demo line'}
          </Button>
        </div>
      )}
      {demoError && <p class="error-text">{demoError}</p>}
      {lines.state === 'ready' && (
        <AllLinesFiles lines={lines.value} onImported={() => setGeneration((value) => value + 1)} />
      )}
      {data.setAside().length > 0 && (
        <Caution title="Some stored records could not be read">
          <p>
            {data.setAside().length} stored record(s) failed their check and were set aside on this phone (not
            deleted). Everything else loaded normally. First one: {data.setAside()[0]?.kind}{' '}
            {data.setAside()[0]?.key}: {data.setAside()[0]?.issues}
          </p>
        </Caution>
      )}
    </section>
  );
}
