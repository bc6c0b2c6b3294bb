import { z } from 'zod';
import { recordMetaSchema } from './meta';

/** Unit system a line is entered and shown in. Storage is always SI. */
export const unitSystemSchema = z.enum(['metric', 'us']);

/** A line (project): the job a crew inspects, holding sections, structures and spans. */
export const lineRecordSchema = recordMetaSchema.extend({
  name: z.string().min(1),
  unitSystem: unitSystemSchema,
  /** Asset owner (utility, telecom operator). */
  owner: z.string().optional(),
  /** Client the inspection is done for, when not the owner. */
  client: z.string().optional(),
  notes: z.string().optional(),
});

export type LineRecord = z.infer<typeof lineRecordSchema>;
