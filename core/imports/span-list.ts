/**
 * Span-list import: the office prepares a job as a CSV with one row per structure, in order along the line, and
 * the app previews what it would create (structures, tension sections, spans, wire positions) with a message
 * per faulty row before anything is written.
 *
 * Layout: row 1 is the header (column names below, any order, case and spacing free; a unit may follow in
 * parentheses, e.g. "span_length (ft)"). Each later row is a structure; the span between a row's structure and
 * the previous row's structure is described on the later row (its length, section, conductor, wires).
 * Lengths without a unit in the header are read in `unitSystem` (default the line's). Positions are WGS 84
 * degrees. When the file uses ';' as its delimiter (as spreadsheets in comma-decimal locales write), a decimal
 * comma is accepted too.
 */
import { CONDUCTOR_LIBRARY, conductorSpecFromLibrary, findConductor } from '../conductors';
import type { ConductorSpec } from '../records/conductor';
import { RECORD_SCHEMAS, type RecordKind, type RecordSet, emptyRecordSet } from '../records/kinds';
import type { LineRecord } from '../records/line';
import { newRecordMeta } from '../records/meta';
import type { SectionRecord } from '../records/section';
import type { SpanRecord } from '../records/span';
import type { StructureRecord } from '../records/structure';
import type { WireRecord } from '../records/wire';
import { type UnitSystem, METRES_PER_FOOT } from '../units';
import {
  type CsvCell,
  type CsvWriteOptions,
  csvNumber,
  restoreNeutralisedText,
  writeCsv,
} from '../exports/csv';
import { readCsvTable } from './csv-table';

export type SpanListColumnKey =
  | 'structure'
  | 'latitude'
  | 'longitude'
  | 'ground_elevation'
  | 'attachment_height'
  | 'attachment_elevation'
  | 'span_length'
  | 'section'
  | 'conductor'
  | 'wires'
  | 'required_clearance'
  | 'notes';

export interface SpanListColumn {
  key: SpanListColumnKey;
  /** 'length' columns take m or ft; 'degrees' columns take decimal degrees; text columns take no unit. */
  quantity: 'length' | 'degrees' | 'text';
  required: boolean;
  description: string;
}

/** The documented columns of the span-list template, in template order. */
export const SPAN_LIST_COLUMNS: readonly SpanListColumn[] = [
  {
    key: 'structure',
    quantity: 'text',
    required: true,
    description: 'Number or name on the structure, unique on the line.',
  },
  {
    key: 'latitude',
    quantity: 'degrees',
    required: false,
    description: 'WGS 84 latitude, decimal degrees north (−90…90).',
  },
  {
    key: 'longitude',
    quantity: 'degrees',
    required: false,
    description: 'WGS 84 longitude, decimal degrees east (−180…180).',
  },
  {
    key: 'ground_elevation',
    quantity: 'length',
    required: false,
    description: 'Ground elevation at the structure (one datum for the whole line).',
  },
  {
    key: 'attachment_height',
    quantity: 'length',
    required: false,
    description: 'Wire attachment height above the ground at the structure.',
  },
  {
    key: 'attachment_elevation',
    quantity: 'length',
    required: false,
    description: 'Attachment elevation; may replace ground_elevation + attachment_height.',
  },
  {
    key: 'span_length',
    quantity: 'length',
    required: false,
    description:
      'Horizontal length of the span from the previous row’s structure to this one; empty on the first row.',
  },
  {
    key: 'section',
    quantity: 'text',
    required: false,
    description: 'Tension section of that span; empty continues the previous span’s section.',
  },
  {
    key: 'conductor',
    quantity: 'text',
    required: false,
    description:
      'Conductor of that section: library id or code word (e.g. acsr-drake, Drake), once per new section.',
  },
  {
    key: 'wires',
    quantity: 'text',
    required: false,
    description: 'Wire positions of that span, separated by ";" or "|" (e.g. A;B;C).',
  },
  {
    key: 'required_clearance',
    quantity: 'length',
    required: false,
    description: 'Required ground clearance of that span (local codes govern).',
  },
  { key: 'notes', quantity: 'text', required: false, description: 'Notes on the structure.' },
];

const COLUMNS_BY_KEY = new Map(SPAN_LIST_COLUMNS.map((column) => [column.key, column]));

/** Section name used when the file has no section column or the first span leaves it empty. */
export const DEFAULT_IMPORTED_SECTION_NAME = 'Section 1';

/** Relative mismatch allowed between attachment_elevation and ground_elevation + attachment_height. */
export const ELEVATION_MATCH_TOLERANCE = 1e-6;

export interface SpanListImportOptions {
  /** The line the structures go on: its id, and its unit system as the default for unitless columns. */
  line: LineRecord;
  /** Unit system for length columns whose header names no unit; default the line's. */
  unitSystem?: UnitSystem;
  /** Live sections of the line: a row naming one of them adds spans to it. */
  existingSections?: readonly SectionRecord[];
  /** Live structures of the line: a label already used there is refused. */
  existingStructures?: readonly StructureRecord[];
  /** User-defined conductors, matched by name (case-insensitive) before the library. */
  conductors?: readonly ConductorSpec[];
  /** Meta of the new records (core has no clock and no randomness). */
  deviceId: string;
  now: string;
  newId: () => string;
}

/** One data row read and converted to SI (m, degrees). */
export interface SpanListRow {
  /** Row number in the file as a spreadsheet shows it (the header is row 1). */
  row: number;
  structure: string;
  latitude?: number;
  longitude?: number;
  groundElevation?: number;
  attachmentHeight?: number;
  /** Given, or ground elevation + attachment height. */
  attachmentElevation?: number;
  /** Span from the previous row's structure, m. */
  spanLength?: number;
  section?: string;
  conductor?: string;
  wires: string[];
  requiredClearance?: number;
  notes?: string;
}

export interface SpanListProblem {
  /** Row number as a spreadsheet shows it (1 = header). */
  row: number;
  /** Column key (or header text) concerned, when one is. */
  column?: string;
  message: string;
}

/** What an import would do; nothing is written until the caller applies `records` (only when `ok`). */
export interface SpanListPreview {
  ok: boolean;
  rows: SpanListRow[];
  errors: SpanListProblem[];
  /** New records for storage's putRaw; empty lists unless ok. */
  records: RecordSet;
  counts: { structures: number; sections: number; spans: number; wires: number };
}

interface HeaderColumn {
  index: number;
  column: SpanListColumn;
  /** Metres per unit of this column (length columns). */
  metresPerUnit: number;
}

const LENGTH_UNITS: Readonly<Record<string, number>> = {
  m: 1,
  metre: 1,
  metres: 1,
  meter: 1,
  meters: 1,
  ft: METRES_PER_FOOT,
  foot: METRES_PER_FOOT,
  feet: METRES_PER_FOOT,
};
const DEGREE_UNITS = new Set(['°', 'deg', 'degree', 'degrees']);
const PLAIN_NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;
const WIRE_SEPARATOR = /[;|]/;

function normaliseName(text: string): string {
  return text
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, '_');
}

/** Reads the header; returns the columns found or the problems with it. */
function readHeader(
  cells: readonly string[],
  defaultSystem: UnitSystem,
): { columns: HeaderColumn[]; problems: SpanListProblem[] } {
  const columns: HeaderColumn[] = [];
  const problems: SpanListProblem[] = [];
  const seen = new Set<SpanListColumnKey>();
  cells.forEach((raw, index) => {
    const text = raw.replace(/^\ufeff/, '').trim();
    if (text === '') return;
    const match = /^(.*?)\s*[([]\s*([^)\]]*?)\s*[)\]]\s*$/.exec(text);
    const name = normaliseName(match?.[1] ?? text);
    const unit = match?.[2]?.toLowerCase();
    const column = COLUMNS_BY_KEY.get(name as SpanListColumnKey);
    if (!column) {
      const known = SPAN_LIST_COLUMNS.map((entry) => entry.key).join(', ');
      problems.push({ row: 1, column: text, message: `Unknown column "${text}". Known columns: ${known}.` });
      return;
    }
    if (seen.has(column.key)) {
      problems.push({ row: 1, column: column.key, message: `Column "${column.key}" appears twice.` });
      return;
    }
    seen.add(column.key);
    let metresPerUnit = defaultSystem === 'us' ? METRES_PER_FOOT : 1;
    if (unit !== undefined && unit !== '') {
      if (column.quantity === 'length' && LENGTH_UNITS[unit] !== undefined)
        metresPerUnit = LENGTH_UNITS[unit];
      else if (column.quantity === 'degrees' && DEGREE_UNITS.has(unit)) metresPerUnit = 1;
      else {
        const expected =
          column.quantity === 'length' ? 'm or ft' : column.quantity === 'degrees' ? '°' : 'no unit';
        problems.push({
          row: 1,
          column: column.key,
          message: `Unit "${unit}" is not understood for column "${column.key}" (expected ${expected}).`,
        });
        return;
      }
    }
    columns.push({ index, column, metresPerUnit });
  });
  if (!seen.has('structure')) problems.push({ row: 1, message: 'The header needs a "structure" column.' });
  if (seen.has('latitude') !== seen.has('longitude')) {
    problems.push({ row: 1, message: 'Give both "latitude" and "longitude" columns, or neither.' });
  }
  return { columns, problems };
}

type CellValue = { ok: true; value: number | undefined } | { ok: false; message: string };

function readNumber(text: string, decimalComma: boolean): CellValue {
  const trimmed = text.trim().replace(/\u2212/g, '-');
  if (trimmed === '') return { ok: true, value: undefined };
  const normalised =
    decimalComma && /^[^,]*,[^,]*$/.test(trimmed) && !trimmed.includes('.')
      ? trimmed.replace(',', '.')
      : trimmed;
  if (!PLAIN_NUMBER.test(normalised)) return { ok: false, message: `"${trimmed}" is not a number` };
  const value = Number(normalised);
  return Number.isFinite(value) ? { ok: true, value } : { ok: false, message: `"${trimmed}" is too large` };
}

/** Reads one data row; problems are appended to `problems`. */
function readRow(
  cells: readonly string[],
  rowNumber: number,
  columns: readonly HeaderColumn[],
  decimalComma: boolean,
  problems: SpanListProblem[],
): SpanListRow {
  const row: SpanListRow = { row: rowNumber, structure: '', wires: [] };
  const numbers = new Map<SpanListColumnKey, number>();
  for (const { index, column, metresPerUnit } of columns) {
    const cell = cells[index] ?? '';
    if (column.quantity === 'text') {
      const text = restoreNeutralisedText(cell.trim());
      if (text === '') continue;
      if (column.key === 'structure') row.structure = text;
      else if (column.key === 'section') row.section = text;
      else if (column.key === 'conductor') row.conductor = text;
      else if (column.key === 'notes') row.notes = text;
      else if (column.key === 'wires') {
        row.wires = [...new Set(text.split(WIRE_SEPARATOR).map((label) => label.trim()))].filter(Boolean);
      }
      continue;
    }
    const parsed = readNumber(restoreNeutralisedText(cell.trim()), decimalComma);
    if (!parsed.ok) {
      problems.push({ row: rowNumber, column: column.key, message: `${column.key}: ${parsed.message}.` });
    } else if (parsed.value !== undefined) {
      numbers.set(column.key, column.quantity === 'length' ? parsed.value * metresPerUnit : parsed.value);
    }
  }
  const complain = (column: SpanListColumnKey, message: string): void => {
    problems.push({ row: rowNumber, column, message: `${column}: ${message}` });
  };
  if (row.structure === '') complain('structure', 'give the structure number or name.');

  const latitude = numbers.get('latitude');
  const longitude = numbers.get('longitude');
  if ((latitude === undefined) !== (longitude === undefined)) {
    complain(
      latitude === undefined ? 'latitude' : 'longitude',
      'give both latitude and longitude, or neither.',
    );
  } else if (latitude !== undefined && longitude !== undefined) {
    if (Math.abs(latitude) > 90) complain('latitude', `${latitude} is outside −90…90 degrees.`);
    else if (Math.abs(longitude) > 180) complain('longitude', `${longitude} is outside −180…180 degrees.`);
    else {
      row.latitude = latitude;
      row.longitude = longitude;
    }
  }

  const ground = numbers.get('ground_elevation');
  const height = numbers.get('attachment_height');
  const given = numbers.get('attachment_elevation');
  if (height !== undefined && height < 0) complain('attachment_height', 'must not be negative.');
  row.groundElevation = ground;
  row.attachmentHeight = height !== undefined && height >= 0 ? height : undefined;
  const summed =
    ground !== undefined && row.attachmentHeight !== undefined ? ground + row.attachmentHeight : undefined;
  if (given !== undefined && summed !== undefined) {
    if (Math.abs(given - summed) > ELEVATION_MATCH_TOLERANCE * Math.max(1, Math.abs(given))) {
      complain(
        'attachment_elevation',
        'differs from ground_elevation + attachment_height; give one or make them agree.',
      );
    }
  }
  row.attachmentElevation = given ?? summed;
  if (row.attachmentHeight === undefined && ground !== undefined && given !== undefined && given >= ground) {
    row.attachmentHeight = given - ground;
  }

  const spanLength = numbers.get('span_length');
  if (spanLength !== undefined && spanLength <= 0) complain('span_length', 'must be greater than zero.');
  else row.spanLength = spanLength;
  const clearance = numbers.get('required_clearance');
  if (clearance !== undefined && clearance < 0) complain('required_clearance', 'must not be negative.');
  else row.requiredClearance = clearance;
  return row;
}

/** Library conductor → the spec stored with a section. */
function specFromLibrary(idOrName: string): ConductorSpec | undefined {
  const conductor = findConductor(idOrName);
  return conductor ? conductorSpecFromLibrary(conductor) : undefined;
}

function findSpec(idOrName: string, own: readonly ConductorSpec[]): ConductorSpec | undefined {
  const key = idOrName.trim().toLowerCase();
  const mine = own.find((spec) => spec.name.toLowerCase() === key || spec.libraryId?.toLowerCase() === key);
  return mine ? { ...mine } : specFromLibrary(key);
}

/**
 * Reads a span-list CSV and previews the records it would create. Never throws and writes nothing: the caller
 * shows `rows` and `errors`, and applies `records` (e.g. storage putRaw) only when `ok`.
 */
export function previewSpanList(text: string, options: SpanListImportOptions): SpanListPreview {
  const table = readCsvTable(text);
  const errors: SpanListProblem[] = table.problems.map((problem) => ({
    row: (problem.rowIndex ?? 0) + 1,
    message: `The file could not be read here: ${problem.message}.`,
  }));
  const empty = (): SpanListPreview => ({
    ok: false,
    rows: [],
    errors,
    records: emptyRecordSet(),
    counts: { structures: 0, sections: 0, spans: 0, wires: 0 },
  });
  const headerIndex = table.rows.findIndex((cells) => cells.some((cell) => cell.trim() !== ''));
  const headerCells = table.rows[headerIndex];
  if (headerCells === undefined) {
    errors.push({ row: 1, message: 'The file is empty: it needs a header row and one row per structure.' });
    return empty();
  }
  const header = readHeader(headerCells, options.unitSystem ?? options.line.unitSystem);
  errors.push(...header.problems);
  if (header.problems.length > 0) return empty();

  const decimalComma = table.delimiter !== ',';
  const rows: SpanListRow[] = [];
  table.rows.forEach((cells, index) => {
    if (index <= headerIndex || cells.every((cell) => cell.trim() === '')) return;
    rows.push(readRow(cells, index + 1, header.columns, decimalComma, errors));
  });
  if (rows.length === 0) errors.push({ row: headerIndex + 2, message: 'No structures below the header.' });

  checkLineRules(rows, options, errors);
  errors.sort((a, b) => a.row - b.row);
  if (errors.length > 0) return { ...empty(), rows };
  return buildRecords(rows, options, errors);
}

/** Rules across rows: unique labels, spans and elevations, sections and their conductors. */
function checkLineRules(
  rows: readonly SpanListRow[],
  options: SpanListImportOptions,
  errors: SpanListProblem[],
): void {
  const existingLabels = new Set(
    (options.existingStructures ?? []).filter((s) => !s.deleted).map((s) => s.label.toLowerCase()),
  );
  const labels = new Map<string, number>();
  const sectionConductor = new Map<string, string>();
  for (const section of options.existingSections ?? []) {
    if (!section.deleted) sectionConductor.set(section.name.toLowerCase(), section.conductor.name);
  }
  const own = options.conductors ?? [];
  let currentSection: string | undefined;
  rows.forEach((row, position) => {
    const label = row.structure.toLowerCase();
    if (label !== '') {
      if (existingLabels.has(label)) {
        errors.push({
          row: row.row,
          column: 'structure',
          message: `structure: "${row.structure}" is already on this line.`,
        });
      } else if (labels.has(label)) {
        errors.push({
          row: row.row,
          column: 'structure',
          message: `structure: "${row.structure}" is also on row ${labels.get(label)}; labels must be unique.`,
        });
      } else labels.set(label, row.row);
    }
    if (rows.length > 1 && row.attachmentElevation === undefined) {
      errors.push({
        row: row.row,
        column: 'attachment_elevation',
        message:
          'attachment_elevation: give it, or ground_elevation and attachment_height, so the span rise is known.',
      });
    }
    if (position === 0) {
      for (const column of ['span_length', 'section', 'conductor', 'wires', 'required_clearance'] as const) {
        const present =
          column === 'span_length'
            ? row.spanLength
            : column === 'wires'
              ? row.wires[0]
              : row[columnField(column)];
        if (present !== undefined) {
          errors.push({
            row: row.row,
            column,
            message: `${column}: the first structure has no span before it; describe each span on the row of its far structure.`,
          });
        }
      }
      return;
    }
    if (row.spanLength === undefined) {
      errors.push({
        row: row.row,
        column: 'span_length',
        message: 'span_length: give the length of the span from the previous structure.',
      });
    }
    const sectionName = row.section ?? currentSection ?? DEFAULT_IMPORTED_SECTION_NAME;
    currentSection = sectionName;
    const key = sectionName.toLowerCase();
    const known = sectionConductor.get(key);
    if (row.conductor !== undefined) {
      const spec = findSpec(row.conductor, own);
      if (!spec) {
        const names = CONDUCTOR_LIBRARY.slice(0, 4)
          .map((c) => c.id)
          .join(', ');
        errors.push({
          row: row.row,
          column: 'conductor',
          message: `conductor: "${row.conductor}" is neither a conductor of this project nor in the library (e.g. ${names}).`,
        });
      } else if (known !== undefined && known !== spec.name) {
        errors.push({
          row: row.row,
          column: 'conductor',
          message: `conductor: section "${sectionName}" already has conductor ${known}; one section has one conductor.`,
        });
      } else sectionConductor.set(key, spec.name);
    } else if (known === undefined) {
      errors.push({
        row: row.row,
        column: 'conductor',
        message: `conductor: section "${sectionName}" needs a conductor on its first span (library id or name).`,
      });
      sectionConductor.set(key, '');
    }
  });
}

function columnField(
  column: 'section' | 'conductor' | 'required_clearance',
): 'section' | 'conductor' | 'requiredClearance' {
  return column === 'required_clearance' ? 'requiredClearance' : column;
}

/** Creates the records of a checked list and validates each against its schema. */
function buildRecords(
  rows: readonly SpanListRow[],
  options: SpanListImportOptions,
  errors: SpanListProblem[],
): SpanListPreview {
  const records = emptyRecordSet();
  const lineId = options.line.id;
  const meta = (): ReturnType<typeof newRecordMeta> =>
    newRecordMeta(options.deviceId, options.now, options.newId());
  const firstOrder =
    Math.max(0, ...(options.existingStructures ?? []).filter((s) => !s.deleted).map((s) => s.order)) + 1;
  const sectionIds = new Map<string, string>();
  for (const section of options.existingSections ?? []) {
    if (!section.deleted) sectionIds.set(section.name.toLowerCase(), section.id);
  }
  const own = options.conductors ?? [];
  const check = <K extends RecordKind>(kind: K, value: unknown, row: number): void => {
    const result = RECORD_SCHEMAS[kind].safeParse(value);
    if (result.success) (records[kind] as unknown[]).push(result.data);
    else {
      const issue = result.error.issues[0];
      errors.push({
        row,
        message: `${kind} record: ${issue?.path.join('.') ?? ''} ${issue?.message ?? 'invalid'}`,
      });
    }
  };

  let previous: StructureRecord | undefined;
  let previousRow: SpanListRow | undefined;
  let currentSection = DEFAULT_IMPORTED_SECTION_NAME;
  rows.forEach((row, position) => {
    const structure: StructureRecord = {
      ...meta(),
      lineId,
      label: row.structure,
      order: firstOrder + position,
      ...(row.latitude !== undefined && row.longitude !== undefined
        ? { position: { latitude: row.latitude, longitude: row.longitude } }
        : {}),
      ...(row.groundElevation !== undefined ? { groundElevation: row.groundElevation } : {}),
      ...(row.attachmentHeight !== undefined ? { attachmentHeight: row.attachmentHeight } : {}),
      ...(row.notes !== undefined ? { notes: row.notes } : {}),
    };
    check('structure', structure, row.row);
    if (previous && previousRow && position > 0) {
      currentSection = row.section ?? currentSection;
      const key = currentSection.toLowerCase();
      let sectionId = sectionIds.get(key);
      if (sectionId === undefined) {
        const conductor = row.conductor === undefined ? undefined : findSpec(row.conductor, own);
        const section: SectionRecord | undefined = conductor && {
          ...meta(),
          lineId,
          name: currentSection,
          conductor,
        };
        if (section) {
          sectionId = section.id;
          sectionIds.set(key, section.id);
          check('section', section, row.row);
        }
      }
      const span: SpanRecord = {
        ...meta(),
        lineId,
        sectionId: sectionId ?? '',
        nearStructureId: previous.id,
        farStructureId: structure.id,
        length: row.spanLength ?? 0,
        nearAttachmentElevation: previousRow.attachmentElevation ?? Number.NaN,
        farAttachmentElevation: row.attachmentElevation ?? Number.NaN,
        ...(previousRow.groundElevation !== undefined
          ? { nearGroundElevation: previousRow.groundElevation }
          : {}),
        ...(row.groundElevation !== undefined ? { farGroundElevation: row.groundElevation } : {}),
        ...(row.requiredClearance !== undefined ? { requiredClearance: row.requiredClearance } : {}),
      };
      check('span', span, row.row);
      for (const label of row.wires) {
        const wire: WireRecord = { ...meta(), lineId, spanId: span.id, label, nearOffset: 0, farOffset: 0 };
        check('wire', wire, row.row);
      }
    }
    previous = structure;
    previousRow = row;
  });

  const ok = errors.length === 0;
  const counts = {
    structures: records.structure.length,
    sections: records.section.length,
    spans: records.span.length,
    wires: records.wire.length,
  };
  return { ok, rows: [...rows], errors, records: ok ? records : emptyRecordSet(), counts };
}

/** Example rows of the template (invented structures; the library conductor Partridge). */
const TEMPLATE_EXAMPLE = [
  {
    structure: 'K-1',
    latitude: 46.2001,
    longitude: 6.1402,
    ground: 402.5,
    height: 10.5,
    span: '',
    section: '',
    conductor: '',
    wires: '',
  },
  {
    structure: 'K-2',
    latitude: 46.2009,
    longitude: 6.1411,
    ground: 404.1,
    height: 10.5,
    span: 106.2,
    section: 'Mill road',
    conductor: 'acsr-partridge',
    wires: 'A;B;C',
  },
  {
    structure: 'K-3',
    latitude: 46.2017,
    longitude: 6.142,
    ground: 401.8,
    height: 12,
    span: 98.7,
    section: '',
    conductor: '',
    wires: 'A;B;C',
  },
] as const;

/** The template header in `system` (lengths labelled m or ft). */
export function spanListTemplateHeader(system: UnitSystem): string[] {
  const unit = system === 'us' ? 'ft' : 'm';
  return SPAN_LIST_COLUMNS.map((column) =>
    column.quantity === 'length'
      ? `${column.key} (${unit})`
      : column.quantity === 'degrees'
        ? `${column.key} (deg)`
        : column.key,
  );
}

/**
 * A template CSV to fill in: the documented header in `system` and three example rows (invented structures),
 * written with the project's CSV writer (byte-order mark by default, for spreadsheets).
 */
export function spanListTemplate(system: UnitSystem, options: CsvWriteOptions = {}): string {
  const perMetre = system === 'us' ? 1 / METRES_PER_FOOT : 1;
  const length = (metres: number | ''): CsvCell => (metres === '' ? null : csvNumber(metres * perMetre, 2));
  const rows = TEMPLATE_EXAMPLE.map((example) =>
    SPAN_LIST_COLUMNS.map((column): CsvCell => {
      switch (column.key) {
        case 'structure':
          return example.structure;
        case 'latitude':
          return csvNumber(example.latitude, 4);
        case 'longitude':
          return csvNumber(example.longitude, 4);
        case 'ground_elevation':
          return length(example.ground);
        case 'attachment_height':
          return length(example.height);
        case 'span_length':
          return length(example.span);
        case 'section':
          return example.section;
        case 'conductor':
          return example.conductor;
        case 'wires':
          return example.wires;
        default:
          return '';
      }
    }),
  );
  return writeCsv(spanListTemplateHeader(system), rows, options);
}
