/**
 * The sag tolerance rule and the verdict of one sag deviation: within, too slack, too tight, or measure again.
 */
import { SpanInputError } from '../errors';
import { COVERAGE_FACTOR_95, DEFAULT_TOLERANCE } from './defaults';
import type { Band, SagToleranceSettings, VerdictResult } from './types';

/** A value with its standard uncertainty and 95 % band (±1.96 σ). */
export function bandOf(value: number, sigma: number): Band {
  return { value, sigma, low: value - COVERAGE_FACTOR_95 * sigma, high: value + COVERAGE_FACTOR_95 * sigma };
}

/**
 * Allowed sag deviation either way, m.
 * @param designSag design midspan sag, m (> 0), for the relative part
 * @param tolerance absolute allowance (m, default 0.15: IEEE Std 524 via Douglass & Thrash), relative allowance
 *   (fraction of design sag, default none), and how to combine them when both are set ('larger' by default,
 *   'smaller' to be stricter). Setting sagAbsolute to 0 with a relative allowance uses the relative one alone
 *   under 'larger'.
 */
export function sagAllowance(designSag: number, tolerance: SagToleranceSettings = {}): number {
  const absolute = tolerance.sagAbsolute ?? DEFAULT_TOLERANCE.sagAbsolute;
  const relative = tolerance.sagRelative ?? DEFAULT_TOLERANCE.sagRelative;
  const combine = tolerance.combine ?? DEFAULT_TOLERANCE.combine;
  if (
    !Number.isFinite(absolute) ||
    absolute < 0 ||
    (relative !== undefined && (!Number.isFinite(relative) || relative < 0))
  ) {
    throw new SpanInputError('tolerance-invalid', 'Sag tolerances must be numbers of zero or more.');
  }
  if (relative === undefined) return absolute;
  const relativeAllowance = relative * Math.abs(designSag);
  return combine === 'smaller'
    ? Math.min(absolute, relativeAllowance)
    : Math.max(absolute, relativeAllowance);
}

const metres = (value: number): string => `${value.toFixed(3)} m`;

/**
 * Verdict on a sag deviation (measured − design midspan sag at the same conductor temperature).
 * @param sagDeviation m; positive means the wire hangs lower (slacker) than designed
 * @param sigma standard uncertainty of the deviation, m (0 for an exact reading)
 * @param designSag design midspan sag, m (for the relative tolerance and the message)
 * @param tolerance tolerance settings (see sagAllowance)
 * Rule: with the 95 % band [d − 1.96σ, d + 1.96σ] and allowance a, the wire is within when the whole band lies in
 * [−a, a] (a deviation exactly at ±a with no uncertainty is within), too slack when the whole band lies above +a,
 * too tight when it lies below −a, and "recheck" when the band crosses a limit, since the reading cannot decide.
 */
export function judgeSagDeviation(
  sagDeviation: number,
  sigma: number,
  designSag: number,
  tolerance: SagToleranceSettings = {},
): VerdictResult {
  const allowance = sagAllowance(designSag, tolerance);
  const band = bandOf(sagDeviation, Number.isFinite(sigma) ? sigma : Number.NaN);
  const margin = allowance - Math.abs(sagDeviation);
  const numbers =
    `deviation ${sagDeviation >= 0 ? '+' : ''}${metres(sagDeviation)} from the design sag ${metres(designSag)}, ` +
    `95 % band ${metres(band.low)} to ${metres(band.high)}, tolerance ±${metres(allowance)}`;
  const base = { sagDeviation, band, allowance, margin };
  if (!Number.isFinite(band.low) || !Number.isFinite(band.high)) {
    return {
      ...base,
      verdict: 'recheck',
      reason: `The uncertainty of this reading could not be worked out, so it cannot decide: measure again (${numbers}).`,
    };
  }
  if (band.low >= -allowance && band.high <= allowance) {
    return { ...base, verdict: 'within', reason: `Sag is within tolerance: ${numbers}.` };
  }
  if (band.low > allowance) {
    return {
      ...base,
      verdict: 'too-slack',
      reason: `The wire hangs lower than designed beyond the tolerance, even allowing for the reading's uncertainty: ${numbers}.`,
    };
  }
  if (band.high < -allowance) {
    return {
      ...base,
      verdict: 'too-tight',
      reason: `The wire hangs higher (tighter) than designed beyond the tolerance, even allowing for the reading's uncertainty: ${numbers}.`,
    };
  }
  const side = sagDeviation >= 0 ? 'slack' : 'tight';
  return {
    ...base,
    verdict: 'recheck',
    reason:
      `The uncertainty band crosses a tolerance limit, so this reading cannot decide; the best estimate leans ${side}` +
      ` and is ${margin >= 0 ? 'inside' : 'outside'} the tolerance. Measure again, ideally by a more precise method: ${numbers}.`,
  };
}
