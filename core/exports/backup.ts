/**
 * Full JSON backup of one line or of every line: all records with their ids, revisions and tombstones, so that
 * importing it elsewhere (or again) restores exactly what was stored.
 *
 * File layout (version 1):
 * ```json
 * { "format": "spanlog-backup", "version": 1, "exportedAt": "2026-05-14T08:31:00.000Z",
 *   "scope": { "lineIds": ["…"] },
 *   "records": { "lines": [ … ], "sections": [ … ], "structures": [ … ], "spans": [ … ], "wires": [ … ],
 *                "readings": [ … ] } }
 * ```
 * One record per text line keeps large files readable and friendly to line-based diff tools.
 */
import { RECORD_KINDS, type RecordKind, type RecordSet, emptyRecordSet } from '../records/kinds';
import type { ExportJob } from './job';

export const BACKUP_FORMAT = 'spanlog-backup';
export const BACKUP_VERSION = 1;

/** Records per piece of {@link backupJsonParts}: big enough to keep overhead low, small enough to slice well. */
export const BACKUP_RECORDS_PER_PART = 250;

/** Record kind → the key of its array in the file. */
export const BACKUP_KEYS = {
  line: 'lines',
  section: 'sections',
  structure: 'structures',
  span: 'spans',
  wire: 'wires',
  reading: 'readings',
} as const satisfies Record<RecordKind, string>;

export type BackupKey = (typeof BACKUP_KEYS)[RecordKind];

export interface BackupFile {
  format: typeof BACKUP_FORMAT;
  version: typeof BACKUP_VERSION;
  /** ISO 8601 time of the export (passed in: core has no clock). */
  exportedAt: string;
  /** Lines the file covers. */
  scope: { lineIds: string[] };
  records: { [K in RecordKind as (typeof BACKUP_KEYS)[K]]: RecordSet[K] };
}

/** The records of one line (the line itself and every record whose lineId is it), tombstones included. */
export function selectLineRecords(all: RecordSet, lineId: string): RecordSet {
  const selected = emptyRecordSet();
  selected.line = all.line.filter((line) => line.id === lineId);
  selected.section = all.section.filter((record) => record.lineId === lineId);
  selected.structure = all.structure.filter((record) => record.lineId === lineId);
  selected.span = all.span.filter((record) => record.lineId === lineId);
  selected.wire = all.wire.filter((record) => record.lineId === lineId);
  selected.reading = all.reading.filter((record) => record.lineId === lineId);
  return selected;
}

/** The backup object for `records` (everything given is written, tombstones included). */
export function buildBackup(records: RecordSet, exportedAt: string): BackupFile {
  return {
    format: BACKUP_FORMAT,
    version: BACKUP_VERSION,
    exportedAt,
    scope: { lineIds: records.line.map((line) => line.id) },
    records: {
      lines: records.line,
      sections: records.section,
      structures: records.structure,
      spans: records.span,
      wires: records.wire,
      readings: records.reading,
    },
  };
}

/** Number of records in a set: the unit of progress for {@link backupJsonParts}. */
export function countBackupRecords(records: RecordSet): number {
  return RECORD_KINDS.reduce((sum, kind) => sum + records[kind].length, 0);
}

/**
 * The backup text in pieces: an opening, then the records in pieces of {@link BACKUP_RECORDS_PER_PART}, then the closing, so a caller can build a
 * big file a slice at a time (and hand the pieces to a Blob without joining them). Joined, the pieces are
 * valid JSON equal to {@link buildBackup}'s object.
 */
export function* backupJsonParts(records: RecordSet, exportedAt: string): Generator<string> {
  const head = {
    format: BACKUP_FORMAT,
    version: BACKUP_VERSION,
    exportedAt,
    scope: { lineIds: records.line.map((line) => line.id) },
  };
  const headText = JSON.stringify(head);
  yield `${headText.slice(0, -1)},\n"records": {`;
  let firstKind = true;
  for (const kind of RECORD_KINDS) {
    yield `${firstKind ? '' : ','}\n"${BACKUP_KEYS[kind]}": [`;
    firstKind = false;
    const list: readonly unknown[] = records[kind];
    for (let start = 0; start < list.length; start += BACKUP_RECORDS_PER_PART) {
      const batch = list
        .slice(start, start + BACKUP_RECORDS_PER_PART)
        .map((record) => JSON.stringify(record));
      yield `${start === 0 ? '' : ','}\n${batch.join(',\n')}`;
    }
    yield list.length === 0 ? ']' : '\n]';
  }
  yield '\n}}\n';
}

/** {@link backupJsonParts} with its piece count, for progress. */
export function backupJsonJob(records: RecordSet, exportedAt: string): ExportJob {
  return {
    total:
      2 +
      2 * RECORD_KINDS.length +
      RECORD_KINDS.reduce((sum, kind) => sum + Math.ceil(records[kind].length / BACKUP_RECORDS_PER_PART), 0),
    parts: backupJsonParts(records, exportedAt),
  };
}

/** The whole backup as one string. */
export function writeBackupJson(records: RecordSet, exportedAt: string): string {
  return [...backupJsonParts(records, exportedAt)].join('');
}

/** Suggested file extension and media type. */
export const BACKUP_MEDIA_TYPE = 'application/json';
