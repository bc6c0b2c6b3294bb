import type { z } from 'zod';
import { RECORD_SCHEMAS, type RecordByKind, type RecordKind } from './kinds';

/** Result of checking one value against a record schema: the typed record, or a readable list of problems. */
export type RecordCheck<T> = { ok: true; record: T } | { ok: false; issues: string };

/** At most this many zod issues are spelt out in a summary; the rest are counted. */
const MAX_LISTED_ISSUES = 4;

/**
 * One line naming each problem by its field path, e.g. "conductor.weight: Too small: expected number to be >0".
 * Short enough to show in a message or a log.
 */
export function summarizeIssues(error: z.ZodError): string {
  const listed = error.issues.slice(0, MAX_LISTED_ISSUES).map((issue) => {
    const path = issue.path.map(String).join('.');
    return path === '' ? issue.message : `${path}: ${issue.message}`;
  });
  const more = error.issues.length - listed.length;
  return more > 0 ? `${listed.join('; ')}; and ${more} more` : listed.join('; ');
}

/** Checks `value` against the schema of `kind`; never throws. */
export function validateRecord<K extends RecordKind>(kind: K, value: unknown): RecordCheck<RecordByKind[K]> {
  const result = RECORD_SCHEMAS[kind].safeParse(value);
  return result.success
    ? { ok: true, record: result.data as RecordByKind[K] }
    : { ok: false, issues: summarizeIssues(result.error) };
}

/** The `id` of a value that may be corrupt, for messages; '(no id)' when it has none. */
export function describeRecordId(value: unknown): string {
  if (typeof value === 'object' && value !== null && 'id' in value) {
    const id = value.id;
    if (typeof id === 'string' || typeof id === 'number') return String(id);
  }
  return '(no id)';
}
