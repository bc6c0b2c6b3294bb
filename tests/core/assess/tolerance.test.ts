import { describe, it, expect } from 'vitest';
import { judgeSagDeviation, sagAllowance, SpanInputError } from '../../../core';
import { expectClose } from '../../helpers/expect-close';

// Default allowance ±0.15 m: IEEE Std 524 as quoted in Douglass & Thrash, Electric Power Engineering Handbook,
// §Sagging accuracy ("within 6 in of the stringing sag values").
const IEEE_524_ALLOWANCE = 0.15;

describe('sag tolerance rule', () => {
  it('defaults to ±150 mm (IEEE Std 524 via the handbook)', () => {
    expectClose(sagAllowance(10), IEEE_524_ALLOWANCE, 1e-15);
  });

  it('combines absolute and relative allowances as the larger or the smaller', () => {
    // ±5 % of a 10 m design sag is 0.5 m (relative range 2–5 %, from memory: construction specifications).
    expectClose(sagAllowance(10, { sagRelative: 0.05 }), 0.5, 1e-15, 'larger (default)');
    expectClose(
      sagAllowance(10, { sagRelative: 0.05, combine: 'smaller' }),
      IEEE_524_ALLOWANCE,
      1e-15,
      'smaller',
    );
    expectClose(
      sagAllowance(2, { sagRelative: 0.05, combine: 'larger' }),
      IEEE_524_ALLOWANCE,
      1e-15,
      '0.1 m < 0.15 m',
    );
  });

  it('rejects a negative tolerance (tolerance-invalid)', () => {
    let code: string | undefined;
    try {
      sagAllowance(10, { sagAbsolute: -0.1 });
    } catch (error) {
      code = error instanceof SpanInputError ? error.code : 'other';
    }
    expect(code).toBe('tolerance-invalid');
  });

  it('is within exactly at ±150 mm and outside just beyond, for an exact reading', () => {
    expect(judgeSagDeviation(IEEE_524_ALLOWANCE, 0, 10).verdict).toBe('within');
    expect(judgeSagDeviation(-IEEE_524_ALLOWANCE, 0, 10).verdict).toBe('within');
    expect(judgeSagDeviation(IEEE_524_ALLOWANCE + 1e-9, 0, 10).verdict).toBe('too-slack');
    expect(judgeSagDeviation(-IEEE_524_ALLOWANCE - 1e-9, 0, 10).verdict).toBe('too-tight');
  });

  it('asks for a recheck when the 95 % band straddles a limit, on either side', () => {
    // deviation +0.10 m, σ 0.05 m: band 0.002…0.198 m crosses +0.15 m.
    const inside = judgeSagDeviation(0.1, 0.05, 10);
    expect(inside.verdict).toBe('recheck');
    expectClose(inside.band.high, 0.1 + 1.959963984540054 * 0.05, 1e-12, '1.96 σ band');
    // deviation −0.20 m, σ 0.05 m: band −0.298…−0.102 m crosses −0.15 m although the estimate is outside.
    const outside = judgeSagDeviation(-0.2, 0.05, 10);
    expect(outside.verdict).toBe('recheck');
    expect(outside.margin).toBeLessThan(0);
    expect(outside.reason).toContain('tight');
  });

  it('calls a reading too slack or too tight only when the whole band is beyond the limit', () => {
    expect(judgeSagDeviation(0.3, 0.05, 10).verdict).toBe('too-slack');
    expect(judgeSagDeviation(-0.3, 0.05, 10).verdict).toBe('too-tight');
    expect(judgeSagDeviation(0.05, 0.04, 10).verdict).toBe('within');
  });

  it('gives the numbers in its reason', () => {
    const result = judgeSagDeviation(0.3, 0.05, 10);
    expect(result.reason).toContain('+0.300 m');
    expect(result.reason).toContain('10.000 m');
    expect(result.reason).toContain('±0.150 m');
  });
});
