// The design basis form as text in the line's units, and back to a validated section design (SI). Pure, so the
// parsing and the messages are tested without a page. Empty optional fields mean "use core's default".
import { CODE_REFERENCE_TEMPERATURE, DEFAULT_READING_UNCERTAINTY } from '../../../core/assess/defaults';
import { sectionDesignSchema, type SectionDesign } from '../../../core/records/design';
import { summarizeIssues } from '../../../core/records/validate';
import { DEFAULT_CREEP_TEMPERATURE_OFFSET } from '../../../core/state-change';
import { formatQuantity, parseQuantity, type QuantityKind, type UnitSystem } from '../../../core/units';
import {
  designExtrasOf,
  designExtrasSchema,
  tableCreepOffsetOf,
  UNCERTAINTY_NAMES,
  type DesignExtras,
  type JudgementDesign,
  type UncertaintyName,
} from '../../judgement/design-extras';

export type StateChoice = 'initial' | 'final';

export interface TableRowText {
  temperature: string;
  sag: string;
}

/** Everything the form holds, as typed. */
export interface DesignFormValues {
  overrideRulingSpan: boolean;
  rulingSpan: string;
  basisKind: 'tension' | 'table';
  tensionGivenAs: 'tension' | 'percent';
  tension: string;
  percent: string;
  referenceTemperature: string;
  state: StateChoice;
  creepOffset: string;
  tableRows: TableRowText[];
  tableState: StateChoice;
  tableCreepOffset: string;
  maxDesignTemperature: string;
  terrainCategory: 1 | 2 | 3 | 4;
  toleranceAbsolute: string;
  toleranceRelative: string;
  toleranceRule: 'larger' | 'smaller';
  compareState: StateChoice;
  vibrationTemperature: string;
  uncertainty: Record<UncertaintyName, string>;
}

/** Unit kind and plain name of each reading uncertainty (weight as a percentage of the weight). */
export const UNCERTAINTY_FIELDS: Readonly<Record<UncertaintyName, { kind: QuantityKind; label: string }>> = {
  span: { kind: 'length', label: 'Span length' },
  rise: { kind: 'length', label: 'Rise between attachments' },
  weightRelative: { kind: 'percent', label: 'Conductor weight (% of weight)' },
  temperature: { kind: 'temperatureDifference', label: 'Conductor temperature' },
  sag: { kind: 'sag', label: 'Sag read directly' },
  offsetX: { kind: 'length', label: 'Offset distance of an offset sag' },
  drop: { kind: 'length', label: 'Target drop below an attachment' },
  angle: { kind: 'angle', label: 'Sight angle' },
  timing: { kind: 'time', label: 'One stopwatch timing' },
  point: { kind: 'length', label: 'Each coordinate of a surveyed point' },
  elevation: { kind: 'length', label: 'Attachment and ground elevations' },
};

/** Percent fields are typed as % and stored as fractions. */
const PERCENT_STORED_AS_FRACTION: ReadonlySet<UncertaintyName> = new Set(['weightRelative']);

function text(valueSI: number | undefined, kind: QuantityKind, units: UnitSystem, locale?: string): string {
  if (valueSI === undefined || !Number.isFinite(valueSI)) return '';
  return formatQuantity(valueSI, kind, units, locale === undefined ? undefined : { locale }).value;
}

/** The default of an uncertainty in the line's units, e.g. "0.16 ft" (for a placeholder). */
export function uncertaintyDefaultText(name: UncertaintyName, units: UnitSystem, locale?: string): string {
  const { kind } = UNCERTAINTY_FIELDS[name];
  const scale = PERCENT_STORED_AS_FRACTION.has(name) ? 100 : 1;
  const options = { decimals: kind === 'angle' ? 3 : 2, ...(locale === undefined ? {} : { locale }) };
  const { value, unit } = formatQuantity(DEFAULT_READING_UNCERTAINTY[name] * scale, kind, units, options);
  return unit === '%' ? `${value} %` : `${value} ${unit}`;
}

/** The form's starting text for a stored design (or a new one), in the line's units. */
export function designFormStart(
  design: SectionDesign | undefined,
  units: UnitSystem,
  locale?: string,
): DesignFormValues {
  const extras: DesignExtras = design ? designExtrasOf(design) : {};
  const basis = design?.basis;
  const tensionBasis = basis?.kind === 'tension' ? basis : undefined;
  const tableBasis = basis?.kind === 'table' ? basis : undefined;
  const uncertainty = Object.fromEntries(
    UNCERTAINTY_NAMES.map((name) => {
      const value = extras.uncertainty?.[name];
      const scale = PERCENT_STORED_AS_FRACTION.has(name) ? 100 : 1;
      const shown =
        value === undefined
          ? ''
          : formatQuantity(value * scale, UNCERTAINTY_FIELDS[name].kind, units, {
              decimals: UNCERTAINTY_FIELDS[name].kind === 'angle' ? 4 : 3,
              ...(locale === undefined ? {} : { locale }),
            }).value;
      return [name, shown];
    }),
  ) as Record<UncertaintyName, string>;
  const relative = design?.tolerance?.sagRelative;
  return {
    overrideRulingSpan: design?.rulingSpanOverride !== undefined,
    rulingSpan: text(design?.rulingSpanOverride, 'length', units, locale),
    basisKind: basis?.kind ?? 'tension',
    tensionGivenAs: tensionBasis?.percentOfRated !== undefined ? 'percent' : 'tension',
    tension: text(tensionBasis?.horizontalTension, 'tension', units, locale),
    percent: text(tensionBasis?.percentOfRated, 'percent', units, locale),
    referenceTemperature: text(
      tensionBasis?.referenceTemperature ?? CODE_REFERENCE_TEMPERATURE,
      'temperature',
      units,
      locale,
    ),
    state: tensionBasis?.state ?? 'initial',
    creepOffset: text(
      tensionBasis?.creepOffset ?? DEFAULT_CREEP_TEMPERATURE_OFFSET,
      'temperatureDifference',
      units,
      locale,
    ),
    tableRows: tableBasis
      ? tableBasis.rows.map((row) => ({
          temperature: text(row.temperature, 'temperature', units, locale),
          sag: text(row.sag, 'sag', units, locale),
        }))
      : [
          { temperature: '', sag: '' },
          { temperature: '', sag: '' },
        ],
    tableState: tableBasis?.state ?? 'final',
    tableCreepOffset: text(
      (design && tableCreepOffsetOf(design)) ?? DEFAULT_CREEP_TEMPERATURE_OFFSET,
      'temperatureDifference',
      units,
      locale,
    ),
    maxDesignTemperature: text(design?.maxDesignTemperature, 'temperature', units, locale),
    terrainCategory: design?.terrainCategory ?? 3,
    toleranceAbsolute: text(design?.tolerance?.sagAbsolute, 'sag', units, locale),
    toleranceRelative: text(relative === undefined ? undefined : relative * 100, 'percent', units, locale),
    toleranceRule: design?.tolerance?.combine ?? 'larger',
    compareState: extras.compareState ?? 'initial',
    vibrationTemperature: text(extras.vibrationTemperature, 'temperature', units, locale),
    uncertainty,
  };
}

/** Field name → message shown beside it. Table rows use `row.N.temperature` and `row.N.sag`. */
export type DesignFormErrors = Record<string, string>;

export type DesignFormRead =
  | { ok: true; design: JudgementDesign; errors: DesignFormErrors }
  | { ok: false; errors: DesignFormErrors; summary: string };

interface Rules {
  required?: boolean;
  positive?: boolean;
  nonNegative?: boolean;
  /** Largest allowed value in SI, with its message. */
  max?: { value: number; message: string };
}

/**
 * Reads the form into a section design (SI), with a message per bad field; never NaN.
 * @param requireAll true once the user has pressed save: empty required fields are errors then
 */
export function readDesignForm(
  values: DesignFormValues,
  units: UnitSystem,
  options: { requireAll?: boolean; locale?: string } = {},
): DesignFormRead {
  const errors: DesignFormErrors = {};
  const requireAll = options.requireAll ?? true;
  const read = (field: string, typed: string, kind: QuantityKind, rules: Rules = {}): number | undefined => {
    if (typed.trim() === '') {
      if (rules.required && requireAll) errors[field] = 'Enter a number.';
      return undefined;
    }
    const parsed = parseQuantity(typed, kind, units, options.locale);
    if (!parsed.ok) {
      errors[field] = parsed.message;
      return undefined;
    }
    const value = parsed.value;
    if (rules.positive && !(value > 0)) errors[field] = 'Must be greater than zero.';
    else if (rules.nonNegative && value < 0) errors[field] = 'Cannot be negative.';
    else if (rules.max && value > rules.max.value) errors[field] = rules.max.message;
    return errors[field] === undefined ? value : undefined;
  };

  const rulingSpan = values.overrideRulingSpan
    ? read('rulingSpan', values.rulingSpan, 'length', { required: true, positive: true })
    : undefined;
  let basis: Record<string, unknown>;
  let tableCreep: number | undefined;
  if (values.basisKind === 'tension') {
    const percent = values.tensionGivenAs === 'percent';
    const amount = percent
      ? read('percent', values.percent, 'percent', {
          required: true,
          positive: true,
          max: { value: 100, message: 'A percentage of rated strength is at most 100 %.' },
        })
      : read('tension', values.tension, 'tension', { required: true, positive: true });
    basis = {
      kind: 'tension',
      ...(percent ? { percentOfRated: amount } : { horizontalTension: amount }),
      referenceTemperature: read('referenceTemperature', values.referenceTemperature, 'temperature', {
        required: true,
      }),
      state: values.state,
      creepOffset: read('creepOffset', values.creepOffset, 'temperatureDifference', {
        required: true,
        nonNegative: true,
      }),
    };
  } else {
    const rows = values.tableRows.map((row, index) => ({
      temperature: read(`row.${index}.temperature`, row.temperature, 'temperature', { required: true }),
      sag: read(`row.${index}.sag`, row.sag, 'sag', { required: true, positive: true }),
    }));
    if (values.tableRows.length < 2) errors.rows = 'The design table needs at least two rows.';
    const temperatures = rows.map((row) => row.temperature).filter((t) => t !== undefined);
    if (new Set(temperatures).size !== temperatures.length) {
      errors.rows = 'Each temperature may appear only once in the design table.';
    }
    tableCreep = read('tableCreepOffset', values.tableCreepOffset, 'temperatureDifference', {
      nonNegative: true,
    });
    basis = { kind: 'table', rows, state: values.tableState };
  }
  const maxDesignTemperature = read('maxDesignTemperature', values.maxDesignTemperature, 'temperature', {
    required: true,
  });
  const sagAbsolute = read('toleranceAbsolute', values.toleranceAbsolute, 'sag', { nonNegative: true });
  const relativePercent = read('toleranceRelative', values.toleranceRelative, 'percent', {
    nonNegative: true,
    max: { value: 100, message: 'At most 100 % of the design sag.' },
  });
  const tolerance = {
    ...(sagAbsolute !== undefined ? { sagAbsolute } : {}),
    ...(relativePercent !== undefined ? { sagRelative: relativePercent / 100 } : {}),
    combine: values.toleranceRule,
  };
  const vibrationTemperature = read('vibrationTemperature', values.vibrationTemperature, 'temperature');
  const uncertainty: Partial<Record<UncertaintyName, number>> = {};
  for (const name of UNCERTAINTY_NAMES) {
    const value = read(`uncertainty.${name}`, values.uncertainty[name], UNCERTAINTY_FIELDS[name].kind, {
      nonNegative: true,
    });
    if (value !== undefined) uncertainty[name] = PERCENT_STORED_AS_FRACTION.has(name) ? value / 100 : value;
  }

  if (Object.keys(errors).length > 0) {
    return { ok: false, errors, summary: 'Some figures are missing or need a fix: see the messages above.' };
  }
  const candidate = {
    basis,
    ...(rulingSpan !== undefined ? { rulingSpanOverride: rulingSpan } : {}),
    maxDesignTemperature,
    terrainCategory: values.terrainCategory,
    tolerance,
  };
  const base = sectionDesignSchema.safeParse(candidate);
  if (!base.success) {
    return {
      ok: false,
      errors,
      summary: `The design does not hold together: ${summarizeIssues(base.error)}`,
    };
  }
  const extrasCandidate: DesignExtras = {
    compareState: values.compareState,
    ...(vibrationTemperature !== undefined ? { vibrationTemperature } : {}),
    ...(Object.keys(uncertainty).length > 0 ? { uncertainty } : {}),
  };
  const extras = designExtrasSchema.safeParse(extrasCandidate);
  if (!extras.success) {
    return {
      ok: false,
      errors,
      summary: `The settings do not hold together: ${summarizeIssues(extras.error)}`,
    };
  }
  const design: JudgementDesign = { ...base.data, ...extras.data };
  if (design.basis.kind === 'table' && tableCreep !== undefined) {
    design.basis = { ...design.basis, creepOffset: tableCreep };
  }
  return { ok: true, design, errors };
}
