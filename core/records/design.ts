import { z } from 'zod';
import { finite, nonNegative, positive } from './common';

/** Initial = as strung (before creep); final = after creep and the design load. */
export const tensionStateSchema = z.enum(['initial', 'final']);

/**
 * Design condition (a): a horizontal tension, or a % of rated strength, at a reference temperature.
 * Exactly one of horizontalTension and percentOfRated is given.
 */
export const tensionDesignBasisSchema = z
  .object({
    kind: z.literal('tension'),
    /** Design horizontal tension, N. */
    horizontalTension: positive.optional(),
    /** Design horizontal tension as a percentage of rated strength, e.g. 20 for 20 %. */
    percentOfRated: z.number().positive().max(100).optional(),
    /** Conductor temperature at which the design tension holds, °C. */
    referenceTemperature: finite,
    state: tensionStateSchema,
    /** Creep allowance as an equivalent temperature rise, °C (e.g. ≈ 21 for ACSR ten-year creep). */
    creepOffset: nonNegative,
  })
  .refine((basis) => (basis.horizontalTension === undefined) !== (basis.percentOfRated === undefined), {
    message: 'Give either a horizontal tension or a percentage of rated strength, not both and not neither.',
    path: ['horizontalTension'],
  });

/** One row of a design sag table for the ruling span. */
export const designTableRowSchema = z.object({
  /** Conductor temperature, °C. */
  temperature: finite,
  /** Ruling-span midspan sag at that temperature, m. */
  sag: positive,
});

/** Design condition (b): sag against temperature for the ruling span, interpolated between rows. */
export const tableDesignBasisSchema = z
  .object({
    kind: z.literal('table'),
    rows: z.array(designTableRowSchema).min(2),
    /** Which state the table describes; assessment takes 'final' when absent. */
    state: tensionStateSchema.optional(),
    /** Creep allowance as an equivalent temperature rise, °C; the assessment's default when absent. */
    creepOffset: nonNegative.optional(),
  })
  .refine((basis) => new Set(basis.rows.map((row) => row.temperature)).size === basis.rows.length, {
    message: 'Each temperature may appear only once in the design table.',
    path: ['rows'],
  });

export const designBasisSchema = z.discriminatedUnion('kind', [
  tensionDesignBasisSchema,
  tableDesignBasisSchema,
]);

export type TensionDesignBasis = z.infer<typeof tensionDesignBasisSchema>;
export type DesignTableRow = z.infer<typeof designTableRowSchema>;
export type TableDesignBasis = z.infer<typeof tableDesignBasisSchema>;
export type DesignBasis = z.infer<typeof designBasisSchema>;

/**
 * Sag tolerance. Defaults live with the assessment (core/assess), each with its source; absent fields mean
 * "use the default".
 */
export const toleranceSettingsSchema = z.object({
  /** Allowed sag deviation either way, m (e.g. 0.15 after IEEE Std 524). */
  sagAbsolute: nonNegative.optional(),
  /** Allowed sag deviation as a fraction of design sag, e.g. 0.05 for 5 %. */
  sagRelative: nonNegative.optional(),
  /** When both are given: allow the larger or the smaller of the two. */
  combine: z.enum(['larger', 'smaller']).optional(),
});

export type ToleranceSettings = z.infer<typeof toleranceSettingsSchema>;

/** Terrain category of the vibration guidance: 1 open and flat … 4 built-up, trees, hilly. */
export const terrainCategorySchema = z.union([z.literal(1), z.literal(2), z.literal(3), z.literal(4)]);

export type TerrainCategory = z.infer<typeof terrainCategorySchema>;

/** The names of the per-reading standard uncertainties (core/assess ReadingUncertainty), in form order. */
export const UNCERTAINTY_NAMES = [
  'span',
  'rise',
  'weightRelative',
  'temperature',
  'sag',
  'offsetX',
  'drop',
  'angle',
  'timing',
  'point',
  'elevation',
] as const;

export type UncertaintyName = (typeof UNCERTAINTY_NAMES)[number];

/** Section-wide standard uncertainties (one σ, SI; weightRelative a fraction); absent means the default. */
export const uncertaintySettingsSchema = z.object(
  Object.fromEntries(UNCERTAINTY_NAMES.map((name) => [name, nonNegative.optional()])) as Record<
    UncertaintyName,
    z.ZodOptional<typeof nonNegative>
  >,
);

/** A loaded design condition as entered: radial ice and wind pressure at a conductor temperature. */
export const loadingSchema = z.object({
  label: z.string().min(1),
  /** Conductor temperature under the load, °C. */
  temperature: finite,
  /** Radial ice thickness, m. */
  iceThickness: nonNegative,
  /** Wind pressure on the iced diameter, Pa. */
  windPressure: nonNegative,
});

/** Settings of the checks beyond the basis; each absent field means the assessment's default. */
export const designExtrasSchema = z.object({
  /** Condition the installed wire is compared in ('initial' for newly strung wire). */
  compareState: tensionStateSchema.optional(),
  /** Conductor temperature of the H/w check, °C (the site's average temperature of the coldest month). */
  vibrationTemperature: finite.optional(),
  loading: loadingSchema.optional(),
  uncertainty: uncertaintySettingsSchema.optional(),
});

export type DesignExtras = z.infer<typeof designExtrasSchema>;

/** What a tension section was designed to: the basis, and the settings its checks use. */
export const sectionDesignSchema = designExtrasSchema.extend({
  basis: designBasisSchema,
  /** Ruling span, m, when the user overrides the one computed from the section's spans. */
  rulingSpanOverride: positive.optional(),
  /** Highest conductor temperature of the design, °C (projected sag and clearance). */
  maxDesignTemperature: finite,
  terrainCategory: terrainCategorySchema,
  tolerance: toleranceSettingsSchema.optional(),
});

export type SectionDesign = z.infer<typeof sectionDesignSchema>;
