import { z } from 'zod';
import { finite, recordId } from './common';
import { recordMetaSchema } from './meta';

/** A wire position in a span: one phase, neutral, shield wire or messenger. */
export const wireRecordSchema = recordMetaSchema.extend({
  lineId: recordId,
  spanId: recordId,
  /** 'A', 'B', 'C', 'Neutral', 'Shield', 'Messenger', or the crew's own label. */
  label: z.string().min(1),
  /** Vertical offset of this wire's near attachment from the span's near attachment elevation, m (0 default). */
  nearOffset: finite,
  /** Vertical offset of this wire's far attachment from the span's far attachment elevation, m (0 default). */
  farOffset: finite,
  notes: z.string().optional(),
});

export type WireRecord = z.infer<typeof wireRecordSchema>;
