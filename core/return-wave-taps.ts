import { SpanInputError } from './errors';

/** The return period fitted to tap times, and how well the taps agree. */
export interface TapFit {
  /** Time of one return t₁ (strike to first return, or between returns), s: the slope of the fitted line. */
  period: number;
  /** Standard error of the period, s; null with only two taps (no degrees of freedom left). */
  spread: number | null;
  /** Number of returns covered, N = taps − 1. */
  returns: number;
  /** RMS of the tap residuals about the fitted line, s (0 with two taps). */
  residualRms: number;
}

/**
 * Fits the return period from the tap times of a return-wave timing: taps[0] is the strike, taps[k] the k-th
 * return, each a time in seconds on any common clock.
 * @param taps at least 2 finite times, strictly increasing
 * Method: ordinary least squares of t = t₀ + k·period over k = 0…N; spread = √(SSR/(N − 1) / Σ(k − k̄)²), the
 * textbook standard error of a fitted slope (e.g. NIST/SEMATECH e-Handbook of Statistical Methods, §4.4.4.1).
 * One reaction-time error per tap thus shrinks as the count grows, which is why timing several returns helps.
 * Errors: 'taps-too-few' (< 2 taps), 'input-not-finite', 'taps-not-increasing'.
 */
export function fitTapPeriod(taps: readonly number[]): TapFit {
  const n = taps.length;
  if (n < 2) throw new SpanInputError('taps-too-few', 'Tap the strike and at least one return.');
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(taps[i]!))
      throw new SpanInputError('input-not-finite', 'Every tap time must be a number.');
    if (i > 0 && !(taps[i]! > taps[i - 1]!)) {
      throw new SpanInputError('taps-not-increasing', 'Each tap must come after the one before it.');
    }
  }
  const meanK = (n - 1) / 2;
  // Times relative to the strike keep the sums small when taps come from a clock with a large origin.
  const origin = taps[0]!;
  let meanT = 0;
  for (const t of taps) meanT += (t - origin) / n;
  let sxx = 0;
  let sxy = 0;
  for (let k = 0; k < n; k++) {
    const dk = k - meanK;
    sxx += dk * dk;
    sxy += dk * (taps[k]! - origin - meanT);
  }
  const period = sxy / sxx;
  let ssr = 0;
  for (let k = 0; k < n; k++) {
    const residual = taps[k]! - origin - meanT - period * (k - meanK);
    ssr += residual * residual;
  }
  return {
    period,
    spread: n > 2 ? Math.sqrt(ssr / (n - 2) / sxx) : null,
    returns: n - 1,
    residualRms: Math.sqrt(ssr / n),
  };
}
