// The root finder behind the one-unknown back-solvers: answers only across a checked sign change.
import { describe, expect, it } from 'vitest';
import { CERTIFIED_WIDTH, solveIncreasing } from '../../../core/methods/bracketed-newton';
import { expectClose } from '../../helpers/expect-close';
import { expectCode } from '../../helpers/expect-code';

const below = { at: -30, code: 'sag-not-positive' as const, message: 'under the range' };
const above = { at: 5, code: 'sag-too-large' as const, message: 'over the range' };

describe('solveIncreasing', () => {
  it('finds the root of e^y − 3 (y = ln 3) from a poor start, and f changes sign within the certified width', () => {
    let evaluations = 0;
    const f = (y: number) => {
      evaluations++;
      return { value: Math.exp(y) - 3, slope: Math.exp(y) };
    };
    const root = solveIncreasing(f, -4, below, above);
    expectClose(root, Math.log(3), 1e-14);
    expect(f(root - CERTIFIED_WIDTH).value).toBeLessThan(0);
    expect(f(root + CERTIFIED_WIDTH).value).toBeGreaterThan(0);
    expect(evaluations).toBeLessThan(20);
  });

  it('survives a wrong slope (zero, as on the flat part of the sight-line residual) by stepping and bisecting', () => {
    // Increasing, but reports no slope left of 1: the solver must still bracket and converge on y = 2.
    const f = (y: number) => ({ value: y < 1 ? -1 : y - 2, slope: y < 1 ? 0 : 1 });
    expectClose(solveIncreasing(f, -10, below, above), 2, 1e-14);
  });

  it('raises the range codes when f keeps one sign over the whole range, and no-root for non-numbers', () => {
    expectCode(() => solveIncreasing((y) => ({ value: y - 50, slope: 1 }), 0, below, above), 'sag-too-large');
    expectCode(
      () => solveIncreasing((y) => ({ value: y + 50, slope: 1 }), 0, below, above),
      'sag-not-positive',
    );
    expectCode(() => solveIncreasing(() => ({ value: Number.NaN, slope: 1 }), 0, below, above), 'no-root');
  });
});
