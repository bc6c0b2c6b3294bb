import { z } from 'zod';
import type { Measurement } from '../types';
import { finite } from './common';

// Shapes only: finite numbers in SI. Physical checks (sag > 0, offset inside the span, ≥ 3 points…) belong to the
// solver, which raises a SpanInputError with a code the form can show beside the field.

export const midspanSagSchema = z.object({ method: z.literal('midspan-sag'), sag: finite });
export const offsetSagSchema = z.object({ method: z.literal('offset-sag'), x: finite, sag: finite });
export const sightLineSchema = z.object({
  method: z.literal('sight-line'),
  nearDrop: finite,
  farDrop: finite,
});
/** angle: radians above horizontal, looking from the near support toward the far one. */
export const sightAngleSchema = z.object({
  method: z.literal('sight-angle'),
  nearDrop: finite,
  angle: finite,
});
export const returnWaveSchema = z.object({
  method: z.literal('return-wave'),
  returns: finite,
  seconds: finite,
});
/** Points x from the near attachment, z relative to the near attachment, m. */
export const surveyedPointsSchema = z.object({
  method: z.literal('surveyed-points'),
  points: z.array(z.object({ x: finite, z: finite })),
});

/** The core Measurement union (core/types.ts) as a zod schema, discriminated on `method`. */
export const measurementSchema = z.discriminatedUnion('method', [
  midspanSagSchema,
  offsetSagSchema,
  sightLineSchema,
  sightAngleSchema,
  returnWaveSchema,
  surveyedPointsSchema,
]);

// Compile-time proof that the schema and the core type describe the same values, both ways: if either side
// changes alone, this assignment stops compiling.
type Parsed = z.infer<typeof measurementSchema>;
type SameShape = [Parsed extends Measurement ? true : never, Measurement extends Parsed ? true : never];
const _measurementSchemaMatchesCore: SameShape = [true, true];
