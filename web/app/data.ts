// The app's view of storage: the few operations screens need, over the storage module (web/storage), which is
// the only code that touches IndexedDB. Screens import this, not web/storage directly.
import type { DraftRecord } from '../../core/records/draft';
import type { RecordByKind, RecordInput, RecordKind, RecordSet } from '../../core/records/kinds';
import type { LineRecord } from '../../core/records/line';

/**
 * Storage as the files panels need it (web/exports): whole record sets out, and records merged in by id and
 * revision, all or nothing. web/storage's store fits this as it is.
 */
export interface FileStore {
  exportAll(): Promise<{ records: RecordSet }>;
  exportLine(lineId: string): Promise<{ records: RecordSet }>;
  putRaw(batch: Partial<RecordSet>): Promise<{ written: number; unchanged: number }>;
  /** This device's id (stamped on records a span-list import creates). */
  deviceId(): string;
}

export interface AppData {
  listLines(): Promise<LineRecord[]>;
  /** Every live record of one line, grouped by kind; null when the line does not exist (or was removed). */
  loadLine(lineId: string): Promise<RecordSet | null>;
  save<K extends RecordKind>(kind: K, input: RecordInput<K>): Promise<RecordByKind[K]>;
  remove(kind: RecordKind, id: string): Promise<void>;
  saveDraft(key: string, values: Record<string, string>): Promise<void>;
  loadDraft(key: string): Promise<DraftRecord | null>;
  clearDraft(key: string): Promise<void>;
  /** Writes whole records as given (demo import). */
  putAll(records: RecordSet): Promise<void>;
  /** Exports, backups and imports. */
  files: FileStore;
  /** Stored values found invalid so far and set aside by storage (kept in its quarantine, not lost). */
  setAside(): { kind: string; key: string; issues: string }[];
}
