import type { RecordKind } from '../../core';

/** A record handed to storage (by a form, an import or sync) did not pass its schema; nothing was written. */
export class RecordValidationError extends Error {
  readonly kind: RecordKind;
  /** The record's id, or '(no id)'. */
  readonly recordId: string;
  /** Position in the batch for putRaw, undefined for save. */
  readonly index: number | undefined;
  /** Readable list of the problems, by field path. */
  readonly issues: string;
  constructor(kind: RecordKind, recordId: string, issues: string, index?: number) {
    const where = index === undefined ? '' : ` (item ${index + 1})`;
    super(`Invalid ${kind} record ${recordId}${where}: ${issues}`);
    this.name = 'RecordValidationError';
    this.kind = kind;
    this.recordId = recordId;
    this.index = index;
    this.issues = issues;
  }
}
