import { expect } from 'vitest';

/**
 * Asserts |actual − expected| ≤ rel·|expected| (or ≤ rel when expected is 0). Relative, because toBeCloseTo
 * counts decimal places, which means nothing across 30 000 N and 0.002 m.
 */
export function expectClose(actual: number, expected: number, rel: number, label = ''): void {
  const scale = expected === 0 ? 1 : Math.abs(expected);
  const error = Math.abs(actual - expected) / scale;
  const ok = Number.isFinite(actual) && error <= rel;
  expect(
    ok,
    `${label ? label + ': ' : ''}got ${actual}, expected ${expected} within ${rel} (relative error ${error})`,
  ).toBe(true);
}
