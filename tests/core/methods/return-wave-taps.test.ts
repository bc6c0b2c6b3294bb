// Return period fitted to tap times (strike, then each return).
import { describe, expect, it } from 'vitest';
import { fitTapPeriod } from '../../../core/return-wave-taps';
import { expectClose } from '../../helpers/expect-close';
import { expectCode } from '../../helpers/expect-code';

describe('fitTapPeriod', () => {
  it('recovers a known period through known jitter, with the RMS and standard error computed by hand', () => {
    // Period 2.567 s, strike at 0.31 s; jitter chosen with zero mean and zero correlation with the return count
    // (Σe = 0, Σ(k − 2)·e = 0), so least squares returns the true line and the residuals are the jitter itself.
    const jitter = [0.05, -0.1, 0.1, -0.1, 0.05];
    const taps = jitter.map((e, k) => 0.31 + 2.567 * k + e);
    const fit = fitTapPeriod(taps);
    expectClose(fit.period, 2.567, 1e-12);
    expect(fit.returns).toBe(4);
    // By hand: SSR = 0.035 s², RMS = √(0.035/5) = 0.083666 s; Σ(k − k̄)² = 10; spread = √(0.035/3/10) = 0.034157 s.
    expectClose(fit.residualRms, Math.sqrt(0.007), 1e-12);
    expectClose(fit.spread!, Math.sqrt(0.035 / 30), 1e-12);
  });

  it('gives the exact period with zero spread for perfectly regular taps on a large clock origin', () => {
    // Taps on a clock reading ~1.7e9 s (epoch seconds): relative times keep the fit exact to the clock's resolution.
    const taps = [0, 1, 2, 3].map((k) => 1.7e9 + 0.125 + 2.5 * k);
    const fit = fitTapPeriod(taps);
    expectClose(fit.period, 2.5, 1e-9);
    expect(fit.spread!).toBeLessThan(1e-6);
  });

  it('with only the strike and one return, the period is their difference and the spread is unknown (null)', () => {
    const fit = fitTapPeriod([3.25, 5.75]);
    expectClose(fit.period, 2.5, 1e-15);
    expect(fit.spread).toBeNull();
    expect(fit.residualRms).toBe(0);
  });

  it('rejects fewer than two taps, taps out of order or repeated, and non-numbers, by code', () => {
    expectCode(() => fitTapPeriod([]), 'taps-too-few');
    expectCode(() => fitTapPeriod([1.2]), 'taps-too-few');
    expectCode(() => fitTapPeriod([0, 2.5, 2.4]), 'taps-not-increasing');
    expectCode(() => fitTapPeriod([0, 2.5, 2.5]), 'taps-not-increasing');
    expectCode(() => fitTapPeriod([0, Number.NaN, 5]), 'input-not-finite');
  });
});
