// IndexedDB layout of Spanlog and its numbered upgrade steps. Only web/storage/ opens the database.
import type { DBSchema, IDBPDatabase, IDBPTransaction, StoreNames } from 'idb';
import type {
  DraftRecord,
  LineRecord,
  ReadingRecord,
  RecordKind,
  SectionRecord,
  SpanRecord,
  StructureRecord,
  WireRecord,
} from '../../core';

/** Default database name; tests pass their own. */
export const DB_NAME = 'spanlog';

/**
 * Current schema version. History (never rewrite a step, add one):
 * 1. one store per record kind (keyPath 'id'), a 'by-line' index on every child kind, a 'meta' key-value store.
 * 2. 'drafts' (keyPath 'key') for autosaved forms, 'quarantine' for records that failed validation, and
 *    'by-span' / 'by-wire' indexes on wires and readings.
 */
export const DB_VERSION = 2;

/** device-local settings: { key: 'deviceId', value: '…' }. */
export interface MetaEntry {
  key: string;
  value: string;
}

/** A stored value that failed validation, moved aside with the reason so that it can be inspected or repaired. */
export interface QuarantineEntry {
  /** `${store}/${recordKey}`. */
  key: string;
  store: string;
  recordKey: string;
  value: unknown;
  issues: string;
  /** ISO 8601 time it was set aside. */
  foundAt: string;
}

export interface SpanlogDB extends DBSchema {
  line: { key: string; value: LineRecord };
  section: { key: string; value: SectionRecord; indexes: { 'by-line': string } };
  structure: { key: string; value: StructureRecord; indexes: { 'by-line': string } };
  span: { key: string; value: SpanRecord; indexes: { 'by-line': string } };
  wire: { key: string; value: WireRecord; indexes: { 'by-line': string; 'by-span': string } };
  reading: {
    key: string;
    value: ReadingRecord;
    indexes: { 'by-line': string; 'by-span': string; 'by-wire': string };
  };
  meta: { key: string; value: MetaEntry };
  drafts: { key: string; value: DraftRecord };
  quarantine: { key: string; value: QuarantineEntry };
}

/** Record kinds stored with a 'by-line' index (every kind but the line itself). */
export const CHILD_KINDS = [
  'section',
  'structure',
  'span',
  'wire',
  'reading',
] as const satisfies readonly RecordKind[];

/**
 * Brings a database at `oldVersion` up to DB_VERSION, one step at a time. Runs inside the version-change
 * transaction that idb hands to `upgrade`.
 */
export function upgradeSpanlogDb(
  db: IDBPDatabase<SpanlogDB>,
  oldVersion: number,
  transaction: IDBPTransaction<SpanlogDB, StoreNames<SpanlogDB>[], 'versionchange'>,
): void {
  if (oldVersion < 1) {
    db.createObjectStore('line', { keyPath: 'id' });
    for (const kind of CHILD_KINDS) {
      db.createObjectStore(kind, { keyPath: 'id' }).createIndex('by-line', 'lineId');
    }
    db.createObjectStore('meta', { keyPath: 'key' });
  }
  if (oldVersion < 2) {
    db.createObjectStore('drafts', { keyPath: 'key' });
    db.createObjectStore('quarantine', { keyPath: 'key' });
    transaction.objectStore('wire').createIndex('by-span', 'spanId');
    transaction.objectStore('reading').createIndex('by-span', 'spanId');
    transaction.objectStore('reading').createIndex('by-wire', 'wireId');
  }
}
