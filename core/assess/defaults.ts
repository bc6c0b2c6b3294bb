/**
 * Default tolerances, limits and uncertainties of the design judgement, each stored with its source. These are
 * defaults for inspection only: the owner's standards, the local code and licensed engineering practice govern.
 */
import type { ReadingUncertainty, TensionLimit, TerrainLimit, SagToleranceSettings } from './types';

/** 60 °F in °C: the reference temperature of the North American code's unloaded tension limits. */
export const CODE_REFERENCE_TEMPERATURE = 15.555555555555555;

/** Default sag tolerance: ±150 mm, the larger allowance when a relative one is also set. */
export const DEFAULT_TOLERANCE: {
  sagAbsolute: number;
  sagRelative: number | undefined;
  combine: NonNullable<SagToleranceSettings['combine']>;
} = {
  sagAbsolute: 0.15,
  sagRelative: undefined,
  combine: 'larger',
};

export const TOLERANCE_SOURCES = {
  sagAbsolute:
    'IEEE Std 524-1993 as quoted in Douglass & Thrash, "Sag and Tension of Conductor", The Electric Power ' +
    'Engineering Handbook, §Sagging accuracy: sags within 6 in (≈150 mm) of the stringing sag values.',
  sagRelative:
    'From memory: construction specifications often state ±2 % to ±5 % of design sag. Off by default.',
  combine:
    'Common practice: when both are set, the larger allowance governs (choose "smaller" to be stricter).',
} as const;

const HANDBOOK = 'Douglass & Thrash, "Sag and Tension of Conductor", The Electric Power Engineering Handbook';

/** Tension limits of the North American safety code (NESC) as quoted in the handbook, % of rated strength. */
export const NESC_TENSION_LIMITS: readonly TensionLimit[] = [
  {
    id: 'nesc-initial-unloaded',
    label: 'Initial, unloaded, at 60 °F (15.6 °C)',
    condition: 'initial',
    temperature: CODE_REFERENCE_TEMPERATURE,
    percentOfRated: 33.3,
    source: `NESC as quoted in ${HANDBOOK} (some editions 35 %, from memory).`,
  },
  {
    id: 'nesc-final-unloaded',
    label: 'Final, unloaded, at 60 °F (15.6 °C)',
    condition: 'final',
    temperature: CODE_REFERENCE_TEMPERATURE,
    percentOfRated: 25,
    source: `NESC as quoted in ${HANDBOOK}.`,
  },
  {
    id: 'nesc-max-load',
    label: 'Under the maximum ice and wind load',
    condition: 'loaded',
    temperature: CODE_REFERENCE_TEMPERATURE,
    percentOfRated: 60,
    source: `NESC as quoted in ${HANDBOOK}.`,
  },
];

/** Typical utility design values quoted in the same handbook (stricter than the code). */
export const TYPICAL_UTILITY_TENSION_LIMITS: readonly TensionLimit[] = [
  {
    id: 'utility-initial-unloaded',
    label: 'Initial, unloaded, at 60 °F (15.6 °C): typical utility design',
    condition: 'initial',
    temperature: CODE_REFERENCE_TEMPERATURE,
    percentOfRated: 25,
    source: `Typical utility design value quoted in ${HANDBOOK}.`,
  },
  {
    id: 'utility-final-unloaded',
    label: 'Final, unloaded, at 60 °F (15.6 °C): typical utility design',
    condition: 'final',
    temperature: CODE_REFERENCE_TEMPERATURE,
    percentOfRated: 15,
    source: `Typical utility design value quoted in ${HANDBOOK}.`,
  },
  {
    id: 'utility-max-load',
    label: 'Under the maximum ice and wind load: typical utility design',
    condition: 'loaded',
    temperature: CODE_REFERENCE_TEMPERATURE,
    percentOfRated: 60,
    source: `Typical utility design value quoted in ${HANDBOOK}.`,
  },
];

const TB273 =
  'CIGRE Technical Brochure 273 (2005), safe design tension for single conductors without dampers; ' +
  'values FROM MEMORY, not checked against the brochure';

/** Aeolian-vibration guidance: largest H/w per terrain category (values from memory, labelled so). */
export const CIGRE_TB273_TERRAIN_LIMITS: readonly TerrainLimit[] = [
  {
    terrainCategory: 1,
    description: 'Open, flat, no obstacles, with snow cover or over water',
    maxCatenaryParameter: 1000,
    source: TB273,
  },
  {
    terrainCategory: 2,
    description: 'Open, flat, no snow, farmland',
    maxCatenaryParameter: 1125,
    source: TB273,
  },
  {
    terrainCategory: 3,
    description: 'Open, flat or undulating, few obstacles',
    maxCatenaryParameter: 1225,
    source: TB273,
  },
  {
    terrainCategory: 4,
    description: 'Built-up, with trees, hilly',
    maxCatenaryParameter: 1425,
    source: TB273,
  },
];

/**
 * Default conductor temperature of the H/w check, °C. From memory, TB 273 evaluates H/w in the initial state at
 * the average temperature of the coldest month; 15 °C here is only a placeholder "everyday" temperature, set
 * vibrationTemperature for the site.
 */
export const DEFAULT_VIBRATION_TEMPERATURE = 15;

/** Default standard uncertainties (one σ) of reading inputs. */
export const DEFAULT_READING_UNCERTAINTY: Readonly<ReadingUncertainty> = {
  span: 0.1,
  rise: 0.1,
  weightRelative: 0.02 / Math.sqrt(3),
  temperature: 1,
  sag: 0.05,
  offsetX: 0.1,
  drop: 0.02,
  angle: (0.05 * Math.PI) / 180,
  timing: 0.2,
  point: 0.05,
  elevation: 0.1,
};

export const READING_UNCERTAINTY_SOURCES: Readonly<Record<keyof ReadingUncertainty, string>> = {
  span: 'From memory: laser rangefinder or tape over a span, about ±0.1 m.',
  rise: 'From memory: attachment heights by rangefinder or level, about ±0.1 m.',
  weightRelative:
    'EN 50182: mass per length within ±2 % of nominal (published); taken as a uniform spread, σ = 2 %/√3.',
  temperature:
    'From memory: conductor surface temperature by contact or infrared thermometer, about ±2 °C at 95 % ' +
    '(σ = 1 °C). Estimating it from the air temperature is worse: raise it for such readings.',
  sag: 'From memory: a sag read against a target or by rangefinder, about ±0.05 m.',
  offsetX: 'From memory: horizontal distance by rangefinder or tape, about ±0.1 m.',
  drop: 'From memory: target marks set on the structure by tape, about ±0.02 m.',
  angle: 'From memory: sighting the tangent to the wire with a transit, about ±0.05°.',
  timing:
    'Common practice: stopwatch reaction error about 0.2 s per timing (start and stop), as in the return-wave ' +
    'sensitivity figure of REFERENCES (≈ ±5 % sag on a 7.7 s, 3-return timing).',
  point:
    'From memory: each coordinate of a reflectorless shot on a wire, about ±0.05 m; raised to the fit scatter ' +
    'when the points scatter more about the fitted catenary.',
  elevation: 'From memory: attachment and ground elevations by level or rangefinder, about ±0.1 m.',
};

/** Readings of one wire disagree beyond this many standard deviations (≈ 95 % two-sided; common practice). */
export const DEFAULT_DISAGREEMENT_SIGMAS = 2;

/**
 * Modified z-score threshold for outlier spans: 0.6745·(x − median)/MAD > 3.5 (Iglewicz & Hoaglin, "How to Detect
 * and Handle Outliers", 1993; from memory).
 */
export const DEFAULT_OUTLIER_MODIFIED_Z = 3.5;

/** Two-sided 95 % coverage factor of a normal distribution. */
export const COVERAGE_FACTOR_95 = 1.959963984540054;

/** Shown with every clearance result. */
export const CLEARANCE_CAUTION =
  'Required clearance is entered by the user: the local code, the owner’s standards and licensed practice govern. ' +
  'Projected clearance is an estimate for inspection, not a substitute for engineering review.';
