// New reading of one wire: pick a method, enter what was measured in the line's units, conditions and who/where.
// Every keystroke autosaves as a draft; the solved tension is previewed as soon as the figures allow.
import { useState } from 'preact/hooks';
import type { RecordSet } from '../../../core/records/kinds';
import type { MethodId } from '../../../core/types';
import { useData, useLineRecords } from '../../app/context';
import { wireGeometry } from '../../../core/records/wire-site';
import { solveMeasurement } from '../../app/derive';
import { draftKey, useDraft, type DraftHandle } from '../../app/drafts';
import { show, showTime } from '../../app/format';
import { positionFromDraft, positionToDraft } from '../../app/geolocation';
import { rememberInspector, rememberedInspector } from '../../app/prefs';
import { href, navigate } from '../../app/router';
import { Button } from '../../components/button/Button';
import { Crumbs } from '../../components/crumbs/Crumbs';
import { NumberField } from '../../components/field/NumberField';
import { TextField } from '../../components/field/TextField';
import { GpsCapture } from '../../components/gps/GpsCapture';
import { MethodPicker } from './MethodPicker';
import { methodInfo } from './methods';
import { fieldForSolverCode, readReadingForm } from './reading-form';
import { ReturnWavePanel } from './ReturnWavePanel';
import { ShotsPanel } from './ShotsPanel';
import './reading.css';

interface Props {
  lineId: string;
  spanId: string;
  wireId: string;
}

function freshReading(): Record<string, string> {
  return { method: '', inspector: rememberedInspector(), takenAt: new Date().toISOString() };
}

function ReadingForm({ records, spanId, wireId }: { records: RecordSet; spanId: string; wireId: string }) {
  const data = useData();
  const line = records.line[0]!;
  const span = records.span.find((item) => item.id === spanId)!;
  const wire = records.wire.find((item) => item.id === wireId);
  const section = records.section.find((item) => item.id === span.sectionId);
  const units = line.unitSystem;
  const draft: DraftHandle = useDraft(draftKey('reading', wireId, units), freshReading);
  const [submitted, setSubmitted] = useState(false);
  const [saveError, setSaveError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const values = draft.values;
  if (values === null) return <p class="muted">Opening the reading…</p>;

  const read = readReadingForm(values, units, submitted);
  const geometry = wireGeometry(span, wire).geometry;
  const solved =
    read.measurement && section
      ? solveMeasurement(geometry, section.conductor.weight, read.measurement)
      : undefined;
  const errors = { ...read.errors };
  if (solved && !solved.ok) {
    const field = fieldForSolverCode(solved.code, read.method);
    if (field !== undefined && errors[field] === null) errors[field] = solved.message;
  }

  if (read.method === undefined) {
    return (
      <div>
        {draft.restored && <p class="restored">Your unsaved reading was restored.</p>}
        <h2>How are you measuring?</h2>
        <MethodPicker onPick={(method: MethodId) => draft.set('method', method)} />
      </div>
    );
  }

  const info = methodInfo(read.method);
  const unitOf = (kind: Parameters<typeof show>[1]): string =>
    show(0, kind, units).split(' ').slice(1).join(' ');

  const submit = async (): Promise<void> => {
    setSubmitted(true);
    const full = readReadingForm(values, units, true);
    if (!full.complete || !full.measurement || full.conductorTemperature === undefined) {
      setSaveError('Some figures are missing or need a fix: see the messages above.');
      return;
    }
    if (!solved?.ok) {
      setSaveError('These figures do not give a wire shape: check the message beside the field.');
      return;
    }
    setBusy(true);
    try {
      const inspector = (values.inspector ?? '').trim();
      const notes = (values.notes ?? '').trim();
      const reading = await data.save('reading', {
        lineId: line.id,
        spanId: span.id,
        wireId,
        measurement: full.measurement,
        taps: full.taps,
        shots: full.shots,
        conductorTemperature: full.conductorTemperature,
        ambientTemperature: full.ambientTemperature,
        takenAt: values.takenAt ?? new Date().toISOString(),
        location: full.location,
        inspector,
        notes: notes === '' ? undefined : notes,
      });
      rememberInspector(inspector);
      await draft.discard();
      navigate(href('line', line.id, 'reading', reading.id));
    } catch (error) {
      setSaveError(`Could not save: ${String(error)}`);
      setBusy(false);
    }
  };

  return (
    <form
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        void submit();
      }}
    >
      {draft.restored && <p class="restored">Your unsaved reading was restored.</p>}
      <div class="method-head">
        <div>
          <h2>{info.title}</h2>
          <p class="method-head__what">{info.what}</p>
        </div>
        <Button look="quiet" onClick={() => draft.set('method', '')}>
          Change method
        </Button>
      </div>

      <div class="panel">
        {read.method === 'return-wave' && <ReturnWavePanel draft={draft} errors={errors} />}
        {read.method === 'surveyed-points' && (
          <ShotsPanel draft={draft} error={errors.shots ?? null} units={units} span={span.length} />
        )}
        {info.fields.length > 0 && read.method !== 'return-wave' && (
          <div class="grid-2">
            {info.fields.map((field) => (
              <NumberField
                key={field.name}
                id={`reading-${field.name}`}
                label={field.label}
                hint={field.hint}
                unit={field.integer ? undefined : unitOf(field.kind)}
                integer={field.integer}
                value={values[field.name] ?? ''}
                onInput={(text) => draft.set(field.name, text)}
                error={errors[field.name]}
              />
            ))}
          </div>
        )}
      </div>

      <div class="preview" aria-live="polite" data-testid="reading-preview">
        {solved?.ok ? (
          <>
            <span class="preview__label">Horizontal tension</span>
            <span class="preview__value" data-testid="preview-tension">
              {show(solved.solution.horizontalTension, 'tension', units)}
            </span>
            <span class="preview__label">Midspan sag</span>
            <span class="preview__value">{show(solved.solution.midspanSag, 'sag', units)}</span>
          </>
        ) : solved && !solved.ok ? (
          <span class="error-text">{solved.message}</span>
        ) : (
          <span class="muted">The tension shows here once the figures are in.</span>
        )}
        {!section && (
          <span class="error-text">
            This span's tension section is missing: the reading cannot be solved.
          </span>
        )}
      </div>
      <div class="panel">
        <h3>Conditions</h3>
        <div class="grid-2">
          <NumberField
            id="reading-conductorTemperature"
            label="Conductor temperature"
            hint="Measured on the wire or estimated for it."
            unit={unitOf('temperature')}
            value={values.conductorTemperature ?? ''}
            onInput={(text) => draft.set('conductorTemperature', text)}
            error={errors.conductorTemperature}
          />
          <NumberField
            id="reading-ambientTemperature"
            label="Air temperature (optional)"
            unit={unitOf('temperature')}
            value={values.ambientTemperature ?? ''}
            onInput={(text) => draft.set('ambientTemperature', text)}
            error={errors.ambientTemperature}
          />
        </div>
        <p>
          Time: <strong>{showTime(values.takenAt ?? new Date().toISOString())}</strong>{' '}
          <Button look="quiet" onClick={() => draft.set('takenAt', new Date().toISOString())}>
            Set to now
          </Button>
        </p>
        <GpsCapture
          label="Where the reading was taken (optional)"
          position={positionFromDraft('loc', values)}
          onCapture={(position) => draft.setMany(positionToDraft('loc', position))}
        />
        <TextField
          id="reading-inspector"
          label="Inspector"
          autoComplete="name"
          value={values.inspector ?? ''}
          onInput={(text) => draft.set('inspector', text)}
        />
        <TextField
          id="reading-notes"
          label="Notes"
          multiline
          placeholder="Wind, access, anything odd about the span"
          value={values.notes ?? ''}
          onInput={(text) => draft.set('notes', text)}
        />
      </div>

      {saveError && (
        <p class="error-text" role="alert">
          {saveError}
        </p>
      )}
      <Button look="primary" wide type="submit" disabled={busy}>
        Save reading
      </Button>
    </form>
  );
}

export function ReadingScreen({ lineId, spanId, wireId }: Props) {
  const [loaded] = useLineRecords(lineId);
  if (loaded.state === 'loading') return <p class="muted">Opening the span…</p>;
  if (loaded.state === 'failed')
    return <p class="error-text">This line could not be read: {loaded.message}</p>;
  const records = loaded.value;
  const line = records?.line[0];
  const span = records?.span.find((item) => item.id === spanId);
  const wire = records?.wire.find((item) => item.id === wireId);
  if (!records || !line || !span || !wire) {
    return (
      <p class="empty">
        This wire is not on this phone. <a href={href('line', lineId)}>Back to the line</a>
      </p>
    );
  }
  const label = (id: string): string => records.structure.find((item) => item.id === id)?.label ?? '?';
  const spanName = `Span ${label(span.nearStructureId)} → ${label(span.farStructureId)}`;
  return (
    <section>
      <Crumbs
        items={[
          { label: 'Lines', to: href() },
          { label: line.name, to: href('line', line.id) },
          { label: spanName, to: href('line', line.id, 'span', span.id) },
        ]}
      />
      <h1>
        New reading: wire {wire.label}, {spanName}
      </h1>
      <ReadingForm records={records} spanId={spanId} wireId={wireId} />
    </section>
  );
}
