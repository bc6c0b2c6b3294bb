/**
 * Reading a JSON backup back in. Everything is checked before anything is written: the envelope, every record
 * against its zod schema, ids unique per kind, and references between records. The first problem found is
 * reported by kind, position, id, field path and what is wrong; the caller then writes nothing. A valid file
 * yields the records grouped by kind, ready for the storage's merge-by-revision (which makes a second import of
 * the same file change nothing).
 */
import { z } from 'zod';
import {
  RECORD_KINDS,
  RECORD_SCHEMAS,
  type RecordKind,
  type RecordSet,
  emptyRecordSet,
} from '../records/kinds';
import { BACKUP_FORMAT, BACKUP_KEYS, BACKUP_VERSION } from '../exports/backup';

export type BackupProblemCode =
  | 'not-json'
  | 'not-a-backup'
  | 'version-unsupported'
  | 'records-missing'
  | 'unknown-kind'
  | 'record-invalid'
  | 'duplicate-id'
  | 'dangling-reference';

/** What is wrong with a backup file, in words and as data (for a message that points at the record). */
export interface BackupProblem {
  code: BackupProblemCode;
  /** Plain-language sentence for the person importing, ending with "Nothing was imported." */
  message: string;
  kind?: RecordKind;
  /** 0-based position in the kind's array. */
  index?: number;
  id?: string;
  /** Field path inside the record, e.g. "measurement.sag". */
  path?: string;
}

export type BackupParseResult =
  | { ok: true; records: RecordSet; exportedAt: string; lineIds: string[] }
  | { ok: false; problem: BackupProblem };

const NOTHING_IMPORTED = 'Nothing was imported.';

const envelopeSchema = z.object({
  format: z.literal(BACKUP_FORMAT),
  version: z.number(),
  exportedAt: z.string(),
  scope: z.object({ lineIds: z.array(z.string()) }).optional(),
  records: z.record(z.string(), z.unknown()),
});

/** Fields that point at a parent record, per kind. */
const REFERENCES: { [K in RecordKind]: readonly { field: string; kind: RecordKind }[] } = {
  line: [],
  section: [{ field: 'lineId', kind: 'line' }],
  structure: [{ field: 'lineId', kind: 'line' }],
  span: [
    { field: 'lineId', kind: 'line' },
    { field: 'sectionId', kind: 'section' },
    { field: 'nearStructureId', kind: 'structure' },
    { field: 'farStructureId', kind: 'structure' },
  ],
  wire: [
    { field: 'lineId', kind: 'line' },
    { field: 'spanId', kind: 'span' },
  ],
  reading: [
    { field: 'lineId', kind: 'line' },
    { field: 'spanId', kind: 'span' },
    { field: 'wireId', kind: 'wire' },
  ],
};

function fail(problem: Omit<BackupProblem, 'message'>, message: string): BackupParseResult {
  return { ok: false, problem: { ...problem, message: `${message} ${NOTHING_IMPORTED}` } };
}

function idOf(value: unknown): string | undefined {
  if (typeof value !== 'object' || value === null || !('id' in value)) return undefined;
  return typeof value.id === 'string' ? value.id : undefined;
}

function describeRecord(kind: RecordKind, index: number, id: string | undefined): string {
  return `${kind} record #${index + 1}${id ? ` (id ${id})` : ''}`;
}

const KEY_TO_KIND = new Map<string, RecordKind>(RECORD_KINDS.map((kind) => [BACKUP_KEYS[kind], kind]));

/**
 * Parses and validates a backup file's text (a leading byte-order mark is ignored). Never throws; on failure
 * the problem names the first invalid record, and the caller must write nothing.
 */
export function parseBackup(text: string): BackupParseResult {
  let data: unknown;
  try {
    data = JSON.parse(text.startsWith('\ufeff') ? text.slice(1) : text);
  } catch (error) {
    const detail = error instanceof Error ? error.message : String(error);
    return fail({ code: 'not-json' }, `This file is not valid JSON (${detail}).`);
  }

  const envelope = envelopeSchema.safeParse(data);
  if (!envelope.success) {
    const looksLikeBackup =
      typeof data === 'object' && data !== null && (data as { format?: unknown }).format === BACKUP_FORMAT;
    if (!looksLikeBackup) return fail({ code: 'not-a-backup' }, 'This file is not a Spanlog backup.');
    const issue = envelope.error.issues[0];
    const path = issue?.path.map(String).join('.') ?? '';
    return fail(
      { code: 'records-missing', path },
      `The backup's outline is damaged at "${path || '(top)'}": ${issue?.message ?? 'unreadable'}.`,
    );
  }
  const { version, exportedAt, records: rawRecords } = envelope.data;
  if (version !== BACKUP_VERSION) {
    return fail(
      { code: 'version-unsupported' },
      `This backup is format version ${version}; this app reads version ${BACKUP_VERSION}. Update the app and try again.`,
    );
  }
  for (const key of Object.keys(rawRecords)) {
    if (!KEY_TO_KIND.has(key)) {
      return fail({ code: 'unknown-kind' }, `The backup holds records of an unknown kind "${key}".`);
    }
  }

  const records = emptyRecordSet();
  const idsByKind = new Map<RecordKind, Set<string>>();
  for (const kind of RECORD_KINDS) {
    const key = BACKUP_KEYS[kind];
    const list = rawRecords[key] ?? [];
    if (!Array.isArray(list)) {
      return fail(
        { code: 'records-missing', kind, path: key },
        `"records.${key}" in the backup is not a list.`,
      );
    }
    const ids = new Set<string>();
    for (const [index, value] of (list as unknown[]).entries()) {
      const id = idOf(value);
      const result = RECORD_SCHEMAS[kind].safeParse(value);
      if (!result.success) {
        const issue = result.error.issues[0];
        const path = issue?.path.map(String).join('.') ?? '';
        return fail(
          { code: 'record-invalid', kind, index, ...(id ? { id } : {}), path },
          `${describeRecord(kind, index, id)} is invalid at "${path || '(whole record)'}": ${issue?.message ?? 'unreadable'}.`,
        );
      }
      const record = result.data;
      if (ids.has(record.id)) {
        return fail(
          { code: 'duplicate-id', kind, index, id: record.id },
          `${describeRecord(kind, index, record.id)} repeats an id already used by another ${kind} in the file.`,
        );
      }
      ids.add(record.id);
      (records[kind] as unknown[]).push(record);
    }
    idsByKind.set(kind, ids);
  }

  for (const kind of RECORD_KINDS) {
    for (const [index, record] of records[kind].entries()) {
      for (const reference of REFERENCES[kind]) {
        const target = (record as unknown as Record<string, unknown>)[reference.field];
        if (typeof target === 'string' && !idsByKind.get(reference.kind)?.has(target)) {
          return fail(
            { code: 'dangling-reference', kind, index, id: record.id, path: reference.field },
            `${describeRecord(kind, index, record.id)} refers to ${reference.kind} ${target} (${reference.field}), which is not in the backup.`,
          );
        }
      }
    }
  }

  return { ok: true, records, exportedAt, lineIds: records.line.map((line) => line.id) };
}
