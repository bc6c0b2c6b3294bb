// A tension section: its name and its conductor, from the library or entered by the user.
import { useState } from 'preact/hooks';
import { CONDUCTOR_LIBRARY, conductorSpecFromLibrary, libraryLabel } from '../../../core/conductors';
import type { ConductorSpec } from '../../../core/records/conductor';
import type { RecordSet } from '../../../core/records/kinds';
import type { SectionRecord } from '../../../core/records/section';
import type { QuantityKind, UnitSystem } from '../../../core/units';
import { findLibraryConductor } from '../../app/conductor-spec';
import { ModeChoice } from '../../components/mode-choice/ModeChoice';
import { useData, useLineRecords } from '../../app/context';
import { SectionDesignPanel } from '../design/SectionDesignPanel';
import { draftKey, useDraft, type DraftValues } from '../../app/drafts';
import { fieldText, show } from '../../app/format';
import { readField, type FieldRead } from '../../app/read-field';
import { href, navigate } from '../../app/router';
import { Button } from '../../components/button/Button';
import { Crumbs } from '../../components/crumbs/Crumbs';
import { NumberField } from '../../components/field/NumberField';
import { TextField } from '../../components/field/TextField';
import './section.css';

type NumericConductorField = 'weight' | 'diameter' | 'area' | 'modulus' | 'expansion' | 'ratedStrength';

const CUSTOM_FIELDS: { name: NumericConductorField; label: string; kind: QuantityKind }[] = [
  { name: 'weight', label: 'Weight (bare)', kind: 'weightPerLength' },
  { name: 'diameter', label: 'Overall diameter', kind: 'diameter' },
  { name: 'area', label: 'Total cross-section area', kind: 'area' },
  { name: 'modulus', label: 'Final modulus of elasticity', kind: 'modulus' },
  { name: 'expansion', label: 'Thermal expansion', kind: 'expansion' },
  { name: 'ratedStrength', label: 'Rated breaking strength', kind: 'tension' },
];

function customFrom(spec: ConductorSpec | undefined, units: UnitSystem): DraftValues {
  const values: DraftValues = { customName: spec?.name ?? '' };
  for (const field of CUSTOM_FIELDS) values[field.name] = fieldText(spec?.[field.name], field.kind, units);
  return values;
}

function startValues(section: SectionRecord | undefined, units: UnitSystem): DraftValues {
  const conductor = section?.conductor;
  const fromLibrary =
    conductor?.libraryId !== undefined && findLibraryConductor(conductor.libraryId) !== undefined;
  return {
    name: section?.name ?? '',
    source: conductor === undefined || fromLibrary ? 'library' : 'custom',
    libraryId: conductor?.libraryId ?? '',
    ...customFrom(fromLibrary ? undefined : conductor, units),
  };
}

function SectionForm({ records, section }: { records: RecordSet; section: SectionRecord | undefined }) {
  const data = useData();
  const line = records.line[0]!;
  const units = line.unitSystem;
  const draft = useDraft(draftKey('section', section?.id ?? `new:${line.id}`, units), () =>
    startValues(section, units),
  );
  const [submitted, setSubmitted] = useState(false);
  const [saveError, setSaveError] = useState<string | null>(null);
  const values = draft.values;
  if (values === null) return <p class="muted">Opening the section…</p>;
  const custom = values.source === 'custom';
  const reads: Record<string, FieldRead> = {};
  for (const field of CUSTOM_FIELDS) {
    reads[field.name] = readField(values[field.name], field.kind, units, {
      required: submitted,
      positive: true,
    });
  }
  const nameError =
    submitted && (values.name ?? '').trim() === '' ? 'Name the section, e.g. "Str 1 to 7".' : null;
  const chosen = findLibraryConductor(values.libraryId);
  const libraryError = submitted && !custom && !chosen ? 'Choose a conductor from the list.' : null;
  const customNameError =
    submitted && custom && (values.customName ?? '').trim() === '' ? 'Name the conductor.' : null;

  const buildConductor = (): ConductorSpec | undefined => {
    if (!custom) return chosen ? conductorSpecFromLibrary(chosen) : undefined;
    const all = CUSTOM_FIELDS.map((field) =>
      readField(values[field.name], field.kind, units, { required: true, positive: true }),
    );
    if (all.some((read) => read.value === undefined) || (values.customName ?? '').trim() === '')
      return undefined;
    const [weight, diameter, area, modulus, expansion, ratedStrength] = all.map((read) => read.value!) as [
      number,
      number,
      number,
      number,
      number,
      number,
    ];
    return {
      name: (values.customName ?? '').trim(),
      weight,
      diameter,
      area,
      modulus,
      expansion,
      ratedStrength,
      source: 'entered by user',
    };
  };

  const submit = async (): Promise<void> => {
    setSubmitted(true);
    const conductor = buildConductor();
    const name = (values.name ?? '').trim();
    if (!conductor || name === '') {
      setSaveError('Some details are missing or need a fix: see the messages above.');
      return;
    }
    try {
      const saved = await data.save('section', { ...(section ?? {}), lineId: line.id, name, conductor });
      await draft.discard();
      navigate(
        section ? href('line', line.id) : `${href('line', line.id, 'span', 'new')}?section=${saved.id}`,
      );
    } catch (error) {
      setSaveError(`Could not save: ${String(error)}`);
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
      {draft.restored && <p class="restored">Unsaved changes from earlier were restored.</p>}
      <div class="panel">
        <TextField
          id="section-name"
          label="Section name"
          hint="The run of spans between two dead-ends, e.g. “Str 1 to 7”."
          value={values.name ?? ''}
          onInput={(text) => draft.set('name', text)}
          error={nameError}
        />
      </div>
      <h2>Conductor</h2>
      <ModeChoice
        legend="Where the conductor figures come from"
        name="conductor-source"
        options={[
          { value: 'library', label: 'Library' },
          { value: 'custom', label: 'My own figures' },
        ]}
        value={custom ? 'custom' : 'library'}
        onChange={(source) => draft.set('source', source)}
      />
      {!custom ? (
        <div class="conductor-pick" role="radiogroup" aria-label="Library conductors">
          {CONDUCTOR_LIBRARY.map((conductor) => (
            <label
              key={conductor.id}
              class={`conductor-tile${values.libraryId === conductor.id ? ' is-chosen' : ''}`}
            >
              <input
                type="radio"
                name="library-conductor"
                value={conductor.id}
                checked={values.libraryId === conductor.id}
                onChange={() => draft.set('libraryId', conductor.id)}
              />
              <span>
                <strong>{libraryLabel(conductor)}</strong>
                <span class="conductor-tile__figures">
                  {show(conductor.weight, 'weightPerLength', units)} · RBS{' '}
                  {show(conductor.ratedStrength, 'tension', units)}
                </span>
              </span>
            </label>
          ))}
          {libraryError && <p class="field__message">{libraryError}</p>}
        </div>
      ) : (
        <div class="panel">
          <label class="field">
            <span class="field__label">Start from a library conductor (optional)</span>
            <span class="field__box">
              <select
                class="field__select"
                value=""
                onChange={(event) => {
                  const picked = findLibraryConductor(event.currentTarget.value);
                  if (picked)
                    draft.setMany(
                      customFrom(
                        { ...conductorSpecFromLibrary(picked), name: `${libraryLabel(picked)} (edited)` },
                        units,
                      ),
                    );
                }}
              >
                <option value="">Copy figures from…</option>
                {CONDUCTOR_LIBRARY.map((conductor) => (
                  <option key={conductor.id} value={conductor.id}>
                    {libraryLabel(conductor)}
                  </option>
                ))}
              </select>
            </span>
          </label>
          <TextField
            id="section-customName"
            label="Conductor name"
            value={values.customName ?? ''}
            onInput={(text) => draft.set('customName', text)}
            error={customNameError}
          />
          <div class="grid-2">
            {CUSTOM_FIELDS.map((field) => (
              <NumberField
                key={field.name}
                id={`section-${field.name}`}
                label={field.label}
                unit={show(0, field.kind, units).split(' ').slice(1).join(' ')}
                value={values[field.name] ?? ''}
                onInput={(text) => draft.set(field.name, text)}
                error={reads[field.name]?.error}
              />
            ))}
          </div>
        </div>
      )}
      {saveError && (
        <p class="error-text" role="alert">
          {saveError}
        </p>
      )}
      <Button look="primary" wide type="submit">
        {section ? 'Save section' : 'Save section and add its first span'}
      </Button>
    </form>
  );
}

export function SectionScreen({ lineId, sectionId }: { lineId: string; sectionId: string }) {
  const [loaded, reload] = useLineRecords(lineId);
  if (loaded.state === 'loading') return <p class="muted">Opening the section…</p>;
  if (loaded.state === 'failed')
    return <p class="error-text">This line could not be read: {loaded.message}</p>;
  const records = loaded.value;
  const line = records?.line[0];
  if (!records || !line) return <p class="empty">This line is not on this phone.</p>;
  const section = sectionId === 'new' ? undefined : records.section.find((item) => item.id === sectionId);
  if (sectionId !== 'new' && !section) {
    return (
      <p class="empty">
        This section is not on this phone. <a href={href('line', lineId)}>Back to the line</a>
      </p>
    );
  }
  return (
    <section>
      <Crumbs
        items={[
          { label: 'Lines', to: href() },
          { label: line.name, to: href('line', line.id) },
        ]}
      />
      <h1>{section ? `Section ${section.name}` : 'New tension section'}</h1>
      <SectionForm key={section?.id ?? 'new'} records={records} section={section} />
      {section && <SectionDesignPanel records={records} section={section} onSaved={reload} />}
    </section>
  );
}
