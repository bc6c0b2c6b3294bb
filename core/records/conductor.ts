import { z } from 'zod';
import { positive } from './common';

/**
 * Steel-cored (bimetallic) description for the knee-point model: above the knee temperature the steel core alone
 * carries the tension. SI: m², Pa, 1/°C.
 */
export const compositeConductorSchema = z.object({
  aluminiumArea: positive,
  steelArea: positive,
  aluminiumModulus: positive,
  steelModulus: positive,
  aluminiumExpansion: positive,
  steelExpansion: positive,
});

export type CompositeConductor = z.infer<typeof compositeConductorSchema>;

/** The conductor strung in a tension section, SI throughout. */
export const conductorSpecSchema = z.object({
  /** Shown name, e.g. a code word and size. */
  name: z.string().min(1),
  /** Overall diameter, m. */
  diameter: positive,
  /** Total cross-section area, m². */
  area: positive,
  /** Weight per unit length (bare), N/m. */
  weight: positive,
  /** Rated breaking strength, N. */
  ratedStrength: positive,
  /** Final modulus of elasticity of the whole conductor, Pa. */
  modulus: positive,
  /** Linear thermal expansion of the whole conductor, 1/°C. */
  expansion: positive,
  composite: compositeConductorSchema.optional(),
  /** Where the figures come from (standard, table, maker's sheet, "entered by user"). */
  source: z.string(),
  /** Id of the library entry this was copied from, if any. */
  libraryId: z.string().optional(),
});

export type ConductorSpec = z.infer<typeof conductorSpecSchema>;
