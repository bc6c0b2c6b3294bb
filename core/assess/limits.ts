/**
 * Tension against the code's limits (percent of rated breaking strength, projected to each limit's condition)
 * and the catenary parameter H/w against the aeolian-vibration guidance of the terrain category.
 */
import { spanAtTension } from '../catenary';
import type { SpanGeometry } from '../types';
import { CIGRE_TB273_TERRAIN_LIMITS, DEFAULT_VIBRATION_TEMPERATURE, NESC_TENSION_LIMITS } from './defaults';
import { changeWireState, type KnownWireState } from './state-model';
import type {
  AssessConductor,
  AssessSettings,
  CheckStatus,
  TensionCheck,
  TerrainCategoryNumber,
  TerrainLimit,
  VibrationCheck,
} from './types';

/**
 * Highest support tension of a span at a horizontal tension, as percent of rated strength.
 * @param g span > 0 m and rise m; @param weight load per length > 0 N/m; @param horizontalTension > 0 N
 * @param ratedStrength rated breaking strength > 0 N
 * The larger of the two support tensions H·cosh(u) is used (exact catenary): conservative against the limits,
 * which apply to the conductor tension wherever it is greatest.
 */
export function supportTensionPercent(
  g: SpanGeometry,
  weight: number,
  horizontalTension: number,
  ratedStrength: number,
): { supportTension: number; percentOfRated: number } {
  const solution = spanAtTension(g, weight, horizontalTension);
  const supportTension = Math.max(solution.nearSupportTension, solution.farSupportTension);
  return { supportTension, percentOfRated: (100 * supportTension) / ratedStrength };
}

/**
 * Measured tension projected to each limit's condition and compared with it.
 * @param stateSpan geometry of the section's change of state (level ruling span; see stateGeometry), m
 * @param spanGeometry this span, m (support tension is taken on it)
 * @param conductor the section's conductor
 * @param measured the measured H (N) at its conductor temperature (°C) and condition (initial/final)
 * @param creepOffset creep allowance, °C
 * @param settings tensionLimits (default NESC as quoted in the handbook) and the optional loaded condition; a
 *   'loaded' limit without a loaded condition is returned as 'not-checked'
 * Method: exact change of state (changeWireState) to the limit's temperature and condition (loaded limits in the
 * initial condition under the loaded resultant weight), then the highest support tension on this span.
 */
export function tensionChecks(
  stateSpan: SpanGeometry,
  spanGeometry: SpanGeometry,
  conductor: AssessConductor,
  measured: KnownWireState,
  creepOffset: number,
  settings: Pick<AssessSettings, 'tensionLimits' | 'loadedCondition'> = {},
): TensionCheck[] {
  const limits = settings.tensionLimits ?? NESC_TENSION_LIMITS;
  return limits.map((limit) => {
    const loaded = limit.condition === 'loaded' ? settings.loadedCondition : undefined;
    if (limit.condition === 'loaded' && loaded === undefined) {
      return {
        limit,
        temperature: limit.temperature,
        horizontalTension: Number.NaN,
        supportTension: Number.NaN,
        percentOfRated: Number.NaN,
        margin: Number.NaN,
        status: 'not-checked',
      };
    }
    const temperature = loaded?.temperature ?? limit.temperature;
    const weight = loaded?.weight ?? conductor.weight;
    const state = limit.condition === 'final' ? 'final' : 'initial';
    const horizontalTension = changeWireState(
      stateSpan,
      conductor,
      measured,
      { temperature, state, weight },
      creepOffset,
    );
    const { supportTension, percentOfRated } = supportTensionPercent(
      spanGeometry,
      weight,
      horizontalTension,
      conductor.ratedStrength,
    );
    const margin = limit.percentOfRated - percentOfRated;
    const status: CheckStatus = margin >= 0 ? 'pass' : 'fail';
    return { limit, temperature, horizontalTension, supportTension, percentOfRated, margin, status };
  });
}

/** The terrain limit for a category from a list (default CIGRE TB 273 values, from memory). */
export function terrainLimitFor(
  category: TerrainCategoryNumber,
  limits: readonly TerrainLimit[] = CIGRE_TB273_TERRAIN_LIMITS,
): TerrainLimit {
  const found = limits.find((limit) => limit.terrainCategory === category);
  if (found) return found;
  const fallback = CIGRE_TB273_TERRAIN_LIMITS.find((limit) => limit.terrainCategory === category);
  if (!fallback) throw new Error(`unreachable: terrain category ${String(category)}`);
  return fallback;
}

/**
 * Catenary parameter H/w at the vibration check's temperature against the terrain category's limit.
 * @param stateSpan geometry of the section's change of state, m
 * @param conductor the section's conductor (bare weight N/m)
 * @param measured measured H (N), temperature (°C) and condition
 * @param creepOffset creep allowance, °C
 * @param category terrain category 1–4
 * @param settings vibrationTemperature (°C; default DEFAULT_VIBRATION_TEMPERATURE, a placeholder) and terrainLimits
 * Method: exact change of state to the initial condition at that temperature (from memory, the guidance is stated
 * for the initial, unloaded tension), then H/w with the bare weight.
 */
export function vibrationCheck(
  stateSpan: SpanGeometry,
  conductor: AssessConductor,
  measured: KnownWireState,
  creepOffset: number,
  category: TerrainCategoryNumber,
  settings: Pick<AssessSettings, 'vibrationTemperature' | 'terrainLimits'> = {},
): VibrationCheck {
  const limit = terrainLimitFor(category, settings.terrainLimits);
  const temperature = settings.vibrationTemperature ?? DEFAULT_VIBRATION_TEMPERATURE;
  const horizontalTension = changeWireState(
    stateSpan,
    conductor,
    measured,
    { temperature, state: 'initial' },
    creepOffset,
  );
  const catenaryParameter = horizontalTension / conductor.weight;
  const margin = limit.maxCatenaryParameter - catenaryParameter;
  return {
    limit,
    temperature,
    horizontalTension,
    catenaryParameter,
    margin,
    status: margin >= 0 ? 'pass' : 'fail',
  };
}
