/**
 * Inputs and results of the design judgement (issue 4). Plain SI shapes, no records: the app maps its stored
 * section, span, wire and reading records onto these. Field names follow core/records where the two overlap
 * (design basis, tolerance settings, conductor spec, ground points).
 * Units: m, N, N/m, °C, s, rad; fractions (0.05 = 5 %) unless a name says "percent".
 */
import type { Measurement, SpanGeometry, SpanSolution } from '../types';

/** Initial = as strung (before creep); final = after creep (long-term, after the design load). */
export type WireState = 'initial' | 'final';

/** Terrain category of the aeolian-vibration guidance: 1 open and flat … 4 built-up, trees, hilly. */
export type TerrainCategoryNumber = 1 | 2 | 3 | 4;

/** Steel-cored (bimetallic) description for the knee-point model (same fields as core/records/conductor). */
export interface CompositeDescription {
  /** m² */ aluminiumArea: number;
  /** m² */ steelArea: number;
  /** Pa */ aluminiumModulus: number;
  /** Pa */ steelModulus: number;
  /** 1/°C */ aluminiumExpansion: number;
  /** 1/°C */ steelExpansion: number;
}

/** The conductor of a section as the assessment needs it (a subset of core/records ConductorSpec). */
export interface AssessConductor {
  /** Bare weight per unit length, N/m. */
  weight: number;
  /** Rated breaking strength, N. */
  ratedStrength: number;
  /** Total cross-section area, m². */
  area: number;
  /** Final modulus of the whole conductor, Pa. */
  modulus: number;
  /** Thermal expansion of the whole conductor, 1/°C. */
  expansion: number;
  /** Overall diameter, m (only needed for ice and wind loads). */
  diameter?: number;
  /** When present, state change uses the knee-point model (steel alone above the knee temperature). */
  composite?: CompositeDescription;
}

/** Design condition (a): a horizontal tension (N) or a % of rated strength at a reference temperature. */
export interface TensionDesignInput {
  kind: 'tension';
  /** Design horizontal tension, N (give this or percentOfRated). */
  horizontalTension?: number;
  /** Design horizontal tension in percent of rated strength, e.g. 20 for 20 %. */
  percentOfRated?: number;
  /** Conductor temperature at which the design tension holds, °C. */
  referenceTemperature: number;
  /** State the design tension describes. */
  state: WireState;
  /** Creep allowance as an equivalent temperature rise, °C (≥ 0). */
  creepOffset: number;
}

/** Design condition (b): midspan sag of the ruling span against conductor temperature, interpolated. */
export interface TableDesignInput {
  kind: 'table';
  /** At least two rows with distinct temperatures (°C), sag in m. Order does not matter. */
  rows: { temperature: number; sag: number }[];
  /** State the table describes; 'final' when absent (as core/records). */
  state?: WireState;
  /** Creep allowance, °C, used only when the table's state differs from the compared state (0 when absent). */
  creepOffset?: number;
}

export type DesignBasisInput = TensionDesignInput | TableDesignInput;

/** Sag tolerance (same fields as core/records ToleranceSettings). Absent fields take the defaults. */
export interface SagToleranceSettings {
  /** Allowed sag deviation either way, m. Default 0.15 (IEEE Std 524 via Douglass & Thrash). */
  sagAbsolute?: number;
  /** Allowed sag deviation as a fraction of the design sag (0.05 = 5 %). Default: not used. */
  sagRelative?: number;
  /** When both apply: allow the larger or the smaller of the two. Default 'larger'. */
  combine?: 'larger' | 'smaller';
}

/** One tension limit, stored as data with where it comes from. */
export interface TensionLimit {
  id: string;
  /** Plain-language name, e.g. "Initial, unloaded, at 15.6 °C". */
  label: string;
  /** State the limit applies to; 'loaded' = under the section's loaded condition (ice and/or wind). */
  condition: 'initial' | 'final' | 'loaded';
  /** Conductor temperature of the limit's condition, °C (for 'loaded', the loaded condition's own is used). */
  temperature: number;
  /** Largest allowed support tension in percent of rated breaking strength. */
  percentOfRated: number;
  /** Named source, "common practice" or "from memory". */
  source: string;
}

/** Limit on the catenary parameter H/w per terrain category, m, with its source. */
export interface TerrainLimit {
  terrainCategory: TerrainCategoryNumber;
  description: string;
  /** Largest allowed H/w, m. */
  maxCatenaryParameter: number;
  source: string;
}

/** A loaded design condition (e.g. maximum ice and wind), as the resultant load per length and a temperature. */
export interface LoadedCondition {
  label: string;
  /** Conductor temperature under the load, °C. */
  temperature: number;
  /** Resultant load per unit length, N/m (bare weight + ice, combined with wind; see core/loads). */
  weight: number;
}

/**
 * Standard uncertainties (one standard deviation) of the raw inputs of a reading. Every field is optional in
 * settings; absent ones take DEFAULT_READING_UNCERTAINTY (each default names its source there).
 */
export interface ReadingUncertainty {
  /** Horizontal span length, m. */
  span: number;
  /** Difference of attachment heights, m. */
  rise: number;
  /** Weight per unit length, as a fraction of the weight. */
  weightRelative: number;
  /** Conductor temperature, °C. */
  temperature: number;
  /** A sag read directly (midspan-sag, offset-sag), m. */
  sag: number;
  /** Horizontal offset of an offset-sag reading, m. */
  offsetX: number;
  /** Target drop below an attachment (sight-line, sight-angle), m. */
  drop: number;
  /** Vertical angle (sight-angle), rad. */
  angle: number;
  /** One stopwatch timing of N returns (start and stop reaction), s. */
  timing: number;
  /** Each coordinate of a surveyed point, m. */
  point: number;
  /** Attachment and ground elevations (clearance only), m. */
  elevation: number;
}

/** The tension section as the assessment sees it: one conductor, one design basis, its spans. */
export interface SectionDesignInput {
  conductor: AssessConductor;
  basis: DesignBasisInput;
  /** Horizontal lengths of every span of the section, m (for the ruling span). */
  spanLengths: number[];
  /** Ruling span, m, overriding the one computed from spanLengths. */
  rulingSpanOverride?: number;
  /** Highest conductor temperature of the design, °C. */
  maxDesignTemperature: number;
  terrainCategory: TerrainCategoryNumber;
}

/** Project or section settings of the checks. Absent fields take the documented defaults (core/assess/defaults). */
export interface AssessSettings {
  tolerance?: SagToleranceSettings;
  /**
   * State the installed wire is compared in: 'initial' for newly strung wire (default), 'final' for wire that has
   * been in service long enough to have crept.
   */
  compareState?: WireState;
  /**
   * Condition of the hot-day projection for the clearance check. Default 'final' (common practice: ground clearance
   * is checked with the sag after creep at the maximum design temperature, the lowest the wire will hang).
   */
  clearanceState?: WireState;
  /** Tension limits; default NESC_TENSION_LIMITS. */
  tensionLimits?: TensionLimit[];
  /** Terrain limits; default CIGRE_TB273_TERRAIN_LIMITS (from memory). */
  terrainLimits?: TerrainLimit[];
  /** Conductor temperature for the H/w check, °C: the site's average temperature of the coldest month. */
  vibrationTemperature?: number;
  /** Optional loaded condition for the 'loaded' tension limits. */
  loadedCondition?: LoadedCondition;
  /** Reading uncertainties (section-wide defaults; a reading may override). */
  uncertainty?: Partial<ReadingUncertainty>;
  /** Readings of one wire disagree when their standardized difference exceeds this, in sigmas. Default 2. */
  disagreementSigmas?: number;
  /** Modified z-score above which a span's tension is an outlier in its section. Default 3.5. */
  outlierModifiedZ?: number;
}

/** Ground under a span and what it must clear (elevations on one vertical datum). */
export interface ClearanceSite {
  /** Elevation of this wire's near attachment, m. */
  nearAttachmentElevation: number;
  /** Ground points under the span: x from the near structure, m, horizontal; elevation, m. At least one. */
  groundPoints: { x: number; elevation: number }[];
  /** Required clearance, m (entered by the user; local codes govern). */
  requiredClearance?: number;
}

/** One reading of one wire in one span. */
export interface ReadingInput {
  /** This wire's span and rise (including its attachment offsets). */
  geometry: SpanGeometry;
  measurement: Measurement;
  /** Conductor temperature at the time of the reading, °C. */
  conductorTemperature: number;
  /** Per-reading uncertainty overrides. */
  uncertainty?: Partial<ReadingUncertainty>;
  /** Ground profile for the clearance check (optional). */
  site?: ClearanceSite;
  /** Caller's id, echoed back in wire and section results. */
  id?: string;
}

/** The design at one conductor temperature, for one span. */
export interface DesignAtTemperature {
  /** Conductor temperature, °C. */
  temperature: number;
  /** State compared (initial or final). */
  state: WireState;
  /** Ruling span used, m, and whether it was the user's override. */
  rulingSpan: number;
  rulingSpanOverridden: boolean;
  /** Design horizontal tension, N: shared by every span of the section (ruling-span concept). */
  horizontalTension: number;
  /** Midspan sag of the level ruling span at that tension, m. */
  rulingSpanSag: number;
  /** This span's design midspan sag: exact catenary with its own span and rise at the design tension, m. */
  midspanSag: number;
  /** This span's design maximum sag (exact catenary), m. */
  maxSag: number;
  /** The textbook scaling D_RS·(S/RS)², m, for comparison only. */
  scaledSag: number;
  /** True when a design table was extrapolated beyond its rows (by state change from the nearest row). */
  extrapolated: boolean;
  /** Plain-language notes (extrapolation, assumed creep, …). */
  notes: string[];
}

export type CheckStatus = 'pass' | 'marginal' | 'fail' | 'not-checked';

/** A 95 % band (±1.96 σ) around a value. */
export interface Band {
  value: number;
  /** Standard uncertainty (one σ). */
  sigma: number;
  low: number;
  high: number;
}

export type Verdict = 'within' | 'too-slack' | 'too-tight' | 'recheck';

export interface VerdictResult {
  verdict: Verdict;
  /** Plain-language reason with the numbers (SI; the app may re-word with its own units). */
  reason: string;
  /** Measured minus design midspan sag, m (positive = slacker than design). */
  sagDeviation: number;
  /** 95 % band of the sag deviation. */
  band: Band;
  /** Allowed deviation either way, m. */
  allowance: number;
  /** Distance from the deviation to the nearer tolerance limit, m (positive = inside). */
  margin: number;
}

export interface TensionCheck {
  limit: TensionLimit;
  /** Conductor temperature of the projected state, °C. */
  temperature: number;
  /** Projected horizontal tension, N, and highest support tension, N, on this span. */
  horizontalTension: number;
  supportTension: number;
  /** Support tension in percent of rated strength. */
  percentOfRated: number;
  /** Limit minus actual, percentage points (positive = inside). */
  margin: number;
  status: CheckStatus;
}

export interface VibrationCheck {
  limit: TerrainLimit;
  /** Temperature of the check, °C, and the initial-state H there. */
  temperature: number;
  horizontalTension: number;
  /** H/w, m. */
  catenaryParameter: number;
  /** Limit minus actual, m (positive = inside). */
  margin: number;
  status: CheckStatus;
}

export interface ClearanceResult {
  /** Maximum design temperature, °C, and the projected wire there. */
  temperature: number;
  horizontalTension: number;
  midspanSag: number;
  maxSag: number;
  /** Smallest vertical distance from wire to ground, m, where, and the ground elevation there. */
  minimumClearance: number;
  minimumX: number;
  /** Required clearance, m, when given, and the margin (minimum − required). */
  requiredClearance?: number;
  margin?: number;
  /** 95 % band of the minimum clearance. */
  band?: Band;
  status: CheckStatus;
  caution: string;
}

/** Everything the result screen shows for one reading. */
export interface ReadingAssessment {
  id?: string;
  temperature: number;
  measured: SpanSolution;
  design: DesignAtTemperature;
  /** Measured H corrected to the design's common temperature (state change on the ruling span). */
  atCommonTemperature: { temperature: number; horizontalTension: number; midspanSag: number };
  /** Measured minus design horizontal tension, N, and as a fraction of design. */
  tensionDeviation: number;
  tensionDeviationRelative: number;
  /** Bands of the measured H, the sag deviation and the corrected H. */
  uncertainty: {
    horizontalTension: Band;
    sagDeviation: Band;
    commonTemperatureTension: Band;
    /** Largest contributions to the sag deviation's σ, m, largest first. */
    contributions: { input: string; sigma: number }[];
    /** False when a perturbed input had no solution (bands then are NaN). */
    available: boolean;
  };
  verdict: VerdictResult;
  /** Support tension at the measured state, percent of rated strength. */
  percentOfRated: number;
  tensionChecks: TensionCheck[];
  vibration: VibrationCheck;
  clearance?: ClearanceResult;
}

/** Several readings of one wire combined. */
export interface WireAssessment {
  readings: ReadingAssessment[];
  /** Inverse-variance weighted H at the common temperature, and weighted sag deviation, with bands. */
  combinedTension: Band;
  combinedSagDeviation: Band;
  /** Chi-square of the sag deviations about their weighted mean, its degrees of freedom and 95 % critical value. */
  chiSquare: number;
  degreesOfFreedom: number;
  chiSquareCritical: number;
  consistent: boolean;
  /** Readings whose standardized difference from the others exceeds the threshold. */
  disagreeing: { id?: string; index: number; sigmas: number }[];
  /** Indices of readings left out because their uncertainty could not be worked out. */
  excluded: number[];
  verdict: VerdictResult;
}

/** One span's (or wire's) tension at the section's common temperature, for the spread check. */
export interface SectionTensionEntry {
  id: string;
  /** Groups compared together (e.g. a wire label); all together when absent. */
  group?: string;
  horizontalTension: number;
  sigma?: number;
}

export interface SectionSpread {
  group?: string;
  count: number;
  median: number;
  min: number;
  max: number;
  /** (max − min) / median. */
  relativeSpread: number;
  /** Scaled median absolute deviation (1.4826·MAD), N. */
  robustSigma: number;
  entries: { id: string; horizontalTension: number; modifiedZ: number; outlier: boolean }[];
  outliers: string[];
}
