import { z } from 'zod';

/**
 * Fields every stored record carries so that it can sync from the first day: a UUID, the time and device of the
 * last change, a revision that grows by one per change, and a tombstone flag instead of deletion.
 */
export const recordMetaSchema = z.object({
  /** UUID (RFC 9562), created on the device that made the record. */
  id: z.uuid(),
  /** ISO 8601 time of the last change, e.g. '2026-05-14T08:31:00.000Z'. */
  updatedAt: z.iso.datetime({ offset: true }),
  /** 1 when created, +1 on every change (including removal). Higher revision wins on merge. */
  revision: z.int().min(1),
  /** Tombstone: true once removed; kept so that the removal syncs. */
  deleted: z.boolean(),
  /** Id of the device that made the last change. */
  deviceId: z.string().min(1),
});

export type RecordMeta = z.infer<typeof recordMetaSchema>;

/** The names of the meta fields, for stripping or checking them. */
export const RECORD_META_KEYS = ['id', 'updatedAt', 'revision', 'deleted', 'deviceId'] as const;

/**
 * Meta of a record created now. Time and id come in as parameters: core has no clock and no randomness.
 * @param deviceId device making the record
 * @param now ISO 8601 time
 * @param id a fresh UUID
 */
export function newRecordMeta(deviceId: string, now: string, id: string): RecordMeta {
  return { id, updatedAt: now, revision: 1, deleted: false, deviceId };
}

/**
 * The same record after one more change on `deviceId` at `now`: revision + 1, updatedAt and deviceId replaced.
 * Returns a new object; the input is not modified.
 */
export function bumpRecord<T extends RecordMeta>(record: T, deviceId: string, now: string): T {
  return { ...record, revision: record.revision + 1, updatedAt: now, deviceId };
}
