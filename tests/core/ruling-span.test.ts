import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { rulingSpan, sagFromRulingSpan } from '../../core';
import { expectClose } from '../helpers/expect-close';
import { expectCode } from '../helpers/expect-code';

describe('rulingSpan', () => {
  it('matches a hand computation for 300, 250, 400 and 350 m (ruling-span formula, common practice)', () => {
    // By hand: ΣS³ = 27.0e6 + 15.625e6 + 64.0e6 + 42.875e6 = 149.5e6 m³, ΣS = 1300 m,
    // RS = √(149.5e6 / 1300) = √115000 = 339.1165 m.
    expectClose(rulingSpan([300, 250, 400, 350]), 339.1165, 2e-7, 'hand computation');
  });

  it('is the span itself for one span or equal spans', () => {
    expectClose(rulingSpan([187.5]), 187.5, 1e-15, 'single span');
    expectClose(rulingSpan([95, 95, 95]), 95, 1e-15, 'equal spans');
  });

  it('lies between the mean and the longest span (fast-check, fixed seed)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 10, max: 1500, noNaN: true }), { minLength: 1, maxLength: 30 }),
        (spans) => {
          const rs = rulingSpan(spans);
          const mean = spans.reduce((a, b) => a + b, 0) / spans.length;
          expect(rs).toBeGreaterThanOrEqual(mean * (1 - 1e-12));
          expect(rs).toBeLessThanOrEqual(Math.max(...spans) * (1 + 1e-12));
        },
      ),
      { seed: 4242, numRuns: 200 },
    );
  });

  it('rejects an empty list and non-positive or non-finite spans by code', () => {
    expectCode(() => rulingSpan([]), 'spans-empty');
    expectCode(() => rulingSpan([100, 0]), 'span-not-positive');
    expectCode(() => rulingSpan([100, -20]), 'span-not-positive');
    expectCode(() => rulingSpan([100, Number.NaN]), 'span-not-positive');
    expectCode(() => rulingSpan([Number.POSITIVE_INFINITY]), 'span-not-positive');
  });
});

describe('sagFromRulingSpan', () => {
  it('scales the ruling-span sag with the square of the span ratio (SPEC §5)', () => {
    // A 200 m span in a section whose 339.116 m ruling span sags 8.40 m: 8.40·(200/339.116)² = 2.9218 m.
    expectClose(sagFromRulingSpan(8.4, 339.116, 200), 2.9218, 1e-4, 'hand computation');
    expectClose(sagFromRulingSpan(8.4, 339.116, 339.116), 8.4, 1e-15, 'the ruling span itself');
  });

  it('rejects non-positive spans and negative sag by code', () => {
    expectCode(() => sagFromRulingSpan(5, 0, 100), 'span-not-positive');
    expectCode(() => sagFromRulingSpan(5, 300, -1), 'span-not-positive');
    expectCode(() => sagFromRulingSpan(-1, 300, 100), 'sag-not-positive');
  });
});
