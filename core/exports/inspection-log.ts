/**
 * The inspection log: one CSV row per reading, with where it was taken, what was read, what the solver and the
 * design comparison made of it, and who took it. Units are the line's unit system and are written in the header
 * names ("Horizontal tension (kN)" or "(lbf)"); the cells hold bare numbers so a spreadsheet can compute with them.
 *
 * Precision of the number cells ({@link LOG_DECIMALS}): a little finer than the app's fields so that a value
 * read back from the log matches what was stored to within half the last printed digit:
 * lengths and sags 3 decimals (1 mm; 0.001 ft ≈ 0.3 mm), tension 3 decimals in kN (1 N) or 1 decimal in lbf
 * (≈ 0.4 N), temperatures 1 decimal, percentages 1 decimal, latitude and longitude 7 decimals (≈ 1 cm).
 *
 * The results (solved tension, design sag, verdict…) come from a caller-supplied function, so the log does not
 * depend on how the assessment is done; a reading the caller cannot solve still gets a row, with the reason.
 */
import type { LineRecord } from '../records/line';
import type { ReadingRecord } from '../records/reading';
import type { SectionRecord } from '../records/section';
import type { SpanRecord } from '../records/span';
import type { StructureRecord } from '../records/structure';
import type { WireRecord } from '../records/wire';
import type { Measurement } from '../types';
import { type UnitSystem, fromSI, unitLabel } from '../units';
import {
  type CsvCell,
  type CsvWriteOptions,
  csvNumber,
  csvRecord,
  CSV_BYTE_ORDER_MARK,
  DEFAULT_CSV_BYTE_ORDER_MARK,
} from './csv';
import type { ExportJob } from './job';

/** What the assessment says about one reading, SI; every field optional. */
export interface ReadingResult {
  /** Solved horizontal tension, N. */
  horizontalTension?: number;
  /** Solved midspan sag, m. */
  sag?: number;
  /** Design midspan sag at the reading's conductor temperature, m. */
  designSag?: number;
  /** Design horizontal tension at that temperature, N (the printed report draws the design wire with it). */
  designHorizontalTension?: number;
  /** Measured minus design midspan sag, m (positive = slacker than design). */
  sagDeviation?: number;
  /** Highest support tension as a percentage of rated strength, % (e.g. 18.5). */
  percentOfRatedStrength?: number;
  /** Smallest ground clearance at the hottest design temperature minus the required clearance, m. */
  clearanceMargin?: number;
  /** 'within' | 'too-slack' | 'too-tight' | 'recheck', or any other word the caller uses. */
  verdict?: string;
  /** Why, in words. */
  verdictReason?: string;
  /** Set when the reading could not be solved: the plain-language message (verdict is then left empty). */
  error?: string;
  /** The solver's error code with `error` (core/errors SpanInputErrorCode), for screens and tests. */
  errorCode?: string;
}

/** Everything known about a reading, handed to the caller's result function. */
export interface ReadingContext {
  line: LineRecord;
  section: SectionRecord | undefined;
  span: SpanRecord;
  wire: WireRecord;
  reading: ReadingRecord;
  nearStructure: StructureRecord | undefined;
  farStructure: StructureRecord | undefined;
}

export interface InspectionLogInput {
  line: LineRecord;
  sections: readonly SectionRecord[];
  structures: readonly StructureRecord[];
  spans: readonly SpanRecord[];
  wires: readonly WireRecord[];
  readings: readonly ReadingRecord[];
  /** The assessment of one reading; absent leaves the result columns empty. */
  resultFor?: (context: ReadingContext) => ReadingResult | undefined;
}

/** Decimals of the number cells, by quantity and unit system (see the file comment). */
export const LOG_DECIMALS = {
  length: { metric: 3, us: 3 },
  tension: { metric: 3, us: 1 },
  temperature: { metric: 1, us: 1 },
  percent: { metric: 1, us: 1 },
  angle: { metric: 4, us: 4 },
  time: { metric: 2, us: 2 },
  degrees: { metric: 7, us: 7 },
} as const satisfies Record<string, Record<UnitSystem, number>>;

/** Words for the verdict ids of the assessment. */
export const LOG_VERDICT_LABELS: Readonly<Record<string, string>> = {
  within: 'Within tolerance',
  'too-slack': 'Too slack',
  'too-tight': 'Too tight',
  recheck: 'Measure again',
};

/** Words for the method ids. */
export const LOG_METHOD_LABELS: Readonly<Record<Measurement['method'], string>> = {
  'midspan-sag': 'Midspan sag',
  'offset-sag': 'Sag at an offset',
  'sight-line': 'Sight line between targets',
  'sight-angle': 'Sight angle from below a support',
  'return-wave': 'Return wave',
  'surveyed-points': 'Surveyed points',
};

/** The column titles, with units in `system`. */
export function inspectionLogHeader(system: UnitSystem): string[] {
  const length = unitLabel('length', system);
  const tension = unitLabel('tension', system);
  const temperature = unitLabel('temperature', system);
  return [
    'Line',
    'Section',
    'Span',
    'Near structure',
    'Far structure',
    `Span length (${length})`,
    'Wire',
    'Method',
    'Readings',
    `Conductor temperature (${temperature})`,
    `Ambient temperature (${temperature})`,
    'Taken at (UTC)',
    'Latitude (°)',
    'Longitude (°)',
    `Horizontal tension (${tension})`,
    `Sag (${length})`,
    `Design sag (${length})`,
    `Sag deviation (${length})`,
    'Rated strength used (%)',
    `Clearance margin (${length})`,
    'Verdict',
    'Reason',
    'Inspector',
    'Notes',
    'Reading id',
  ];
}

function lengthCell(value: number | undefined, system: UnitSystem): CsvCell {
  return value === undefined ? null : csvNumber(fromSI(value, 'length', system), LOG_DECIMALS.length[system]);
}

function temperatureCell(value: number | undefined, system: UnitSystem): CsvCell {
  return value === undefined
    ? null
    : csvNumber(fromSI(value, 'temperature', system), LOG_DECIMALS.temperature[system]);
}

/** "sag 1.234 m" style text of a length in `system` at log precision. */
function lengthText(label: string, value: number, system: UnitSystem): string {
  const shown = fromSI(value, 'length', system).toFixed(LOG_DECIMALS.length[system]);
  return `${label} ${shown} ${unitLabel('length', system)}`;
}

/**
 * The raw readings in words, in the line's units at log precision, e.g. "sag 1.234 m",
 * "offset 35.000 m; sag 1.180 m", "3 returns in 4.56 s", "angle 3.2500°".
 */
export function describeMeasurementForLog(measurement: Measurement, system: UnitSystem): string {
  switch (measurement.method) {
    case 'midspan-sag':
      return lengthText('sag', measurement.sag, system);
    case 'offset-sag':
      return `${lengthText('offset', measurement.x, system)}; ${lengthText('sag', measurement.sag, system)}`;
    case 'sight-line':
      return `${lengthText('near target drop', measurement.nearDrop, system)}; ${lengthText('far target drop', measurement.farDrop, system)}`;
    case 'sight-angle': {
      const degrees = fromSI(measurement.angle, 'angle', system).toFixed(LOG_DECIMALS.angle[system]);
      return `${lengthText('instrument drop', measurement.nearDrop, system)}; angle ${degrees}°`;
    }
    case 'return-wave':
      return `${measurement.returns} returns in ${measurement.seconds.toFixed(LOG_DECIMALS.time[system])} s`;
    case 'surveyed-points': {
      const points = measurement.points.map(
        (point) =>
          `(${fromSI(point.x, 'length', system).toFixed(LOG_DECIMALS.length[system])}, ${fromSI(point.z, 'length', system).toFixed(LOG_DECIMALS.length[system])})`,
      );
      return `${points.length} points (x, z in ${unitLabel('length', system)}): ${points.join(' ')}`;
    }
  }
}

/** Live (not deleted) readings of the line in log order: by span along the line, wire label, then time. */
export function inspectionLogContexts(input: InspectionLogInput): ReadingContext[] {
  const byId = <T extends { id: string; deleted: boolean }>(records: readonly T[]): Map<string, T> =>
    new Map(records.filter((record) => !record.deleted).map((record) => [record.id, record]));
  const sections = byId(input.sections);
  const structures = byId(input.structures);
  const spans = byId(input.spans);
  const wires = byId(input.wires);
  const contexts: ReadingContext[] = [];
  for (const reading of input.readings) {
    if (reading.deleted || reading.lineId !== input.line.id) continue;
    const span = spans.get(reading.spanId);
    const wire = wires.get(reading.wireId);
    if (!span || !wire) continue;
    contexts.push({
      line: input.line,
      section: sections.get(span.sectionId),
      span,
      wire,
      reading,
      nearStructure: structures.get(span.nearStructureId),
      farStructure: structures.get(span.farStructureId),
    });
  }
  const order = (context: ReadingContext): number => context.nearStructure?.order ?? Number.POSITIVE_INFINITY;
  return contexts.sort(
    (a, b) =>
      order(a) - order(b) ||
      compareText(a.span.id, b.span.id) ||
      compareText(a.wire.label, b.wire.label) ||
      compareText(a.reading.takenAt, b.reading.takenAt),
  );
}

/** Code-unit order: stable across devices and locales (and far faster than localeCompare on big lines). */
function compareText(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}

/** An ISO 8601 time with any offset, rewritten in UTC ('…Z') as the header promises; unreadable text as is. */
function utcTime(iso: string): string {
  const milliseconds = Date.parse(iso);
  return Number.isFinite(milliseconds) ? new Date(milliseconds).toISOString() : iso;
}

/** One row of the log (cells in header order). */
export function inspectionLogRow(context: ReadingContext, result: ReadingResult | undefined): CsvCell[] {
  const system = context.line.unitSystem;
  const { reading, span, wire, section, nearStructure, farStructure } = context;
  const near = nearStructure?.label ?? '';
  const far = farStructure?.label ?? '';
  const verdict =
    result?.verdict === undefined ? undefined : (LOG_VERDICT_LABELS[result.verdict] ?? result.verdict);
  const reason = result?.error ?? result?.verdictReason;
  const tension =
    result?.horizontalTension === undefined
      ? null
      : csvNumber(fromSI(result.horizontalTension, 'tension', system), LOG_DECIMALS.tension[system]);
  return [
    context.line.name,
    section?.name ?? '',
    `${near}–${far}`,
    near,
    far,
    lengthCell(span.length, system),
    wire.label,
    LOG_METHOD_LABELS[reading.measurement.method],
    describeMeasurementForLog(reading.measurement, system),
    temperatureCell(reading.conductorTemperature, system),
    temperatureCell(reading.ambientTemperature, system),
    utcTime(reading.takenAt),
    csvNumber(reading.location?.latitude, LOG_DECIMALS.degrees[system]),
    csvNumber(reading.location?.longitude, LOG_DECIMALS.degrees[system]),
    tension,
    lengthCell(result?.sag, system),
    lengthCell(result?.designSag, system),
    lengthCell(result?.sagDeviation, system),
    csvNumber(result?.percentOfRatedStrength, LOG_DECIMALS.percent[system]),
    lengthCell(result?.clearanceMargin, system),
    verdict ?? (result?.error === undefined ? '' : 'Not solved'),
    reason ?? '',
    reading.inspector,
    reading.notes ?? '',
    reading.id,
  ];
}

/**
 * The log as an export job: the byte-order mark and header first, then one piece per reading, each computed
 * (including the caller's result function) only when the piece is taken, so a screen can build it in slices.
 */
export function inspectionLogJob(input: InspectionLogInput, options: CsvWriteOptions = {}): ExportJob {
  const contexts = inspectionLogContexts(input);
  const withMark = options.byteOrderMark ?? DEFAULT_CSV_BYTE_ORDER_MARK;
  function* parts(): Generator<string> {
    yield (withMark ? CSV_BYTE_ORDER_MARK : '') + csvRecord(inspectionLogHeader(input.line.unitSystem));
    for (const context of contexts) yield csvRecord(inspectionLogRow(context, input.resultFor?.(context)));
  }
  return { total: contexts.length + 1, parts: parts() };
}

/** The whole log as one string. */
export function writeInspectionLog(input: InspectionLogInput, options: CsvWriteOptions = {}): string {
  return [...inspectionLogJob(input, options).parts].join('');
}
