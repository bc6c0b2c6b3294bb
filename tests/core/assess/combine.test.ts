import { describe, it, expect } from 'vitest';
import { chiSquareCritical95, disagreeingValues, inverseVarianceMean, SpanInputError } from '../../../core';
import { expectClose } from '../../helpers/expect-close';

describe('inverse-variance combination', () => {
  it('matches a hand-computed two-reading example', () => {
    // Hand computation with the weighted-mean formulas (Bevington & Robinson, Data Reduction and Error Analysis,
    // ch. 4): x = 10 ± 1 and 12 ± 2 → weights 1 and 0.25, mean 13/1.25 = 10.4, σ = 1/√1.25 = 0.894427,
    // χ² = 0.4² + 0.8² = 0.8, standardized differences −0.4/√0.2 and 1.6/√3.2 = ∓0.894427.
    const result = inverseVarianceMean([
      { value: 10, sigma: 1 },
      { value: 12, sigma: 2 },
    ]);
    expectClose(result.mean, 10.4, 1e-12);
    expectClose(result.sigma, 0.894427191, 1e-9);
    expectClose(result.chiSquare, 0.8, 1e-12);
    expect(result.degreesOfFreedom).toBe(1);
    expectClose(result.standardized[0] ?? Number.NaN, -0.894427191, 1e-9);
    expectClose(result.standardized[1] ?? Number.NaN, 0.894427191, 1e-9);
  });

  it('inflates σ by the Birge ratio when readings scatter beyond their uncertainty', () => {
    // Hand computation: 0 ± 1 and 4 ± 1 → mean 2, internal σ 1/√2, χ² = 8, Birge ratio √8, σ = 2.
    const result = inverseVarianceMean([
      { value: 0, sigma: 1 },
      { value: 4, sigma: 1 },
    ]);
    expectClose(result.internalSigma, Math.SQRT1_2, 1e-12);
    expectClose(result.sigma, 2, 1e-12);
  });

  it('refuses a reading without an uncertainty (uncertainty-invalid)', () => {
    let code: string | undefined;
    try {
      inverseVarianceMean([{ value: 1, sigma: 0 }]);
    } catch (error) {
      code = error instanceof SpanInputError ? error.code : 'other';
    }
    expect(code).toBe('uncertainty-invalid');
  });
});

describe('disagreeing readings', () => {
  it('singles out one wild reading among agreeing ones, measured against the others', () => {
    // Hand computation: 0.02, −0.01, 0.40 m, each ± 0.02 m. All three fail χ² (far above 5.991 for ν = 2);
    // leave-one-out: the third is (0.40 − 0.005)/√(0.02² + 0.02²/2) = 16.1 σ from the other two, which then agree
    // (χ² = 1.125 < 3.841).
    const result = disagreeingValues([
      { value: 0.02, sigma: 0.02 },
      { value: -0.01, sigma: 0.02 },
      { value: 0.4, sigma: 0.02 },
    ]);
    expect(result.map((d) => d.index)).toEqual([2]);
    expectClose(result[0]?.sigmas ?? Number.NaN, 0.395 / Math.sqrt(0.0004 + 0.0002), 1e-12);
  });

  it('cannot tell which of two disagreeing readings is wrong, so names both', () => {
    // 0 ± 1 and 4 ± 1: χ² = 8 > 3.841; each is 4/√2 = 2.83 σ from the other.
    const result = disagreeingValues([
      { value: 0, sigma: 1 },
      { value: 4, sigma: 1 },
    ]);
    expect(result.map((d) => d.index)).toEqual([0, 1]);
  });

  it('names nobody when the readings agree within their uncertainty', () => {
    expect(
      disagreeingValues([
        { value: 10, sigma: 1 },
        { value: 12, sigma: 2 },
        { value: 9.5, sigma: 1 },
      ]),
    ).toEqual([]);
  });
});

describe('chi-square 95 % points', () => {
  it('agrees with the published table', () => {
    // NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.6.7.4 (upper critical values of chi-square):
    // ν = 1: 3.841, ν = 5: 11.070, ν = 20: 31.410, ν = 30: 43.773 (the last two through Wilson–Hilferty).
    expectClose(chiSquareCritical95(1), 3.841, 1e-4);
    expectClose(chiSquareCritical95(5), 11.07, 1e-4);
    expectClose(chiSquareCritical95(20), 31.41, 5e-3);
    expectClose(chiSquareCritical95(30), 43.773, 5e-3);
  });
});
