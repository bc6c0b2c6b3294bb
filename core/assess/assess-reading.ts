/**
 * The judgement of one reading: measured against design at the same conductor temperature, with its uncertainty,
 * verdict, tension limits, vibration guidance and hot-day ground clearance.
 */
import { spanAtTension } from '../catenary';
import type { SpanSolution } from '../types';
import { minimumClearance } from './clearance';
import { CLEARANCE_CAUTION, CODE_REFERENCE_TEMPERATURE } from './defaults';
import { designAtTemperature } from './design-state';
import { tensionChecks, vibrationCheck, supportTensionPercent } from './limits';
import { propagateLinear } from './propagation';
import { readingInputs, resolveUncertainty, type PerturbedReading } from './reading-inputs';
import { solveSpan } from '../solve';
import { changeWireState, creepOffsetOf, stateGeometry } from './state-model';
import { bandOf, judgeSagDeviation } from './tolerance';
import type {
  AssessSettings,
  CheckStatus,
  ClearanceResult,
  DesignAtTemperature,
  ReadingAssessment,
  ReadingInput,
  ReadingUncertainty,
  SectionDesignInput,
  WireState,
} from './types';

/**
 * Temperature to which readings are corrected for comparison and combination, °C: the design's reference
 * temperature for a tension basis, else 60 °F (15.6 °C), the code's reference temperature.
 */
export function commonTemperature(section: SectionDesignInput): number {
  return section.basis.kind === 'tension' ? section.basis.referenceTemperature : CODE_REFERENCE_TEMPERATURE;
}

/** Contributions below this fraction of the total σ are numerical noise and not listed. */
const NEGLIGIBLE_CONTRIBUTION = 1e-6;

/** Everything the model computes from one (possibly perturbed) reading. */
export interface ReadingEvaluation {
  measured: SpanSolution;
  design: DesignAtTemperature;
  sagDeviation: number;
  commonTemperatureTension: number;
  /** Hot-day wire and minimum clearance, when the reading has a site. */
  hot?: { horizontalTension: number; solution: SpanSolution; clearance: number; x: number };
}

/**
 * Evaluates one reading: back-solve H (exact catenary), the design at the same conductor temperature and
 * condition, the sag deviation, H corrected to the common temperature and, with a site, the hot-day clearance.
 * @param section tension section; @param settings compareState and clearanceState
 * @param reading the reading with a weight factor (1 = nominal) and a ground shift already applied
 */
export function evaluateReading(
  section: SectionDesignInput,
  settings: AssessSettings,
  reading: PerturbedReading,
): ReadingEvaluation {
  const state: WireState = settings.compareState ?? 'initial';
  const conductor = { ...section.conductor, weight: section.conductor.weight * reading.weightFactor };
  const perturbedSection = { ...section, conductor };
  const measured = solveSpan(reading.geometry, conductor.weight, reading.measurement);
  // The design sag is the designer's number, worked out with the nominal weight: an off-nominal weight changes the
  // measured tension, not the sag the crew was asked to hang.
  const design = designAtTemperature(section, reading.geometry, reading.conductorTemperature, state);
  const geometry = stateGeometry(perturbedSection, reading.geometry);
  const creepOffset = creepOffsetOf(section.basis);
  const known = {
    horizontalTension: measured.horizontalTension,
    temperature: reading.conductorTemperature,
    state,
  };
  const commonTemperatureTension = changeWireState(
    geometry,
    conductor,
    known,
    { temperature: commonTemperature(section), state },
    creepOffset,
  );
  const evaluation: ReadingEvaluation = {
    measured,
    design,
    sagDeviation: measured.midspanSag - design.midspanSag,
    commonTemperatureTension,
  };
  if (reading.site) {
    const hotTension = changeWireState(
      geometry,
      conductor,
      known,
      { temperature: section.maxDesignTemperature, state: settings.clearanceState ?? 'final' },
      creepOffset,
    );
    const solution = spanAtTension(reading.geometry, conductor.weight, hotTension);
    const lowest = minimumClearance(reading.geometry, solution.catenaryParameter, reading.site);
    evaluation.hot = { horizontalTension: hotTension, solution, clearance: lowest.clearance, x: lowest.x };
  }
  return evaluation;
}

const NAN_BAND = (value: number) => bandOf(value, Number.NaN);

function clearanceResult(
  section: SectionDesignInput,
  reading: ReadingInput,
  hot: NonNullable<ReadingEvaluation['hot']>,
  sigma: number,
): ClearanceResult {
  const required = reading.site?.requiredClearance;
  const band = bandOf(hot.clearance, sigma);
  let status: CheckStatus = 'not-checked';
  let margin: number | undefined;
  if (required !== undefined && Number.isFinite(hot.clearance)) {
    margin = hot.clearance - required;
    if (margin < 0) status = 'fail';
    else status = Number.isFinite(band.low) && band.low >= required ? 'pass' : 'marginal';
  }
  const result: ClearanceResult = {
    temperature: section.maxDesignTemperature,
    horizontalTension: hot.horizontalTension,
    midspanSag: hot.solution.midspanSag,
    maxSag: hot.solution.maxSag,
    minimumClearance: hot.clearance,
    minimumX: hot.x,
    band,
    status,
    caution: CLEARANCE_CAUTION,
  };
  if (required !== undefined) result.requiredClearance = required;
  if (margin !== undefined) result.margin = margin;
  return result;
}

/**
 * For surveyed points, the scatter of the points about the fitted catenary when it exceeds the stated point
 * uncertainty: σ̂ = RMS·√(n/(n − 3)), the residual standard deviation of a 3-parameter least-squares fit (common
 * practice: a-posteriori variance factor). Unchanged for other methods, for n ≤ 3, or when the reading states its
 * own point uncertainty.
 */
export function withFitScatter(
  u: ReadingUncertainty,
  reading: ReadingInput,
  measured: SpanSolution,
): ReadingUncertainty {
  const m = reading.measurement;
  if (m.method !== 'surveyed-points' || reading.uncertainty?.point !== undefined) return u;
  const n = m.points.length;
  const rms = measured.fitResidual ?? 0;
  if (n <= 3 || !(rms > 0)) return u;
  const scatter = rms * Math.sqrt(n / (n - 3));
  return scatter > u.point ? { ...u, point: scatter } : u;
}

/**
 * Judges one reading of one wire against the section's design.
 * @param section conductor, design basis, span lengths or ruling-span override, max design temperature, terrain
 * @param reading this wire's geometry, the field measurement, the conductor temperature (°C), optional site and
 *   uncertainty overrides
 * @param settings tolerance, limits, compared condition and uncertainties (absent fields take the defaults of
 *   core/assess/defaults, each with its source)
 * The verdict compares the measured sag with the design sag at the reading's own conductor temperature, so the
 * measurement needs no temperature correction; the measured H is also carried to the common temperature
 * (commonTemperature) by change of state for combining and for the section spread. Uncertainties propagate to H,
 * the sag deviation, the corrected H and the clearance by linear propagation (propagateLinear) with 95 % bands.
 * Throws SpanInputError (specific code) when the reading or the design admits no solution.
 */
export function assessReading(
  section: SectionDesignInput,
  reading: ReadingInput,
  settings: AssessSettings = {},
): ReadingAssessment {
  const stated = resolveUncertainty(settings.uncertainty, reading.uncertainty);
  const first = readingInputs(reading, stated);
  const best = evaluateReading(section, settings, first.rebuild(first.inputs.map((input) => input.value)));
  const uncertainty = withFitScatter(stated, reading, best.measured);
  const { inputs, rebuild } = uncertainty === stated ? first : readingInputs(reading, uncertainty);
  const withClearance = best.hot !== undefined && Number.isFinite(best.hot.clearance);
  const model = (values: number[]): number[] => {
    const e = evaluateReading(section, settings, rebuild(values));
    const out = [e.measured.horizontalTension, e.sagDeviation, e.commonTemperatureTension];
    if (withClearance) out.push(e.hot?.clearance ?? Number.NaN);
    return out;
  };
  let sigmas = [Number.NaN, Number.NaN, Number.NaN, Number.NaN];
  let contributions: { input: string; sigma: number }[] = [];
  let available = true;
  try {
    const linear = propagateLinear(model, inputs);
    sigmas = linear.sigmas;
    contributions = inputs
      .map((input, i) => ({ input: input.name, sigma: linear.contributions[1]?.[i] ?? 0 }))
      .filter((part) => part.sigma > NEGLIGIBLE_CONTRIBUTION * (linear.sigmas[1] ?? 0))
      .sort((a, b) => b.sigma - a.sigma);
  } catch {
    // A perturbed input fell outside the method's domain (e.g. the sight line no longer touches the wire).
    available = false;
  }
  const [
    sigmaTension = Number.NaN,
    sigmaDeviation = Number.NaN,
    sigmaCommon = Number.NaN,
    sigmaClearance = Number.NaN,
  ] = sigmas;
  const state: WireState = settings.compareState ?? 'initial';
  const geometry = stateGeometry(section, reading.geometry);
  const creepOffset = creepOffsetOf(section.basis);
  const known = {
    horizontalTension: best.measured.horizontalTension,
    temperature: reading.conductorTemperature,
    state,
  };
  const common = commonTemperature(section);
  const assessment: ReadingAssessment = {
    temperature: reading.conductorTemperature,
    measured: best.measured,
    design: best.design,
    atCommonTemperature: {
      temperature: common,
      horizontalTension: best.commonTemperatureTension,
      midspanSag: spanAtTension(reading.geometry, section.conductor.weight, best.commonTemperatureTension)
        .midspanSag,
    },
    tensionDeviation: best.measured.horizontalTension - best.design.horizontalTension,
    tensionDeviationRelative: best.measured.horizontalTension / best.design.horizontalTension - 1,
    uncertainty: {
      horizontalTension: available
        ? bandOf(best.measured.horizontalTension, sigmaTension)
        : NAN_BAND(best.measured.horizontalTension),
      sagDeviation: available ? bandOf(best.sagDeviation, sigmaDeviation) : NAN_BAND(best.sagDeviation),
      commonTemperatureTension: available
        ? bandOf(best.commonTemperatureTension, sigmaCommon)
        : NAN_BAND(best.commonTemperatureTension),
      contributions,
      available,
    },
    verdict: judgeSagDeviation(
      best.sagDeviation,
      available ? sigmaDeviation : Number.NaN,
      best.design.midspanSag,
      settings.tolerance,
    ),
    percentOfRated: supportTensionPercent(
      reading.geometry,
      section.conductor.weight,
      best.measured.horizontalTension,
      section.conductor.ratedStrength,
    ).percentOfRated,
    tensionChecks: tensionChecks(geometry, reading.geometry, section.conductor, known, creepOffset, settings),
    vibration: vibrationCheck(
      geometry,
      section.conductor,
      known,
      creepOffset,
      section.terrainCategory,
      settings,
    ),
  };
  if (reading.id !== undefined) assessment.id = reading.id;
  if (best.hot) {
    assessment.clearance = clearanceResult(
      section,
      reading,
      best.hot,
      withClearance && available ? sigmaClearance : Number.NaN,
    );
  }
  return assessment;
}
