import { z } from 'zod';
import { isoTime } from './common';

/**
 * A form being typed (usually a new reading), autosaved so that nothing is lost on a reload or a killed tab.
 * Values are the raw strings as typed, in the line's display units; they are parsed only when the form is saved.
 * Drafts are device-local: no revision, never synced.
 */
export const draftRecordSchema = z.object({
  /** Caller's key, e.g. `reading:${wireId}`. */
  key: z.string().min(1),
  /** Field name → text as typed (lists as 'points.0.x' and so on). */
  values: z.record(z.string(), z.string()),
  /** ISO 8601 time of the last autosave. */
  savedAt: isoTime,
});

export type DraftRecord = z.infer<typeof draftRecordSchema>;
