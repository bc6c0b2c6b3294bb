import { z } from 'zod';
import { recordId } from './common';
import { conductorSpecSchema } from './conductor';
import { sectionDesignSchema } from './design';
import { recordMetaSchema } from './meta';

/** A tension section: a run of spans between dead-ends with one conductor and one design basis. */
export const sectionRecordSchema = recordMetaSchema.extend({
  lineId: recordId,
  name: z.string().min(1),
  conductor: conductorSpecSchema,
  /** Filled in when the design is known (issue 4); readings solve without it. */
  design: sectionDesignSchema.optional(),
  notes: z.string().optional(),
});

export type SectionRecord = z.infer<typeof sectionRecordSchema>;
