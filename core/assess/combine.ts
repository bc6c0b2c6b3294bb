/**
 * Several readings of one wire: an inverse-variance weighted mean, a chi-square consistency check, and the
 * readings that disagree with the others.
 */
import { SpanInputError } from '../errors';
import { DEFAULT_DISAGREEMENT_SIGMAS } from './defaults';
import { bandOf, judgeSagDeviation } from './tolerance';
import type { AssessSettings, ReadingAssessment, WireAssessment } from './types';

/**
 * Upper 5 % points of the chi-square distribution for 1–10 degrees of freedom (standard statistical tables, e.g.
 * NIST/SEMATECH e-Handbook of Statistical Methods §1.3.6.7.4).
 */
const CHI_SQUARE_95: readonly number[] = [
  3.841, 5.991, 7.815, 9.488, 11.07, 12.592, 14.067, 15.507, 16.919, 18.307,
];

/**
 * The 95th percentile of the chi-square distribution with ν degrees of freedom.
 * @param degreesOfFreedom integer ≥ 1
 * Method: table for ν ≤ 10; beyond, the Wilson–Hilferty cube approximation ν·(1 − 2/(9ν) + z·√(2/(9ν)))³ with
 * z = 1.6449 (E.B. Wilson and M.M. Hilferty, PNAS 17 (1931) 684), within 0.5 % of the tables above ν = 10.
 */
export function chiSquareCritical95(degreesOfFreedom: number): number {
  if (!Number.isInteger(degreesOfFreedom) || degreesOfFreedom < 1) return Number.NaN;
  const tabled = CHI_SQUARE_95[degreesOfFreedom - 1];
  if (tabled !== undefined) return tabled;
  const k = 2 / (9 * degreesOfFreedom);
  return degreesOfFreedom * (1 - k + 1.6448536269514722 * Math.sqrt(k)) ** 3;
}

/** Result of an inverse-variance weighted mean. */
export interface WeightedMean {
  mean: number;
  /** Standard uncertainty of the mean, 1/√Σw, scaled up by the Birge ratio when the values scatter more than their σ. */
  sigma: number;
  /** Internal σ, 1/√Σw, before any scaling. */
  internalSigma: number;
  /** χ² = Σ ((x_i − mean)/σ_i)² and ν = n − 1. */
  chiSquare: number;
  degreesOfFreedom: number;
  /** √(χ²/ν) (NaN for one value). */
  birgeRatio: number;
  /** (x_i − mean)/√(σ_i² − σ_mean²): each value's difference from the mean in its own standard deviations. */
  standardized: number[];
}

/**
 * Inverse-variance weighted mean of independent values with standard uncertainties.
 * @param values at least one {value, sigma}, each sigma finite and > 0
 * Method: weights 1/σ_i², mean Σw_i·x_i/Σw_i, σ = 1/√Σw_i (JCGM 100:2008 ideas; Bevington & Robinson, "Data
 * Reduction and Error Analysis", ch. 4). When χ²/ν > 1 the σ is multiplied by the Birge ratio √(χ²/ν), as in the
 * Particle Data Group's averages (from memory), so scattered readings do not claim a small band. The standardized
 * difference uses var(x_i − mean) = σ_i² − σ_mean², since the mean contains x_i.
 */
export function inverseVarianceMean(values: { value: number; sigma: number }[]): WeightedMean {
  if (values.length === 0) throw new SpanInputError('input-not-finite', 'There are no readings to combine.');
  if (values.some((v) => !Number.isFinite(v.value) || !Number.isFinite(v.sigma) || v.sigma <= 0)) {
    throw new SpanInputError(
      'uncertainty-invalid',
      'Every reading needs a value and an uncertainty greater than zero to be combined.',
    );
  }
  const weights = values.map((v) => 1 / (v.sigma * v.sigma));
  const totalWeight = weights.reduce((sum, w) => sum + w, 0);
  const mean = values.reduce((sum, v, i) => sum + (weights[i] ?? 0) * v.value, 0) / totalWeight;
  const internalSigma = 1 / Math.sqrt(totalWeight);
  const chiSquare = values.reduce((sum, v) => sum + ((v.value - mean) / v.sigma) ** 2, 0);
  const degreesOfFreedom = values.length - 1;
  const birgeRatio = degreesOfFreedom > 0 ? Math.sqrt(chiSquare / degreesOfFreedom) : Number.NaN;
  const sigma = birgeRatio > 1 ? internalSigma * birgeRatio : internalSigma;
  const standardized = values.map((v) => {
    const spread = v.sigma * v.sigma - internalSigma * internalSigma;
    return spread > 0 ? (v.value - mean) / Math.sqrt(spread) : 0;
  });
  return { mean, sigma, internalSigma, chiSquare, degreesOfFreedom, birgeRatio, standardized };
}

/** A reading that disagrees with the others: its index and its distance from them in standard deviations. */
export interface Disagreement {
  index: number;
  sigmas: number;
}

/**
 * Which values disagree with the rest beyond their uncertainties.
 * @param values each {value, sigma > 0}
 * @param threshold leave-one-out distance, in σ, beyond which a value disagrees (default 2, ≈ 95 % two-sided)
 * Method (sequential rejection, common practice): while the remaining values fail the χ² test at 95 %, take the
 * one farthest from the weighted mean of the others, z = (x_i − x̄₋ᵢ)/√(σ_i² + σ²(x̄₋ᵢ)), and set it aside if
 * |z| exceeds the threshold. Comparing with the others' mean keeps one wild reading from dragging the mean
 * until good readings look wrong too. With two values left neither can be singled out: both are returned.
 */
export function disagreeingValues(
  values: { value: number; sigma: number }[],
  threshold: number = DEFAULT_DISAGREEMENT_SIGMAS,
): Disagreement[] {
  const flagged: Disagreement[] = [];
  let active = values.map((_, index) => index);
  const pick = (indices: number[]) =>
    indices.map((i) => values[i] ?? { value: Number.NaN, sigma: Number.NaN });
  while (active.length >= 2) {
    const all = inverseVarianceMean(pick(active));
    if (!(all.chiSquare > chiSquareCritical95(all.degreesOfFreedom))) break;
    const distances = active.map((index) => {
      const others = inverseVarianceMean(pick(active.filter((i) => i !== index)));
      const own = values[index] ?? { value: Number.NaN, sigma: Number.NaN };
      const sigmas = (own.value - others.mean) / Math.hypot(own.sigma, others.internalSigma);
      return { index, sigmas };
    });
    if (active.length === 2) {
      flagged.push(...distances.filter((d) => Math.abs(d.sigmas) > threshold));
      break;
    }
    const worst = distances.reduce((a, b) => (Math.abs(b.sigmas) > Math.abs(a.sigmas) ? b : a));
    if (!(Math.abs(worst.sigmas) > threshold)) break;
    flagged.push(worst);
    active = active.filter((i) => i !== worst.index);
  }
  return flagged.sort((a, b) => a.index - b.index);
}

/** Weighted mean of the usable values; plain mean with σ 0 when every σ is exactly 0 (readings taken as exact). */
function combineUsable(values: { value: number; sigma: number }[]): WeightedMean {
  if (values.length > 0 && values.every((v) => v.sigma === 0 && Number.isFinite(v.value))) {
    const mean = values.reduce((sum, v) => sum + v.value, 0) / values.length;
    const degreesOfFreedom = values.length - 1;
    return {
      mean,
      sigma: 0,
      internalSigma: 0,
      chiSquare: 0,
      degreesOfFreedom,
      birgeRatio: Number.NaN,
      standardized: values.map(() => 0),
    };
  }
  return inverseVarianceMean(values);
}

const usableSigma = (sigma: number): boolean => Number.isFinite(sigma) && sigma > 0;

/**
 * Combines the assessed readings of one wire (one span, one wire position).
 * @param readings at least one assessment from assessReading
 * @param settings tolerance (for the verdict) and disagreementSigmas (default 2, common practice ≈ 95 %)
 * Combines the H corrected to the common temperature and the sag deviation (each reading against the design at its
 * own temperature) by inverse-variance weighting; the wire's verdict is the tolerance rule applied to the combined
 * deviation and band, with the allowance on the weighted design sag. Readings that disagree beyond their
 * uncertainty are listed (disagreeingValues); χ² above its 95 % point marks the set inconsistent. All readings stay
 * in the combination (σ scaled by the Birge ratio), so a disagreement widens the band instead of being silently
 * dropped: removing a reading is the inspector's decision. Readings whose uncertainty could not be worked out are
 * left out of the combination and listed in `excluded`; when none is left the verdict is "recheck".
 */
export function assessWire(readings: ReadingAssessment[], settings: AssessSettings = {}): WireAssessment {
  if (readings.length === 0)
    throw new SpanInputError('input-not-finite', 'There are no readings to combine.');
  const allExact = readings.every((r) => r.uncertainty.sagDeviation.sigma === 0);
  const usedIndex = readings
    .map((r, index) => ({ r, index }))
    .filter(
      ({ r }) =>
        allExact ||
        (usableSigma(r.uncertainty.sagDeviation.sigma) &&
          usableSigma(r.uncertainty.commonTemperatureTension.sigma)),
    )
    .map(({ index }) => index);
  const excluded = readings.map((_, index) => index).filter((index) => !usedIndex.includes(index));
  const used = usedIndex
    .map((index) => readings[index])
    .filter((r): r is ReadingAssessment => r !== undefined);
  if (used.length === 0) {
    const verdict = judgeSagDeviation(Number.NaN, Number.NaN, Number.NaN, settings.tolerance);
    verdict.reason =
      'No reading of this wire has a worked-out uncertainty, so they cannot be combined: measure again.';
    return {
      readings,
      combinedTension: bandOf(Number.NaN, Number.NaN),
      combinedSagDeviation: bandOf(Number.NaN, Number.NaN),
      chiSquare: Number.NaN,
      degreesOfFreedom: 0,
      chiSquareCritical: Number.NaN,
      consistent: false,
      disagreeing: [],
      excluded,
      verdict,
    };
  }
  const tension = combineUsable(
    used.map((r) => ({
      value: r.atCommonTemperature.horizontalTension,
      sigma: r.uncertainty.commonTemperatureTension.sigma,
    })),
  );
  const deviationValues = used.map((r) => ({
    value: r.verdict.sagDeviation,
    sigma: r.uncertainty.sagDeviation.sigma,
  }));
  const deviation = combineUsable(deviationValues);
  const weights = used.map((r) => (allExact ? 1 : 1 / r.uncertainty.sagDeviation.sigma ** 2));
  const totalWeight = weights.reduce((sum, w) => sum + w, 0);
  const designSag =
    used.reduce((sum, r, i) => sum + (weights[i] ?? 0) * r.design.midspanSag, 0) / totalWeight;
  const threshold = settings.disagreementSigmas ?? DEFAULT_DISAGREEMENT_SIGMAS;
  const disagreeing: WireAssessment['disagreeing'] = (
    allExact ? [] : disagreeingValues(deviationValues, threshold)
  ).map(({ index: usedAt, sigmas }) => {
    const index = usedIndex[usedAt] ?? usedAt;
    const id = readings[index]?.id;
    return id === undefined ? { index, sigmas } : { id, index, sigmas };
  });
  const critical = chiSquareCritical95(deviation.degreesOfFreedom);
  const verdict = judgeSagDeviation(deviation.mean, deviation.sigma, designSag, settings.tolerance);
  if (disagreeing.length > 0) {
    const list = disagreeing
      .map((d) => `${d.id ?? `reading ${d.index + 1}`} (${d.sigmas.toFixed(1)} σ)`)
      .join(', ');
    verdict.reason += ` Readings that disagree with the others beyond their uncertainty: ${list}.`;
  }
  if (excluded.length > 0) {
    verdict.reason += ` ${excluded.length} reading(s) without a worked-out uncertainty were left out.`;
  }
  return {
    readings,
    combinedTension: bandOf(tension.mean, tension.sigma),
    combinedSagDeviation: bandOf(deviation.mean, deviation.sigma),
    chiSquare: deviation.chiSquare,
    degreesOfFreedom: deviation.degreesOfFreedom,
    chiSquareCritical: critical,
    consistent: !(deviation.chiSquare > critical),
    disagreeing,
    excluded,
    verdict,
  };
}
