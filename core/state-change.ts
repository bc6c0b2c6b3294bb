import { arcAndMeanTension, checkGeometry } from './catenary';
import { checkComposite } from './conductors';
import type { CompositeConductor } from './records/conductor';
import { SpanInputError } from './errors';
import { expandBracket, findRoot } from './roots';
import type { ElasticConductor, SpanGeometry } from './types';

/**
 * Change of state: the horizontal tension a conductor takes at another temperature and load, given one known
 * state. The wire keeps its unstressed (zero-tension) length, which only grows with temperature; its hanging
 * arc length is that length stretched by the tension. Everything SI: m, N, N/m, °C.
 */

/** A fully known state: horizontal tension H (N, > 0), conductor temperature (°C), load per length w (N/m, > 0). */
export interface ConductorState {
  horizontalTension: number;
  temperature: number;
  weight: number;
}

/** The state whose tension is wanted: conductor temperature (°C) and load per length (N/m, > 0). */
export interface TargetState {
  temperature: number;
  weight: number;
}

/**
 * Default creep allowance as an equivalent temperature rise, °C. [derived] from the initial and final (10-year
 * creep at 60 °F) rows of the Drake and Arbutus sag-tension tables in Douglass & Thrash, "Sag and Tension of
 * Conductor", Electric Power Engineering Handbook: the final sags match the initial ones about 21 °C warmer.
 */
export const DEFAULT_CREEP_TEMPERATURE_OFFSET = 21;

/** Whether a state is as strung (before creep) or after long-term creep. */
export type CreepCondition = 'initial' | 'final';

/**
 * Temperature to pass to tensionAtState (or tensionAtStateComposite) so that creep is represented as an
 * equivalent temperature offset: creep lengthens the wire as heating it by `offset` would.
 * - design state initial, wanted final at t: target temperature t + offset;
 * - design state final, wanted initial at t: target temperature t − offset;
 * - same condition both sides: t unchanged.
 * @param temperature conductor temperature of the wanted state, °C
 * @param offset creep allowance, °C (default DEFAULT_CREEP_TEMPERATURE_OFFSET); 0 disables creep
 */
export function creepAdjustedTemperature(
  temperature: number,
  fromCondition: CreepCondition,
  toCondition: CreepCondition,
  offset: number = DEFAULT_CREEP_TEMPERATURE_OFFSET,
): number {
  const toFinal = toCondition === 'final' ? 1 : 0;
  const fromFinal = fromCondition === 'final' ? 1 : 0;
  return temperature + offset * (toFinal - fromFinal);
}

function checkState(state: { temperature: number; weight: number }, horizontalTension?: number): void {
  if (!Number.isFinite(state.temperature)) {
    throw new SpanInputError('state-invalid', 'Conductor temperature must be a number.');
  }
  if (!Number.isFinite(state.weight) || state.weight <= 0) {
    throw new SpanInputError('state-invalid', 'Load per unit length must be a number greater than zero.');
  }
  if (horizontalTension !== undefined && (!Number.isFinite(horizontalTension) || horizontalTension <= 0)) {
    throw new SpanInputError('state-invalid', 'The known tension must be a number greater than zero.');
  }
}

function checkElastic(c: ElasticConductor): void {
  if (!Number.isFinite(c.axialStiffness) || c.axialStiffness <= 0) {
    throw new SpanInputError(
      'conductor-invalid',
      'Axial stiffness (modulus × area) must be greater than zero.',
    );
  }
  if (!Number.isFinite(c.expansion)) {
    throw new SpanInputError('conductor-invalid', 'Thermal expansion must be a number.');
  }
}

/**
 * Temperature at which expansion coefficients are referred, °C: L(t) = L₂₀·(1 + α·(t − 20)). [from memory]
 * Conductor standards (IEC 61089, EN 50182) state their properties at 20 °C.
 */
export const THERMAL_REFERENCE_TEMPERATURE = 20;

/**
 * Thermal growth of an unstressed length from t₁ to t₂: (1 + α·(t₂ − 20))/(1 + α·(t₁ − 20)). It equals 1 + α·Δt
 * within α²·|Δt|·|t₁ − 20| (about 1e-7 for a line conductor) and, unlike 1 + α·Δt, composes exactly, so a change
 * of state and its reverse bring the wire back to the same length. Throws 'state-invalid' when non-physical.
 */
export function thermalGrowth(expansion: number, fromTemperature: number, toTemperature: number): number {
  const growth =
    (1 + expansion * (toTemperature - THERMAL_REFERENCE_TEMPERATURE)) /
    (1 + expansion * (fromTemperature - THERMAL_REFERENCE_TEMPERATURE));
  if (!(growth > 0) || !Number.isFinite(growth)) {
    throw new SpanInputError('state-invalid', 'The temperature change is outside any physical range.');
  }
  return growth;
}

/** Initial bracket half-width factor around the known tension; expandBracket widens it when needed. */
const BRACKET_FACTOR = 2;

/** Solves a residual that increases with H (checked bracket, then Brent). */
function solveIncreasing(residual: (h: number) => number, guess: number): number {
  const [lo, hi] = expandBracket(residual, guess / BRACKET_FACTOR, guess * BRACKET_FACTOR);
  return findRoot(residual, lo, hi).root;
}

/**
 * Horizontal tension at a new temperature and load, on the exact catenary with a linear-elastic conductor.
 * @param g span S > 0 m and rise h m (the same span in both states)
 * @param c axial stiffness EA > 0 N and linear expansion α 1/°C
 * @param from the known state: H₁ > 0 N at temperature t₁ °C under load w₁ > 0 N/m
 * @param to the wanted state: temperature t₂ °C, load w₂ > 0 N/m
 * @returns H₂, N
 * Method: the unstressed length at state 1 is L₀ = L₁/(1 + T̄₁/EA), with L₁ the arc length and T̄₁ the tension
 * averaged along the arc (arcAndMeanTension). State 2's H₂ is the root of
 *   L(H₂) = L₀·G(t₁, t₂)·(1 + T̄(H₂)/EA),  G = (1 + α·(t₂ − 20))/(1 + α·(t₁ − 20)) ≈ 1 + α·(t₂ − t₁)
 * (product form: the elastic strain applies to the thermally grown unstressed length; the sum form
 * 1 + αΔt + T̄/EA differs by α·Δt·T̄/EA, 1e-7 to 1e-6. G refers α to 20 °C (thermalGrowth) so that A → B → A is
 * exact.) The residual L₀·G·(1 + T̄/EA) − L rises monotonically with H₂, so a bracket grown from
 * [H₁·w₂/w₁/2, 2·H₁·w₂/w₁] is checked for a sign change and Brent's method converges to
 * ROOT_RELATIVE_TOLERANCE (1e-13) on H₂. For a level span with small sag it reduces to the classic cubic
 * (classicStateChangeCubic). Source: the unstressed-length formulation of SPEC §4; cf. Douglass & Thrash,
 * "Sag and Tension of Conductor", Electric Power Engineering Handbook.
 */
export function tensionAtState(
  g: SpanGeometry,
  c: ElasticConductor,
  from: ConductorState,
  to: TargetState,
): number {
  checkGeometry(g);
  checkElastic(c);
  checkState(from, from.horizontalTension);
  checkState(to);
  const ea = c.axialStiffness;
  const first = arcAndMeanTension(g, from.weight, from.horizontalTension);
  const unstressedLength = first.arcLength / (1 + first.meanTension / ea);
  const grownLength = unstressedLength * thermalGrowth(c.expansion, from.temperature, to.temperature);
  // Written as (what the tension allows) − (what the geometry needs), so it rises with H.
  const residual = (h: number): number => {
    const s = arcAndMeanTension(g, to.weight, h);
    return grownLength * (1 + s.meanTension / ea) - s.arcLength;
  };
  return solveIncreasing(residual, from.horizontalTension * (to.weight / from.weight));
}

/**
 * The classic parabolic change-of-state cubic for a level span, for comparison with tensionAtState only:
 *   H₂²·[H₂ − H₁ + w₁²S²EA/(24H₁²) + EA·α·(t₂ − t₁)] = w₂²S²EA/24
 * It treats the wire as a parabola with slack S³w²/(24H²) and takes tension as uniform and equal to H.
 * Source: the standard change-of-state equation of textbook line design (e.g. J.B. Gupta, Elements of Power
 * System, ch. 10; C.L. Wadhwa, Electrical Power Systems, ch. 7).
 * @param span level span S > 0, m
 * @param c EA > 0 N, α 1/°C
 * @returns H₂, N: the single positive root of x³ + K·x² − M (M > 0, Descartes: one sign change), found by Brent
 * on [0, max(0, −K) + M^(1/3)], where the cubic is negative at 0 and non-negative at the right end.
 */
export function classicStateChangeCubic(
  span: number,
  c: ElasticConductor,
  from: ConductorState,
  to: TargetState,
): number {
  checkGeometry({ span, rise: 0 });
  checkElastic(c);
  checkState(from, from.horizontalTension);
  checkState(to);
  const ea = c.axialStiffness;
  const h1 = from.horizontalTension;
  // x³ + K·x² − M = 0 with K = −H₁ + w₁²S²EA/(24H₁²) + EA·α·Δt and M = w₂²S²EA/24.
  const k =
    -h1 +
    (from.weight * from.weight * span * span * ea) / (24 * h1 * h1) +
    ea * c.expansion * (to.temperature - from.temperature);
  const m = (to.weight * to.weight * span * span * ea) / 24;
  const cubic = (x: number): number => x * x * (x + k) - m;
  return findRoot(cubic, 0, Math.max(0, -k) + Math.cbrt(m)).root;
}

/** Optional description of the aluminium's own zero-stress length at the known state. */
export interface CompositeOptions {
  /**
   * Extra length of the aluminium's zero-stress length over the steel's at the known state, as a strain
   * (dimensionless, default 0: both materials share one zero-stress length at the known state's temperature).
   * A positive value (for example aluminium creep or settlement) lowers the knee point.
   */
  aluminiumSlackStrain?: number;
}

/** Zero-stress lengths of each material at the reference (known) state, m. */
export interface MaterialLengths {
  aluminium: number;
  steel: number;
  referenceTemperature: number;
}

/**
 * Zero-stress lengths of aluminium and steel at the known state. With u = L₁/L_s0 and L_a0 = L_s0·(1 + δ):
 * T̄₁ = E_sA_s·(u − 1) + max(0, E_aA_a·(u/(1+δ) − 1)), piecewise linear and increasing in u, so it is inverted in
 * closed form (aluminium taut branch first, steel-only branch when the aluminium would be in compression).
 */
export function compositeReferenceLengths(
  g: SpanGeometry,
  conductor: CompositeConductor,
  from: ConductorState,
  options: CompositeOptions = {},
): MaterialLengths {
  checkGeometry(g);
  checkComposite(conductor);
  checkState(from, from.horizontalTension);
  const slack = options.aluminiumSlackStrain ?? 0;
  if (!Number.isFinite(slack) || slack <= -1) {
    throw new SpanInputError('conductor-invalid', 'Aluminium slack strain must be a number above −1.');
  }
  const first = arcAndMeanTension(g, from.weight, from.horizontalTension);
  const steelStiffness = conductor.steelModulus * conductor.steelArea;
  const aluminiumStiffness = conductor.aluminiumModulus * conductor.aluminiumArea;
  const t = first.meanTension;
  let stretch =
    (t + steelStiffness + aluminiumStiffness) / (steelStiffness + aluminiumStiffness / (1 + slack));
  if (stretch / (1 + slack) < 1) stretch = 1 + t / steelStiffness;
  const steel = first.arcLength / stretch;
  return { aluminium: steel * (1 + slack), steel, referenceTemperature: from.temperature };
}

/**
 * Mean tension the two materials carry when the wire's arc length is L at temperature t, N:
 *   T̄ = E_sA_s·(L/L_s0(t) − 1) + max(0, E_aA_a·(L/L_a0(t) − 1)),  L_x0(t) = L_x0,ref·thermalGrowth(α_x, t_ref, t)
 * (≈ L_x0,ref·(1 + α_x·(t − t_ref))).
 * The aluminium takes no compression (the max), the steel core carries all tension above the knee.
 */
function materialTension(
  conductor: CompositeConductor,
  lengths: MaterialLengths,
  arc: number,
  temperature: number,
): number {
  const t0 = lengths.referenceTemperature;
  const steelZero = lengths.steel * thermalGrowth(conductor.steelExpansion, t0, temperature);
  const aluminiumZero = lengths.aluminium * thermalGrowth(conductor.aluminiumExpansion, t0, temperature);
  const steelPart = conductor.steelModulus * conductor.steelArea * (arc / steelZero - 1);
  const aluminiumPart = conductor.aluminiumModulus * conductor.aluminiumArea * (arc / aluminiumZero - 1);
  return steelPart + Math.max(0, aluminiumPart);
}

/**
 * Horizontal tension at a new state for a steel-cored (bimetallic, e.g. ACSR) conductor, exact catenary.
 * @param g span S > 0 m, rise h m
 * @param conductor aluminium and steel areas (m²), moduli (Pa) and expansions (1/°C)
 * @param from known state H₁ > 0 N, t₁ °C, w₁ > 0 N/m; both materials are assumed to share one zero-stress
 *   length at t₁ unless options.aluminiumSlackStrain says otherwise
 * @param to wanted state t₂ °C, w₂ > 0 N/m
 * @returns H₂, N
 * Method: each material keeps its own zero-stress length, grown thermally with its own α. State 2's H₂ is the
 * root of T̄(H₂) = E_sA_s·(L/L_s0(t₂) − 1) + max(0, E_aA_a·(L/L_a0(t₂) − 1)), L = L(H₂) the arc length and T̄ the
 * arc-averaged tension. Below the knee this is the linear model with EA = E_aA_a + E_sA_s and the
 * stiffness-weighted α (to second order in αΔt); above it the aluminium is slack and only the steel core
 * (E_sA_s, α_s) carries tension. The knee is where the aluminium term reaches zero: the tension is continuous
 * there by construction. The residual T̄ − material tension rises with H₂; bracket checked, Brent to 1e-13.
 * Source: knee-point model as described in Douglass & Thrash, "Sag and Tension of Conductor", Electric Power
 * Engineering Handbook; moduli and expansions per the project references.
 */
export function tensionAtStateComposite(
  g: SpanGeometry,
  conductor: CompositeConductor,
  from: ConductorState,
  to: TargetState,
  options: CompositeOptions = {},
): number {
  const lengths = compositeReferenceLengths(g, conductor, from, options);
  checkState(to);
  const residual = (h: number): number => {
    const s = arcAndMeanTension(g, to.weight, h);
    return s.meanTension - materialTension(conductor, lengths, s.arcLength, to.temperature);
  };
  return solveIncreasing(residual, from.horizontalTension * (to.weight / from.weight));
}

/**
 * Knee-point temperature, °C: the conductor temperature at which the aluminium's stress reaches zero for this
 * span and load, above which the steel core alone carries the tension. For display and for choosing the model.
 * @param g span S > 0 m, rise h m
 * @param conductor material split (aluminium expansion must exceed the steel's, else there is no knee)
 * @param from known state (as for tensionAtStateComposite)
 * @param weight load per length at which the knee is wanted, N/m > 0 (usually the bare weight)
 * Method: at the knee the arc length equals the aluminium's zero-stress length, L(H) = L_a0(t), which (L_a0 being
 * affine in t, see thermalGrowth) gives t(H); the steel must then carry all of T̄: T̄(H) = E_sA_s·(L/L_s0(t(H)) − 1).
 * That residual rises with H (αₐ > α_s); bracket checked, Brent to 1e-13, and t(H) at the root is returned.
 */
export function kneePointTemperature(
  g: SpanGeometry,
  conductor: CompositeConductor,
  from: ConductorState,
  weight: number,
  options: CompositeOptions = {},
): number {
  const lengths = compositeReferenceLengths(g, conductor, from, options);
  checkState({ temperature: from.temperature, weight });
  if (!(conductor.aluminiumExpansion > conductor.steelExpansion)) {
    throw new SpanInputError(
      'conductor-invalid',
      'Aluminium must expand more than steel for the conductor to have a knee point.',
    );
  }
  const t0 = lengths.referenceTemperature;
  const aluminiumAtT0 = 1 + conductor.aluminiumExpansion * (t0 - THERMAL_REFERENCE_TEMPERATURE);
  // Inverse of L_a0(t) = L_a0,ref·(1 + α_a·(t − 20))/(1 + α_a·(t₀ − 20)).
  const temperatureAt = (arc: number): number =>
    THERMAL_REFERENCE_TEMPERATURE +
    ((arc / lengths.aluminium) * aluminiumAtT0 - 1) / conductor.aluminiumExpansion;
  const residual = (h: number): number => {
    const s = arcAndMeanTension(g, weight, h);
    const temperature = temperatureAt(s.arcLength);
    const steelZero = lengths.steel * thermalGrowth(conductor.steelExpansion, t0, temperature);
    return s.meanTension - conductor.steelModulus * conductor.steelArea * (s.arcLength / steelZero - 1);
  };
  const h = solveIncreasing(residual, from.horizontalTension * (weight / from.weight));
  return temperatureAt(arcAndMeanTension(g, weight, h).arcLength);
}
