// Span geometry (length, attachment elevations or heights plus ground, rise derived, GPS per structure) and, for a
// saved span, its wire positions with their readings.
import { useState } from 'preact/hooks';
import type { RecordSet } from '../../../core/records/kinds';
import type { LineRecord } from '../../../core/records/line';
import type { SpanRecord } from '../../../core/records/span';
import type { StructureRecord } from '../../../core/records/structure';
import { useData, useLineRecords } from '../../app/context';
import type { AppData } from '../../app/data';
import { draftKey, useDraft, type DraftHandle } from '../../app/drafts';
import { show } from '../../app/format';
import { positionFromDraft, positionToDraft } from '../../app/geolocation';
import { href, navigate } from '../../app/router';
import { Button } from '../../components/button/Button';
import { ModeChoice } from '../../components/mode-choice/ModeChoice';
import { Crumbs } from '../../components/crumbs/Crumbs';
import { NumberField } from '../../components/field/NumberField';
import { TextField } from '../../components/field/TextField';
import { GpsCapture } from '../../components/gps/GpsCapture';
import { readSpanForm, spanDraftStart, spanFormComplete, type SpanFormRead } from './span-form';
import { WireList } from './WireList';
import './span.css';

interface Found {
  line: LineRecord;
  records: RecordSet;
  span: SpanRecord | undefined;
  sectionId: string;
}

async function structureFor(
  data: AppData,
  records: RecordSet,
  label: string,
  order: number,
  changes: Partial<StructureRecord>,
): Promise<StructureRecord> {
  const existing = records.structure.find((structure) => structure.label === label);
  const base = existing ?? { lineId: records.line[0]!.id, label, order };
  const merged = { ...base, ...changes };
  const unchanged = existing !== undefined && JSON.stringify(merged) === JSON.stringify(existing);
  return unchanged ? existing : data.save('structure', merged);
}

async function saveSpan(
  data: AppData,
  found: Found,
  draft: DraftHandle,
  read: SpanFormRead,
): Promise<string> {
  const values = draft.values ?? {};
  const { records, span, sectionId } = found;
  const heights = values.mode === 'heights';
  const maxOrder = records.structure.reduce((max, structure) => Math.max(max, structure.order), 0);
  const nearPosition = positionFromDraft('near', values);
  const farPosition = positionFromDraft('far', values);
  const near = await structureFor(data, records, (values.nearLabel ?? '').trim(), maxOrder + 1, {
    ...(nearPosition ? { position: nearPosition } : {}),
    ...(heights ? { groundElevation: read.nearGround.value, attachmentHeight: read.nearHeight.value } : {}),
  });
  const far = await structureFor(data, records, (values.farLabel ?? '').trim(), near.order + 1, {
    ...(farPosition ? { position: farPosition } : {}),
    ...(heights ? { groundElevation: read.farGround.value, attachmentHeight: read.farHeight.value } : {}),
  });
  const notes = (values.notes ?? '').trim();
  const saved = await data.save('span', {
    ...(span ?? {}),
    lineId: found.line.id,
    sectionId: span?.sectionId ?? sectionId,
    nearStructureId: near.id,
    farStructureId: far.id,
    length: read.length.value!,
    nearAttachmentElevation: read.nearElevation!,
    farAttachmentElevation: read.farElevation!,
    nearGroundElevation: read.nearGround.value,
    farGroundElevation: read.farGround.value,
    requiredClearance: read.clearance.value,
    notes: notes === '' ? undefined : notes,
  });
  if (!span) {
    const labels = (values.wires ?? '')
      .split(',')
      .map((label) => label.trim())
      .filter((label) => label !== '');
    for (const label of labels.length > 0 ? labels : ['A']) {
      await data.save('wire', {
        lineId: found.line.id,
        spanId: saved.id,
        label,
        nearOffset: 0,
        farOffset: 0,
      });
    }
  }
  await draft.discard();
  return saved.id;
}

/** The typed length fields of the span form. */
type LengthFieldName =
  | 'length'
  | 'nearAttachment'
  | 'farAttachment'
  | 'nearGround'
  | 'farGround'
  | 'nearHeight'
  | 'farHeight'
  | 'clearance';

function SpanForm({ found, onSaved }: { found: Found; onSaved: (spanId: string) => void }) {
  const data = useData();
  const { line, records, span, sectionId } = found;
  const units = line.unitSystem;
  const previous = records.span.filter((item) => item.sectionId === sectionId).at(-1);
  const draft = useDraft(draftKey('span', span?.id ?? `new:${sectionId}`, units), () =>
    spanDraftStart(records, span, units, previous),
  );
  const [submitted, setSubmitted] = useState(false);
  const [saveError, setSaveError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const values = draft.values;
  if (values === null) return <p class="muted">Opening the span…</p>;
  const read = readSpanForm(values, units, submitted);
  const rise =
    read.nearElevation !== undefined && read.farElevation !== undefined
      ? read.farElevation - read.nearElevation
      : undefined;
  const heights = values.mode === 'heights';
  const lengthUnit = show(0, 'length', units).split(' ')[1];
  const field = (name: LengthFieldName, label: string, hint?: string) => (
    <NumberField
      id={`span-${name}`}
      label={label}
      unit={lengthUnit}
      value={values[name] ?? ''}
      onInput={(text) => draft.set(name, text)}
      error={read[name].error}
      hint={hint}
    />
  );

  const submit = async (): Promise<void> => {
    setSubmitted(true);
    const full = readSpanForm(values, units, true);
    if (!spanFormComplete(full)) {
      setSaveError('Some figures are missing or need a fix: see the messages above.');
      return;
    }
    setBusy(true);
    try {
      const spanId = await saveSpan(data, found, draft, full);
      onSaved(spanId);
      setSaveError(null);
      setSubmitted(false);
    } catch (error) {
      setSaveError(`Could not save: ${String(error)}`);
    } finally {
      setBusy(false);
    }
  };

  return (
    <form
      class="panel"
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        void submit();
      }}
    >
      {draft.restored && <p class="restored">Unsaved changes from earlier were restored.</p>}
      <div class="grid-2">
        <TextField
          id="span-nearLabel"
          label="Near structure (number or name)"
          value={values.nearLabel ?? ''}
          onInput={(text) => draft.set('nearLabel', text)}
          error={read.labelErrors.nearLabel}
        />
        <TextField
          id="span-farLabel"
          label="Far structure (number or name)"
          value={values.farLabel ?? ''}
          onInput={(text) => draft.set('farLabel', text)}
          error={read.labelErrors.farLabel}
        />
      </div>
      {field('length', 'Span length', 'Horizontal distance between the attachments.')}

      <ModeChoice
        legend="Attachment heights given as"
        name="geometry-mode"
        options={[
          { value: 'elevations', label: 'Elevations' },
          { value: 'heights', label: 'Height above ground' },
        ]}
        value={heights ? 'heights' : 'elevations'}
        onChange={(mode) => draft.set('mode', mode)}
      />

      {heights ? (
        <div class="grid-2">
          <div>
            {field('nearGround', 'Ground elevation at near structure')}
            {field('nearHeight', 'Near attachment height above ground')}
          </div>
          <div>
            {field('farGround', 'Ground elevation at far structure')}
            {field('farHeight', 'Far attachment height above ground')}
          </div>
        </div>
      ) : (
        <div class="grid-2">
          <div>
            {field('nearAttachment', 'Near attachment elevation')}
            {field('nearGround', 'Ground at near structure (optional)')}
          </div>
          <div>
            {field('farAttachment', 'Far attachment elevation')}
            {field('farGround', 'Ground at far structure (optional)')}
          </div>
        </div>
      )}
      <p class="rise" aria-live="polite">
        Rise (far minus near attachment):{' '}
        <strong class="value">{rise === undefined ? '—' : show(rise, 'length', units)}</strong>
        {rise !== undefined && (
          <span class="muted small">
            {' '}
            {rise > 0 ? 'far end higher' : rise < 0 ? 'far end lower' : 'level'}
          </span>
        )}
      </p>
      {field(
        'clearance',
        'Required ground clearance (optional)',
        'From the code and the owner’s standard that govern this line.',
      )}

      <div class="grid-2">
        <GpsCapture
          label="Near structure position"
          position={positionFromDraft('near', values)}
          onCapture={(position) => draft.setMany(positionToDraft('near', position))}
        />
        <GpsCapture
          label="Far structure position"
          position={positionFromDraft('far', values)}
          onCapture={(position) => draft.setMany(positionToDraft('far', position))}
        />
      </div>
      {!span && (
        <TextField
          id="span-wires"
          label="Wire positions"
          hint="Labels separated by commas, e.g. A, B, C, N."
          value={values.wires ?? ''}
          onInput={(text) => draft.set('wires', text)}
        />
      )}
      <TextField
        id="span-notes"
        label="Notes"
        multiline
        value={values.notes ?? ''}
        onInput={(text) => draft.set('notes', text)}
      />
      {saveError && (
        <p class="error-text" role="alert">
          {saveError}
        </p>
      )}
      <Button look="primary" wide type="submit" disabled={busy}>
        {span ? 'Save span' : 'Save span and continue'}
      </Button>
    </form>
  );
}

/** Removes a span with its wires and readings (tombstones, so the removal syncs), after a second tap. */
function RemoveSpan({ records, span }: { records: RecordSet; span: SpanRecord }) {
  const data = useData();
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const remove = async (): Promise<void> => {
    try {
      for (const reading of records.reading.filter((item) => item.spanId === span.id))
        await data.remove('reading', reading.id);
      for (const wire of records.wire.filter((item) => item.spanId === span.id))
        await data.remove('wire', wire.id);
      await data.remove('span', span.id);
      navigate(href('line', span.lineId));
    } catch (failure) {
      setError(`Could not remove: ${String(failure)}`);
    }
  };
  const readings = records.reading.filter((item) => item.spanId === span.id).length;
  return (
    <div class="btn-row">
      {confirming ? (
        <>
          <Button look="danger" onClick={() => void remove()}>
            Yes, remove the span
            {readings > 0 ? ` and its ${readings} reading${readings === 1 ? '' : 's'}` : ''}
          </Button>
          <Button onClick={() => setConfirming(false)}>Keep it</Button>
        </>
      ) : (
        <Button look="danger" onClick={() => setConfirming(true)}>
          Remove this span
        </Button>
      )}
      {error && <p class="error-text">{error}</p>}
    </div>
  );
}

export function SpanScreen({ lineId, spanId }: { lineId: string; spanId: string }) {
  const [loaded, reload] = useLineRecords(lineId);
  const sectionQuery = new URLSearchParams(window.location.hash.split('?')[1] ?? '').get('section') ?? '';
  if (loaded.state === 'loading') return <p class="muted">Opening the span…</p>;
  if (loaded.state === 'failed')
    return <p class="error-text">This line could not be read: {loaded.message}</p>;
  const records = loaded.value;
  const line = records?.line[0];
  if (!records || !line) return <p class="empty">This line is not on this phone.</p>;
  const span = spanId === 'new' ? undefined : records.span.find((item) => item.id === spanId);
  const sectionId = span?.sectionId ?? sectionQuery;
  const section = records.section.find((item) => item.id === sectionId);
  if ((spanId !== 'new' && !span) || !section) {
    return (
      <p class="empty">
        This span is not on this phone. <a href={href('line', lineId)}>Back to the line</a>
      </p>
    );
  }
  const label = (id: string): string => records.structure.find((item) => item.id === id)?.label ?? '?';
  const title = span ? `Span ${label(span.nearStructureId)} → ${label(span.farStructureId)}` : 'New span';
  return (
    <section>
      <Crumbs
        items={[
          { label: 'Lines', to: href() },
          { label: line.name, to: href('line', line.id) },
        ]}
      />
      <h1>{title}</h1>
      <p class="muted">
        Section {section.name} · {section.conductor.name}
      </p>
      {span && <WireList records={records} line={line} span={span} onChanged={reload} />}
      <h2>{span ? 'Span geometry' : 'Geometry'}</h2>
      <SpanForm
        key={span?.id ?? 'new'}
        found={{ line, records, span, sectionId }}
        onSaved={(savedId) => {
          if (span) reload();
          else navigate(href('line', line.id, 'span', savedId));
        }}
      />
      {span && <RemoveSpan records={records} span={span} />}
    </section>
  );
}
