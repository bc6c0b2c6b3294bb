import { z } from 'zod';
import { finite, nonNegative, positive, recordId } from './common';
import { recordMetaSchema } from './meta';

/** A point of the ground profile under a span: x horizontal from the near structure, m; elevation, m. */
export const groundPointSchema = z.object({ x: finite, elevation: finite });

export type GroundPoint = z.infer<typeof groundPointSchema>;

/**
 * A span between two structures. Elevations share one vertical datum (any: site benchmark or sea level); the
 * solver's rise is farAttachmentElevation − nearAttachmentElevation (plus the wire's offsets).
 */
export const spanRecordSchema = recordMetaSchema.extend({
  lineId: recordId,
  sectionId: recordId,
  nearStructureId: recordId,
  farStructureId: recordId,
  /** Horizontal distance between attachments, m. */
  length: positive,
  nearAttachmentElevation: finite,
  farAttachmentElevation: finite,
  nearGroundElevation: finite.optional(),
  farGroundElevation: finite.optional(),
  groundPoints: z.array(groundPointSchema).optional(),
  /** Required ground clearance, m (local codes govern). */
  requiredClearance: nonNegative.optional(),
  notes: z.string().optional(),
});

export type SpanRecord = z.infer<typeof spanRecordSchema>;
