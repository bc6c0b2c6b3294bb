// Editing a tension section's design basis: ruling span (computed, or entered), the design condition (a tension
// at a reference temperature, or a sag table), maximum design temperature, terrain category for the vibration
// check, the sag tolerance and the default reading uncertainties, every default with its source.
import { useState } from 'preact/hooks';
import {
  CIGRE_TB273_TERRAIN_LIMITS,
  READING_UNCERTAINTY_SOURCES,
  TOLERANCE_SOURCES,
} from '../../../core/assess/defaults';
import type { SectionDesign } from '../../../core/records/design';
import type { SectionRecord } from '../../../core/records/section';
import type { SpanRecord } from '../../../core/records/span';
import { rulingSpan } from '../../../core/ruling-span';
import { DEFAULT_CREEP_TEMPERATURE_OFFSET } from '../../../core/state-change';
import { formatQuantity, unitLabel, type UnitSystem } from '../../../core/units';
import { userLocale } from '../../app/format';
import { Button } from '../../components/button/Button';
import { ModeChoice } from '../../components/mode-choice/ModeChoice';
import { NumberField } from '../../components/field/NumberField';
import { designExtrasOf, UNCERTAINTY_NAMES } from '../../judgement/design-extras';
import { quantityText } from '../../judgement/verdict-words';
import {
  designFormStart,
  readDesignForm,
  uncertaintyDefaultText,
  UNCERTAINTY_FIELDS,
  type DesignFormValues,
  type StateChoice,
} from './design-form';
import './design.css';

export interface DesignBasisFormProps {
  section: SectionRecord;
  /** Spans of the line (those of this section are picked out) for the computed ruling span. */
  spans: SpanRecord[];
  unitSystem: UnitSystem;
  /** Called with a design that passed the records schema. May return a promise (saving). */
  onSave: (design: SectionDesign) => void | Promise<void>;
  /** BCP 47 locale for decimal separators; the browser's when absent. */
  locale?: string;
}

const STATE_OPTIONS: { value: StateChoice; label: string; hint: string }[] = [
  { value: 'initial', label: 'Initial', hint: 'as strung, before creep' },
  { value: 'final', label: 'Final', hint: 'after creep and the design load' },
];

export function DesignBasisForm({ section, spans, unitSystem: units, onSave, locale }: DesignBasisFormProps) {
  const typedLocale = locale ?? userLocale();
  const [values, setValues] = useState<DesignFormValues>(() =>
    designFormStart(section.design, units, typedLocale),
  );
  const [submitted, setSubmitted] = useState(false);
  const [message, setMessage] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const read = readDesignForm(values, units, { requireAll: submitted, locale: typedLocale });
  const errors = read.errors;
  const set = <K extends keyof DesignFormValues>(key: K, value: DesignFormValues[K]): void =>
    setValues((old) => ({ ...old, [key]: value }));
  const unit = (kind: Parameters<typeof unitLabel>[0]): string => unitLabel(kind, units);

  const sectionSpans = spans.filter((span) => span.sectionId === section.id && !span.deleted);
  let computedRulingSpan: number | undefined;
  try {
    computedRulingSpan = sectionSpans.length > 0 ? rulingSpan(sectionSpans.map((s) => s.length)) : undefined;
  } catch {
    computedRulingSpan = undefined;
  }

  const submit = async (): Promise<void> => {
    setSubmitted(true);
    const full = readDesignForm(values, units, { requireAll: true, locale: typedLocale });
    if (!full.ok) {
      setMessage(full.summary);
      return;
    }
    // Keep settings this form does not edit (a loaded condition entered elsewhere).
    const kept = section.design ? designExtrasOf(section.design).loading : undefined;
    const design = kept ? { ...full.design, loading: kept } : full.design;
    setBusy(true);
    try {
      await onSave(design);
      setMessage(null);
    } catch (error) {
      setMessage(`Could not save: ${String(error)}`);
    } finally {
      setBusy(false);
    }
  };

  const rows = values.tableRows;
  const setRow = (index: number, key: 'temperature' | 'sag', text: string): void =>
    set(
      'tableRows',
      rows.map((row, i) => (i === index ? { ...row, [key]: text } : row)),
    );

  return (
    <form
      class="design-form"
      noValidate
      onSubmit={(event) => {
        event.preventDefault();
        void submit();
      }}
    >
      <h2>Ruling span</h2>
      <div class="panel">
        <p class="design-form__computed">
          Computed from the {sectionSpans.length} span{sectionSpans.length === 1 ? '' : 's'} of this section
          (√(ΣS³/ΣS)):{' '}
          <strong class="value" data-testid="computed-ruling-span">
            {computedRulingSpan === undefined ? '—' : quantityText(computedRulingSpan, 'length', units)}
          </strong>
        </p>
        <label class="check">
          <input
            type="checkbox"
            checked={values.overrideRulingSpan}
            onChange={(event) => set('overrideRulingSpan', event.currentTarget.checked)}
          />
          Use the ruling span of the design instead
        </label>
        {values.overrideRulingSpan && (
          <NumberField
            id="design-rulingSpan"
            label="Ruling span of the design"
            unit={unit('length')}
            value={values.rulingSpan}
            onInput={(text) => set('rulingSpan', text)}
            error={errors.rulingSpan}
          />
        )}
      </div>

      <h2>Design condition</h2>
      <div class="panel">
        <ModeChoice
          name="design-basis-kind"
          legend="The design is given as"
          value={values.basisKind}
          onChange={(value) => set('basisKind', value)}
          options={[
            { value: 'tension', label: 'A tension at a temperature' },
            { value: 'table', label: 'A sag table' },
          ]}
        />
        {values.basisKind === 'tension' ? (
          <>
            <ModeChoice
              name="design-tension-as"
              legend="Tension given as"
              value={values.tensionGivenAs}
              onChange={(value) => set('tensionGivenAs', value)}
              options={[
                { value: 'tension', label: 'Horizontal tension' },
                { value: 'percent', label: '% of rated strength' },
              ]}
            />
            <div class="grid-2">
              {values.tensionGivenAs === 'tension' ? (
                <NumberField
                  id="design-tension"
                  label="Design horizontal tension"
                  unit={unit('tension')}
                  value={values.tension}
                  onInput={(text) => set('tension', text)}
                  error={errors.tension}
                />
              ) : (
                <NumberField
                  id="design-percent"
                  label="Design tension, % of rated strength"
                  unit="%"
                  value={values.percent}
                  onInput={(text) => set('percent', text)}
                  error={errors.percent}
                  hint={`Rated strength ${quantityText(section.conductor.ratedStrength, 'tension', units)} (${section.conductor.name}).`}
                />
              )}
              <NumberField
                id="design-referenceTemperature"
                label="at conductor temperature"
                unit={unit('temperature')}
                value={values.referenceTemperature}
                onInput={(text) => set('referenceTemperature', text)}
                error={errors.referenceTemperature}
              />
            </div>
            <ModeChoice
              name="design-state"
              legend="The design tension is"
              value={values.state}
              onChange={(value) => set('state', value)}
              options={STATE_OPTIONS}
            />
            <NumberField
              id="design-creepOffset"
              label="Creep allowance (equivalent temperature rise)"
              unit={unit('temperatureDifference')}
              value={values.creepOffset}
              onInput={(text) => set('creepOffset', text)}
              error={errors.creepOffset}
              hint={`Default ${quantityText(DEFAULT_CREEP_TEMPERATURE_OFFSET, 'temperatureDifference', units)}: derived from the initial and final rows of the Drake and Arbutus tables in Douglass & Thrash (handbook chapter).`}
            />
          </>
        ) : (
          <>
            <p class="muted">Midspan sag of the level ruling span at each conductor temperature.</p>
            <table class="design-table">
              <thead>
                <tr>
                  <th scope="col">Temperature ({unit('temperature')})</th>
                  <th scope="col">Sag ({unit('sag')})</th>
                  <th scope="col">
                    <span class="visually-hidden">Remove</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {rows.map((row, index) => (
                  <tr key={index}>
                    <td>
                      <NumberField
                        id={`design-row-${index}-temperature`}
                        label={`Row ${index + 1} temperature`}
                        unit={unit('temperature')}
                        value={row.temperature}
                        onInput={(text) => setRow(index, 'temperature', text)}
                        error={errors[`row.${index}.temperature`]}
                      />
                    </td>
                    <td>
                      <NumberField
                        id={`design-row-${index}-sag`}
                        label={`Row ${index + 1} sag`}
                        unit={unit('sag')}
                        value={row.sag}
                        onInput={(text) => setRow(index, 'sag', text)}
                        error={errors[`row.${index}.sag`]}
                      />
                    </td>
                    <td>
                      <Button
                        look="danger"
                        aria-label={`Remove row ${index + 1}`}
                        disabled={rows.length <= 2}
                        onClick={() =>
                          set(
                            'tableRows',
                            rows.filter((_, i) => i !== index),
                          )
                        }
                      >
                        ✕
                      </Button>
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
            {errors.rows && (
              <p class="field__message" role="alert">
                {errors.rows}
              </p>
            )}
            <Button onClick={() => set('tableRows', [...rows, { temperature: '', sag: '' }])}>
              + Add row
            </Button>
            <ModeChoice
              name="design-table-state"
              legend="The table gives sags"
              value={values.tableState}
              onChange={(value) => set('tableState', value)}
              options={STATE_OPTIONS}
            />
            <NumberField
              id="design-tableCreepOffset"
              label="Creep allowance (equivalent temperature rise)"
              unit={unit('temperatureDifference')}
              value={values.tableCreepOffset}
              onInput={(text) => set('tableCreepOffset', text)}
              error={errors.tableCreepOffset}
              hint="Used to compare a final table with newly strung wire (or the reverse)."
            />
          </>
        )}
        <NumberField
          id="design-maxDesignTemperature"
          label="Maximum design temperature of the conductor"
          unit={unit('temperature')}
          value={values.maxDesignTemperature}
          onInput={(text) => set('maxDesignTemperature', text)}
          error={errors.maxDesignTemperature}
          hint="The hottest the wire is designed to run: the projected sag and ground clearance are checked there."
        />
        <ModeChoice
          name="design-compare-state"
          legend="Compare the wires as"
          value={values.compareState}
          onChange={(value) => set('compareState', value)}
          options={[
            { value: 'initial', label: 'Newly strung', hint: 'initial condition' },
            { value: 'final', label: 'In service for years', hint: 'final condition, after creep' },
          ]}
        />
      </div>

      <h2>Vibration check</h2>
      <div class="panel">
        <fieldset class="terrain-choice">
          <legend class="field__label">Terrain category</legend>
          {CIGRE_TB273_TERRAIN_LIMITS.map((limit) => (
            <label
              key={limit.terrainCategory}
              class={`terrain-tile${values.terrainCategory === limit.terrainCategory ? ' is-chosen' : ''}`}
            >
              <input
                type="radio"
                name="design-terrain"
                checked={values.terrainCategory === limit.terrainCategory}
                onChange={() => set('terrainCategory', limit.terrainCategory)}
              />
              <span>
                <strong>
                  {limit.terrainCategory}. {limit.description}
                </strong>
                <span class="terrain-tile__limit">
                  H/w at most {quantityText(limit.maxCatenaryParameter, 'length', units)}
                </span>
              </span>
            </label>
          ))}
          <p class="design-form__source">Source: {CIGRE_TB273_TERRAIN_LIMITS[0]?.source}</p>
        </fieldset>
        <NumberField
          id="design-vibrationTemperature"
          label="Temperature of the check (optional)"
          unit={unit('temperature')}
          value={values.vibrationTemperature}
          onInput={(text) => set('vibrationTemperature', text)}
          error={errors.vibrationTemperature}
          placeholder={formatQuantity(15, 'temperature', units).value}
          hint="The site's average temperature of the coldest month. Empty: 15 °C (59 °F), a placeholder."
        />
      </div>

      <h2>Sag tolerance</h2>
      <div class="panel">
        <div class="grid-2">
          <NumberField
            id="design-toleranceAbsolute"
            label="Allowed sag deviation, either way (optional)"
            unit={unit('sag')}
            value={values.toleranceAbsolute}
            onInput={(text) => set('toleranceAbsolute', text)}
            error={errors.toleranceAbsolute}
            placeholder={formatQuantity(0.15, 'sag', units).value}
            hint={`Empty: ±${quantityText(0.15, 'sag', units)}. ${TOLERANCE_SOURCES.sagAbsolute}`}
          />
          <NumberField
            id="design-toleranceRelative"
            label="Allowed deviation as % of design sag (optional)"
            unit="%"
            value={values.toleranceRelative}
            onInput={(text) => set('toleranceRelative', text)}
            error={errors.toleranceRelative}
            hint={TOLERANCE_SOURCES.sagRelative}
          />
        </div>
        <ModeChoice
          name="design-tolerance-rule"
          legend="When both are set, allow"
          value={values.toleranceRule}
          onChange={(value) => set('toleranceRule', value)}
          options={[
            { value: 'larger', label: 'The larger' },
            { value: 'smaller', label: 'The smaller (stricter)' },
          ]}
        />
        <p class="design-form__source">{TOLERANCE_SOURCES.combine}</p>
      </div>

      <details class="panel design-uncertainty">
        <summary>Reading uncertainties (one standard deviation; empty = default)</summary>
        <div class="grid-2">
          {UNCERTAINTY_NAMES.map((name) => (
            <NumberField
              key={name}
              id={`design-uncertainty-${name}`}
              label={UNCERTAINTY_FIELDS[name].label}
              unit={UNCERTAINTY_FIELDS[name].kind === 'percent' ? '%' : unit(UNCERTAINTY_FIELDS[name].kind)}
              value={values.uncertainty[name]}
              onInput={(text) => set('uncertainty', { ...values.uncertainty, [name]: text })}
              error={errors[`uncertainty.${name}`]}
              placeholder={uncertaintyDefaultText(name, units, typedLocale).split(' ')[0]}
              hint={`Default ${uncertaintyDefaultText(name, units, typedLocale)}. ${READING_UNCERTAINTY_SOURCES[name]}`}
            />
          ))}
        </div>
      </details>

      {message && (
        <p class="error-text" role="alert" data-testid="design-form-message">
          {message}
        </p>
      )}
      <Button look="primary" wide type="submit" disabled={busy}>
        Save design basis
      </Button>
    </form>
  );
}
