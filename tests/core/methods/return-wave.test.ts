// Return-wave timing: exact time of flight on the catenary, the RUS small-sag rule as its limit, and errors.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY, spanAtTension } from '../../../core/catenary';
import { tensionFromReturnWave } from '../../../core/methods/return-wave';
import { parabolicReturnWaveSag } from '../../../core/parabola';
import { solveSpan } from '../../../core/solve';
import { expectClose } from '../../helpers/expect-close';
import { expectCode } from '../../helpers/expect-code';

const EXACT = 1e-9;
const INCH = 0.0254;

describe('return-wave', () => {
  it('matches RUS Bulletin 1726C-115 eq. (1), D = 48.3·(T/2N)² in, on a long flat span: 3 returns in 7.7 s', () => {
    // Source: USDA Rural Utilities Service, RUS Bulletin 1726C-115 (rev. 1998), eq. (1). The constant 48.3 carries
    // three figures and assumes g = 32.2 ft/s² (0.08 % above standard gravity); the rule is the small-sag limit,
    // here 0.7 % sag/span where the catenary correction is ~1e-4. So assert to 0.5 %.
    const rusSag = 48.3 * (7.7 / (2 * 3)) ** 2 * INCH;
    const solved = solveSpan({ span: 300, rise: 0 }, 15.9, {
      method: 'return-wave',
      returns: 3,
      seconds: 7.7,
    });
    expectClose(solved.midspanSag, rusSag, 0.005);
    // The same rule in metric: 0.30646·(T/N)² m (REFERENCES, derived from g = 9.80665 m/s²).
    expectClose(solved.midspanSag, 0.30646 * (7.7 / 3) ** 2, 0.001);
  });

  it('stays within 1 % of the rule D = g·t₁²/32 up to 8 % sag/span, level and inclined (rise ±50 %)', () => {
    // REFERENCES 'Return-wave' [derived]: the exact departure is (sag/span)²-small and peaks at 0.83 % for a level
    // span at 8 %.
    fc.assert(
      fc.property(
        fc.double({ min: 50, max: 1000, noNaN: true }),
        fc.double({ min: -0.5, max: 0.5, noNaN: true }),
        fc.double({ min: 0.003, max: 0.08, noNaN: true }),
        (span, riseRatio, sagRatio) => {
          const geometry = { span, rise: riseRatio * span };
          const exact = solveSpan(geometry, 12, { method: 'midspan-sag', sag: sagRatio * span });
          expectClose(parabolicReturnWaveSag(exact.returnTime), exact.midspanSag, 0.01);
          const timed = solveSpan(geometry, 12, {
            method: 'return-wave',
            returns: 4,
            seconds: 4 * exact.returnTime,
          });
          expectClose(timed.horizontalTension, exact.horizontalTension, EXACT);
        },
      ),
      { seed: 7301, numRuns: 150 },
    );
  });

  it('gives sag growing as the square of the time: a 0.2 s error on 7.7 s is ≈ ±5 % in sag', () => {
    // REFERENCES [derived]: dD/D = 2·dT/T. (7.9/7.7)² − 1 = 5.26 %; the exact solve agrees to 0.1 %.
    const g = { span: 300, rise: 40 };
    const base = solveSpan(g, 15.9, { method: 'return-wave', returns: 3, seconds: 7.7 }).midspanSag;
    const late = solveSpan(g, 15.9, { method: 'return-wave', returns: 3, seconds: 7.9 }).midspanSag;
    expectClose(late / base - 1, (7.9 / 7.7) ** 2 - 1, 0.02);
  });

  it('takes a timing that stops on a half return (N = 2.5) as t₁ = T/N', () => {
    const g = { span: 180, rise: -25 };
    const t1 = spanAtTension(g, 6, 9000).returnTime;
    expectClose(
      tensionFromReturnWave(g, 6, { method: 'return-wave', returns: 2.5, seconds: 2.5 * t1 }),
      9000,
      EXACT,
    );
  });

  it('rejects fewer than one return, a non-positive or non-number time, and timings no wire could give, by code', () => {
    const g = { span: 200, rise: 0 };
    expectCode(
      () => tensionFromReturnWave(g, 10, { method: 'return-wave', returns: 0.5, seconds: 5 }),
      'returns-too-few',
    );
    expectCode(
      () => tensionFromReturnWave(g, 10, { method: 'return-wave', returns: 0, seconds: 5 }),
      'returns-too-few',
    );
    expectCode(
      () => tensionFromReturnWave(g, 10, { method: 'return-wave', returns: Number.NaN, seconds: 5 }),
      'input-not-finite',
    );
    expectCode(
      () => tensionFromReturnWave(g, 10, { method: 'return-wave', returns: 3, seconds: 0 }),
      'time-not-positive',
    );
    expectCode(
      () => tensionFromReturnWave(g, 10, { method: 'return-wave', returns: 3, seconds: -4 }),
      'time-not-positive',
    );
    expectCode(
      () =>
        tensionFromReturnWave(g, 10, {
          method: 'return-wave',
          returns: 3,
          seconds: Number.POSITIVE_INFINITY,
        }),
      'time-not-positive',
    );
    // 1e13 s per return: past the slackest shape the solver computes (k = 50, a sag of ~1e19 spans).
    expectCode(
      () => tensionFromReturnWave(g, 10, { method: 'return-wave', returns: 1, seconds: 1e13 }),
      'sag-too-large',
    );
    // 1 µs per return on 200 m: a wave faster than any wire tension allows (k below 1e-9).
    expectCode(
      () => tensionFromReturnWave(g, 10, { method: 'return-wave', returns: 1, seconds: 1e-6 }),
      'time-not-positive',
    );
  });

  it('the small-sag start uses standard gravity (g·t₁²/32 with g = 9.80665 m/s²)', () => {
    expect(STANDARD_GRAVITY).toBe(9.80665);
    expectClose(parabolicReturnWaveSag(2), (9.80665 * 4) / 32, 1e-15);
  });
});
