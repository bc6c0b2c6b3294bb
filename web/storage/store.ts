// The one module that owns IndexedDB. Every read is validated with the record schemas from core/records; a value
// that fails is moved to the 'quarantine' store and reported, and the rest still load. Time and ids are injected.
//
//   const store = await openStore();                  // or openStore({ name, now, newId, onRejected, ... })
//   store.listLines() / loadLine(id) / get(kind, id)  // validated reads, tombstones hidden unless asked
//   store.save(kind, input) / remove(kind, id)        // local edits: stamped meta, revision + 1, tombstones
//   store.putRaw(batch) / exportAll() / exportLine(id) // import and sync: all or nothing, merge by revision
//   store.saveDraft / loadDraft / clearDraft / listDrafts, scanAll(), listQuarantine(), requestPersistence()
import { openDB, type IDBPDatabase } from 'idb';
import {
  RECORD_KINDS,
  describeRecordId,
  draftRecordSchema,
  emptyRecordSet,
  incomingWins,
  newRecordMeta,
  summarizeIssues,
  validateRecord,
  type DraftRecord,
  type LineRecord,
  type RecordByKind,
  type RecordInput,
  type RecordKind,
  type RecordMeta,
  type RecordSet,
} from '../../core';
import { RecordValidationError } from './errors';
import { requestPersistentStorage, type PersistableStorage } from './persistence';
import {
  CHILD_KINDS,
  DB_NAME,
  DB_VERSION,
  upgradeSpanlogDb,
  type QuarantineEntry,
  type SpanlogDB,
} from './schema';

export interface StoreOptions {
  /** Database name (default 'spanlog'); tests use a fresh name each. */
  name?: string;
  /** Current time as ISO 8601 (default: new Date().toISOString()). */
  now?: () => string;
  /** A fresh UUID (default: crypto.randomUUID()). */
  newId?: () => string;
  /** Told about every value set aside as invalid, whichever call found it (e.g. to show a notice). */
  onRejected?: (rejected: RejectedRecord[]) => void;
  /** Another tab wants a newer schema: this connection has been closed; ask the user to reload. */
  onBlocking?: () => void;
  /** An older tab keeps the database open, so this upgrade waits until that tab closes; tell the user. */
  onBlocked?: () => void;
}

/** A stored value that failed validation: it was moved to the quarantine store and left out of the result. */
export interface RejectedRecord {
  kind: RecordKind | 'draft';
  /** Its id (draft: its key), or '(no id)'. */
  key: string;
  /** Readable list of problems by field path. */
  issues: string;
}

/** A line with everything under it, sorted for display. Tombstoned records are left out unless asked for. */
export interface LineBundle {
  line: LineRecord;
  /** By name. */
  sections: RecordByKind['section'][];
  /** By order. */
  structures: RecordByKind['structure'][];
  /** In the order of their near structures. */
  spans: RecordByKind['span'][];
  /** By label. */
  wires: RecordByKind['wire'][];
  /** By takenAt. */
  readings: RecordByKind['reading'][];
  rejected: RejectedRecord[];
}

/** Records by kind (tombstones included) plus anything set aside while reading them. */
export interface RecordExport {
  records: RecordSet;
  rejected: RejectedRecord[];
}

/** What putRaw did: records written, and records skipped because the stored copy was as new or newer. */
export interface PutRawResult {
  written: number;
  unchanged: number;
}

/** Records to apply, by kind, as unknown values (they are validated first). RecordSet fits. */
export type RawBatch = Partial<Record<RecordKind, readonly unknown[]>>;

type Db = IDBPDatabase<SpanlogDB>;

/**
 * Opens (creating or upgrading) the Spanlog database and returns the store API.
 * The device id is created on first open and kept in the 'meta' store.
 */
export async function openStore(options: StoreOptions = {}): Promise<SpanlogStore> {
  const now = options.now ?? (() => new Date().toISOString());
  const newId = options.newId ?? (() => crypto.randomUUID());
  const opened: { store?: SpanlogStore } = {};
  const db = await openDB<SpanlogDB>(options.name ?? DB_NAME, DB_VERSION, {
    upgrade(database, oldVersion, _newVersion, transaction) {
      upgradeSpanlogDb(database, oldVersion, transaction);
    },
    blocking() {
      opened.store?.close();
      options.onBlocking?.();
    },
    blocked() {
      options.onBlocked?.();
    },
  });
  const candidateId = newId();
  const tx = db.transaction('meta', 'readwrite');
  const stored = await tx.store.get('deviceId');
  if (stored === undefined) await tx.store.put({ key: 'deviceId', value: candidateId });
  await tx.done;
  opened.store = new SpanlogStore(db, stored?.value ?? candidateId, {
    now,
    newId,
    onRejected: options.onRejected,
  });
  return opened.store;
}

interface Clock {
  now: () => string;
  newId: () => string;
  onRejected: ((rejected: RejectedRecord[]) => void) | undefined;
}

/** Reads and writes Spanlog records. Create with openStore(). All methods are async and validate what they read. */
export class SpanlogStore {
  readonly #db: Db;
  readonly #deviceId: string;
  readonly #clock: Clock;

  constructor(db: Db, deviceId: string, clock: Clock) {
    this.#db = db;
    this.#deviceId = deviceId;
    this.#clock = clock;
  }

  /** This device's id (stamped on every record it changes). */
  deviceId(): string {
    return this.#deviceId;
  }

  /** Closes the connection; the object is unusable afterwards. */
  close(): void {
    this.#db.close();
  }

  /** Lines, live ones only unless includeDeleted, by name. */
  async listLines(options?: {
    includeDeleted?: boolean;
  }): Promise<{ lines: LineRecord[]; rejected: RejectedRecord[] }> {
    const values = await this.#db.getAll('line');
    const { valid, rejected } = await this.#checkAll('line', values);
    const lines = valid.filter((line) => options?.includeDeleted === true || !line.deleted);
    lines.sort((a, b) => a.name.localeCompare(b.name));
    return { lines, rejected };
  }

  /** A line and everything under it; undefined when the line is missing, invalid, or (unless asked) deleted. */
  async loadLine(lineId: string, options?: { includeDeleted?: boolean }): Promise<LineBundle | undefined> {
    const { records, rejected } = await this.#readLine(lineId);
    const keep = <T extends RecordMeta>(list: T[]): T[] =>
      options?.includeDeleted === true ? list : list.filter((record) => !record.deleted);
    const line = records.line[0];
    if (line === undefined || (line.deleted && options?.includeDeleted !== true)) return undefined;
    const structures = keep(records.structure).sort((a, b) => a.order - b.order);
    const position = new Map(structures.map((structure) => [structure.id, structure.order]));
    const spanOrder = (span: RecordByKind['span']): number =>
      position.get(span.nearStructureId) ?? position.get(span.farStructureId) ?? Number.POSITIVE_INFINITY;
    return {
      line,
      sections: keep(records.section).sort((a, b) => a.name.localeCompare(b.name)),
      structures,
      spans: keep(records.span).sort((a, b) => spanOrder(a) - spanOrder(b)),
      wires: keep(records.wire).sort((a, b) => a.label.localeCompare(b.label)),
      readings: keep(records.reading).sort((a, b) => a.takenAt.localeCompare(b.takenAt)),
      rejected,
    };
  }

  /** One record by id (tombstones included), or undefined when missing or invalid. */
  async get<K extends RecordKind>(kind: K, id: string): Promise<RecordByKind[K] | undefined> {
    const value: unknown = await this.#db.get(kind, id);
    if (value === undefined) return undefined;
    const { valid } = await this.#checkAll(kind, [value]);
    return valid[0];
  }

  /**
   * Saves a local change. Without an id the record is new (fresh UUID, revision 1); with an id the stored copy's
   * revision + 1 (1 if none). updatedAt and deviceId are stamped here; `deleted` is kept as given (default false).
   * Unknown fields are dropped. Throws RecordValidationError, writing nothing, when the record is invalid.
   */
  async save<K extends RecordKind>(kind: K, input: RecordInput<K>): Promise<RecordByKind[K]> {
    const now = this.#clock.now();
    const meta = newRecordMeta(this.#deviceId, now, input.id ?? this.#clock.newId());
    const checked = validateRecord(kind, { ...input, ...meta, deleted: input.deleted ?? false });
    if (!checked.ok) throw new RecordValidationError(kind, meta.id, checked.issues);
    const tx = this.#db.transaction(kind, 'readwrite');
    const stored = (await tx.store.get(meta.id)) as RecordMeta | undefined;
    const record = { ...checked.record, revision: storedRevision(stored) + 1 };
    await tx.store.put(record);
    await tx.done;
    return record;
  }

  /**
   * Removes a record by writing its tombstone (deleted: true, revision + 1), so that the removal syncs.
   * Returns the tombstone, or undefined when there is no such record. Removing twice changes nothing.
   * Children are not touched: remove them too when the UI removes a parent.
   */
  async remove<K extends RecordKind>(kind: K, id: string): Promise<RecordByKind[K] | undefined> {
    const tx = this.#db.transaction(kind, 'readwrite');
    const value: unknown = await tx.store.get(id);
    if (value === undefined) {
      await tx.done;
      return undefined;
    }
    const checked = validateRecord(kind, value);
    if (!checked.ok) {
      tx.abort();
      await tx.done.catch(() => undefined);
      throw new RecordValidationError(kind, id, checked.issues);
    }
    if (checked.record.deleted) {
      await tx.done;
      return checked.record;
    }
    const tombstone = {
      ...checked.record,
      deleted: true,
      revision: checked.record.revision + 1,
      updatedAt: this.#clock.now(),
      deviceId: this.#deviceId,
    };
    await tx.store.put(tombstone);
    await tx.done;
    return tombstone;
  }

  /**
   * Applies records from an import or from sync, all or nothing: every value is validated first (the first
   * invalid one throws RecordValidationError and nothing is written), then all are merged in one transaction by
   * id and revision (core incomingWins: higher revision wins, the same change twice is a no-op).
   */
  async putRaw(batch: RawBatch): Promise<PutRawResult> {
    const incoming = new Map<RecordKind, Map<string, RecordMeta>>();
    for (const kind of RECORD_KINDS) {
      const byId = new Map<string, RecordMeta>();
      (batch[kind] ?? []).forEach((value, index) => {
        const checked = validateRecord(kind, value);
        if (!checked.ok)
          throw new RecordValidationError(kind, describeRecordId(value), checked.issues, index);
        const record: RecordMeta = checked.record;
        if (incomingWins(byId.get(record.id), record)) byId.set(record.id, record);
      });
      if (byId.size > 0) incoming.set(kind, byId);
    }
    const kinds = [...incoming.keys()];
    if (kinds.length === 0) return { written: 0, unchanged: 0 };
    const tx = this.#db.transaction(kinds, 'readwrite');
    const decisions = await Promise.all(
      kinds.flatMap((kind) =>
        [...(incoming.get(kind)?.values() ?? [])].map(async (record) => {
          const store = tx.objectStore(kind);
          const stored = (await store.get(record.id)) as RecordMeta | undefined;
          if (!incomingWins(stored, record)) return false;
          await store.put(record as never);
          return true;
        }),
      ),
    );
    await tx.done;
    const written = decisions.filter(Boolean).length;
    return { written, unchanged: decisions.length - written };
  }

  /** Every record of every kind, tombstones included. */
  async exportAll(): Promise<RecordExport> {
    const tx = this.#db.transaction([...RECORD_KINDS], 'readonly');
    const lists = await Promise.all(RECORD_KINDS.map((kind) => tx.objectStore(kind).getAll()));
    await tx.done;
    return this.#checkSet(lists);
  }

  /** One line and everything under it, tombstones included (empty lists when the line is unknown). */
  async exportLine(lineId: string): Promise<RecordExport> {
    return this.#readLine(lineId);
  }

  /**
   * Validates every stored record and draft, setting aside any that fail. Worth calling once at start-up:
   * loadLine only sees children whose lineId is intact.
   */
  async scanAll(): Promise<RejectedRecord[]> {
    const { rejected } = await this.exportAll();
    const drafts = await this.listDrafts();
    return [...rejected, ...drafts.rejected];
  }

  /** Autosaves a form as typed. Returns the stored draft. */
  async saveDraft(key: string, values: Record<string, string>): Promise<DraftRecord> {
    const draft = draftRecordSchema.parse({ key, values, savedAt: this.#clock.now() });
    await this.#db.put('drafts', draft);
    return draft;
  }

  /** The draft saved under `key`, or undefined (also when it was invalid; it is then set aside and reported). */
  async loadDraft(key: string): Promise<DraftRecord | undefined> {
    const value: unknown = await this.#db.get('drafts', key);
    if (value === undefined) return undefined;
    const { drafts } = await this.#checkDrafts([value]);
    return drafts[0];
  }

  /** Forgets a draft (after its form was saved or discarded). */
  async clearDraft(key: string): Promise<void> {
    await this.#db.delete('drafts', key);
  }

  /** All drafts, newest first. */
  async listDrafts(): Promise<{ drafts: DraftRecord[]; rejected: RejectedRecord[] }> {
    const values: unknown[] = await this.#db.getAll('drafts');
    const result = await this.#checkDrafts(values);
    result.drafts.sort((a, b) => b.savedAt.localeCompare(a.savedAt));
    return result;
  }

  /** Values set aside as invalid, with the reasons, oldest first. */
  async listQuarantine(): Promise<QuarantineEntry[]> {
    const entries = await this.#db.getAll('quarantine');
    return entries.sort((a, b) => a.foundAt.localeCompare(b.foundAt));
  }

  /**
   * Asks the browser to keep this origin's data (navigator.storage.persist()). True when granted; false when
   * refused or unavailable.
   */
  async requestPersistence(storage?: PersistableStorage): Promise<boolean> {
    return requestPersistentStorage(storage ?? globalThis.navigator?.storage);
  }

  /** Reads a line and its children in one read-only transaction, then validates. */
  async #readLine(lineId: string): Promise<RecordExport> {
    const tx = this.#db.transaction([...RECORD_KINDS], 'readonly');
    const [line, ...children] = await Promise.all([
      tx.objectStore('line').get(lineId),
      ...CHILD_KINDS.map((kind) => tx.objectStore(kind).index('by-line').getAll(lineId)),
    ]);
    await tx.done;
    return this.#checkSet([line === undefined ? [] : [line], ...children]);
  }

  /** Validates lists given in RECORD_KINDS order. */
  async #checkSet(lists: readonly (readonly unknown[])[]): Promise<RecordExport> {
    const records = emptyRecordSet();
    const rejected: RejectedRecord[] = [];
    const found: Found[] = [];
    RECORD_KINDS.forEach((kind, position) => {
      for (const value of lists[position] ?? []) {
        const checked = validateRecord(kind, value);
        if (checked.ok) (records[kind] as RecordMeta[]).push(checked.record);
        else found.push(foundOf(kind, value, checked.issues));
      }
    });
    rejected.push(...(await this.#setAside(found)));
    return { records, rejected };
  }

  async #checkAll<K extends RecordKind>(
    kind: K,
    values: readonly unknown[],
  ): Promise<{ valid: RecordByKind[K][]; rejected: RejectedRecord[] }> {
    const valid: RecordByKind[K][] = [];
    const found: Found[] = [];
    for (const value of values) {
      const checked = validateRecord(kind, value);
      if (checked.ok) valid.push(checked.record);
      else found.push(foundOf(kind, value, checked.issues));
    }
    return { valid, rejected: await this.#setAside(found) };
  }

  async #checkDrafts(
    values: readonly unknown[],
  ): Promise<{ drafts: DraftRecord[]; rejected: RejectedRecord[] }> {
    const drafts: DraftRecord[] = [];
    const found: Found[] = [];
    for (const value of values) {
      const checked = draftRecordSchema.safeParse(value);
      if (checked.success) drafts.push(checked.data);
      else found.push(foundOf('draft', value, summarizeIssues(checked.error)));
    }
    return { drafts, rejected: await this.#setAside(found) };
  }

  /**
   * Moves invalid values to the quarantine store in one transaction and reports them. Each value is read again
   * and re-checked inside that transaction, so a record repaired in the meantime is left in place.
   */
  async #setAside(found: readonly Found[]): Promise<RejectedRecord[]> {
    if (found.length === 0) return [];
    const foundAt = this.#clock.now();
    const stores = [...new Set(found.map((item) => storeOf(item.kind)))];
    const tx = this.#db.transaction([...stores, 'quarantine'], 'readwrite');
    const moved = await Promise.all(
      found.map(async (item) => {
        const store = tx.objectStore(storeOf(item.kind));
        if (item.storedKey === undefined) return undefined;
        const value: unknown = await store.get(item.storedKey as string);
        if (value === undefined || stillValid(item.kind, value)) return undefined;
        await tx.objectStore('quarantine').put({
          key: `${storeOf(item.kind)}/${item.key}`,
          store: storeOf(item.kind),
          recordKey: item.key,
          value,
          issues: item.issues,
          foundAt,
        });
        await store.delete(item.storedKey as string);
        return item;
      }),
    );
    await tx.done;
    const rejected = found.map(({ kind, key, issues }) => ({ kind, key, issues }));
    if (moved.some((item) => item !== undefined)) this.#clock.onRejected?.(rejected);
    return rejected;
  }
}

interface Found {
  kind: RecordKind | 'draft';
  /** For messages. */
  key: string;
  /** The primary key as stored (may not be a string in a corrupt record). */
  storedKey: IDBValidKey | undefined;
  issues: string;
}

function foundOf(kind: RecordKind | 'draft', value: unknown, issues: string): Found {
  const keyField = kind === 'draft' ? 'key' : 'id';
  const raw =
    typeof value === 'object' && value !== null ? (value as Record<string, unknown>)[keyField] : undefined;
  const storedKey = typeof raw === 'string' || typeof raw === 'number' ? raw : undefined;
  return { kind, key: kind === 'draft' ? draftKeyOf(value) : describeRecordId(value), storedKey, issues };
}

function storeOf(kind: RecordKind | 'draft'): RecordKind | 'drafts' {
  return kind === 'draft' ? 'drafts' : kind;
}

function stillValid(kind: RecordKind | 'draft', value: unknown): boolean {
  return kind === 'draft' ? draftRecordSchema.safeParse(value).success : validateRecord(kind, value).ok;
}

function draftKeyOf(value: unknown): string {
  if (typeof value === 'object' && value !== null && 'key' in value) {
    const key = value.key;
    if (typeof key === 'string') return key;
  }
  return '(no key)';
}

function storedRevision(stored: RecordMeta | undefined): number {
  return typeof stored?.revision === 'number' && Number.isInteger(stored.revision) ? stored.revision : 0;
}
