import type { z } from 'zod';
import { lineRecordSchema } from './line';
import type { RecordMeta } from './meta';
import { readingRecordSchema } from './reading';
import { sectionRecordSchema } from './section';
import { spanRecordSchema } from './span';
import { structureRecordSchema } from './structure';
import { wireRecordSchema } from './wire';

/** Every synced record kind, parents before children (the order import and sync apply them in). */
export const RECORD_KINDS = ['line', 'section', 'structure', 'span', 'wire', 'reading'] as const;

export type RecordKind = (typeof RECORD_KINDS)[number];

/** kind → zod schema, used by storage, import and sync to validate every record that crosses a boundary. */
export const RECORD_SCHEMAS = {
  line: lineRecordSchema,
  section: sectionRecordSchema,
  structure: structureRecordSchema,
  span: spanRecordSchema,
  wire: wireRecordSchema,
  reading: readingRecordSchema,
} as const satisfies Record<RecordKind, z.ZodType<RecordMeta>>;

/** kind → record type. */
export type RecordByKind = { [K in RecordKind]: z.infer<(typeof RECORD_SCHEMAS)[K]> };

/** Any synced record. */
export type AnyRecord = RecordByKind[RecordKind];

/** A record as a form hands it in: content fields, with the meta fields optional (storage fills them in). */
export type RecordInput<K extends RecordKind> = Omit<RecordByKind[K], keyof RecordMeta> & Partial<RecordMeta>;

/** Records grouped by kind: what an export holds and what an import applies. */
export type RecordSet = { [K in RecordKind]: RecordByKind[K][] };

/** An empty RecordSet. */
export function emptyRecordSet(): RecordSet {
  return { line: [], section: [], structure: [], span: [], wire: [], reading: [] };
}

/** Type guard for a kind name read from a file or a message. */
export function isRecordKind(value: unknown): value is RecordKind {
  return typeof value === 'string' && (RECORD_KINDS as readonly string[]).includes(value);
}
