import { z } from 'zod';
import { finite, geoPositionSchema, nonNegative, recordId } from './common';
import { recordMetaSchema } from './meta';

/** A pole or tower along a line. */
export const structureRecordSchema = recordMetaSchema.extend({
  lineId: recordId,
  /** Number or name painted on the structure. */
  label: z.string().min(1),
  /** Position along the line, for sorting (any increasing numbers). */
  order: finite,
  position: geoPositionSchema.optional(),
  /** Ground elevation at the structure, m (same datum as the span elevations). */
  groundElevation: finite.optional(),
  /** Attachment height above ground, m. */
  attachmentHeight: nonNegative.optional(),
  notes: z.string().optional(),
});

export type StructureRecord = z.infer<typeof structureRecordSchema>;
