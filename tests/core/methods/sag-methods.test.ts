// Midspan and offset sag readings: checks against closed forms written out here (not core's own code), the
// parabola's error on steep spans, and every input error by code.
import { describe, expect, it } from 'vitest';
import { tensionFromMidspanSag } from '../../../core/methods/midspan-sag';
import { tensionFromOffsetSag } from '../../../core/methods/offset-sag';
import { parabolicTensionFromSag } from '../../../core/parabola';
import { solveSpan } from '../../../core/solve';
import { expectClose } from '../../helpers/expect-close';
import { expectCode } from '../../helpers/expect-code';

/** SPEC §3: relative error on H for exact inputs. */
const EXACT = 1e-9;

/** SPEC §2 written out directly: x_m and y(x) of the catenary through (0, 0) and (S, h). */
function specCatenary(span: number, rise: number, c: number) {
  const lowX = span / 2 - c * Math.asinh(rise / (2 * c * Math.sinh(span / (2 * c))));
  const y = (x: number) => c * (Math.cosh((x - lowX) / c) - Math.cosh(lowX / c));
  return { lowX, sagAt: (x: number) => (rise * x) / span - y(x) };
}

describe('midspan-sag', () => {
  it('recovers H on a level span from the closed form D = C·(cosh(S/2C) − 1) (textbook catenary)', () => {
    // 250 m level span, C = 1234.5 m: D written out here, independent of core/catenary.ts.
    const c = 1234.5;
    const sag = c * (Math.cosh(250 / (2 * c)) - 1);
    expectClose(
      tensionFromMidspanSag({ span: 250, rise: 0 }, 8.3, { method: 'midspan-sag', sag }),
      8.3 * c,
      EXACT,
    );
  });

  it('recovers H on an inclined span from SPEC §2 formulas written out in the test', () => {
    const c = 987.6;
    const sag = specCatenary(410, -73, c).sagAt(205);
    expectClose(
      tensionFromMidspanSag({ span: 410, rise: -73 }, 12.1, { method: 'midspan-sag', sag }),
      12.1 * c,
      EXACT,
    );
  });

  it('shows the parabola 7.2 % low in tension on a span rising 40 % of its length at 3 % sag, where the exact solve holds', () => {
    // Issue 2 claims "over 7 % on a span rising 40 % of its length". What is true (derived): at small sag the exact
    // midspan sag of an inclined span is √(1 + (h/S)²) times the parabola's w·S²/8H, so w·S²/8D is low by
    // 1 − 1/√1.16 = 7.15 %, growing with sag (7.22 % at 3 %, 7.9 % at 10 %). Asserted at 3 % sag/span, a
    // realistic sag for a steep distribution span: 300 m span, 120 m rise, D = 9 m.
    const geometry = { span: 300, rise: 120 };
    const weight = 14.6;
    const exact = solveSpan(geometry, weight, { method: 'midspan-sag', sag: 9 });
    expectClose(exact.midspanSag, 9, EXACT);
    const parabola = parabolicTensionFromSag(300, weight, 9);
    const shortfall = 1 - parabola / exact.horizontalTension;
    expect(shortfall).toBeGreaterThan(0.07);
    // Leading-order value 1 − 1/√1.16 plus the O(k²) growth seen at 3 %: within 0.001 of 0.0715.
    expectClose(shortfall, 1 - 1 / Math.sqrt(1.16), 0.015);
    // The same check at 0.5 % sag tends to the leading-order value.
    const flat = solveSpan(geometry, weight, { method: 'midspan-sag', sag: 1.5 });
    expectClose(
      1 - parabolicTensionFromSag(300, weight, 1.5) / flat.horizontalTension,
      1 - 1 / Math.sqrt(1.16),
      0.001,
    );
  });

  it('rejects a sag of zero or below, a non-number, an absurd sag and a sag too small to resolve, by code', () => {
    const g = { span: 200, rise: 10 };
    expectCode(() => tensionFromMidspanSag(g, 10, { method: 'midspan-sag', sag: 0 }), 'sag-not-positive');
    expectCode(() => tensionFromMidspanSag(g, 10, { method: 'midspan-sag', sag: -0.4 }), 'sag-not-positive');
    expectCode(
      () => tensionFromMidspanSag(g, 10, { method: 'midspan-sag', sag: Number.NaN }),
      'input-not-finite',
    );
    // Every positive sag has a catenary; only shapes past floating range (k > 50, sag ~1e19 spans) are refused.
    expectCode(() => tensionFromMidspanSag(g, 10, { method: 'midspan-sag', sag: 1e30 }), 'sag-too-large');
    // 2e-13 m on 200 m is below k = 1e-9: indistinguishable from a straight wire.
    expectCode(() => tensionFromMidspanSag(g, 10, { method: 'midspan-sag', sag: 2e-13 }), 'sag-not-positive');
  });

  it('accepts a very slack span (sag more than half the span) and round-trips it', () => {
    const c = 50;
    const sag = specCatenary(200, 30, c).sagAt(100);
    expect(sag / 200).toBeGreaterThan(0.5);
    expectClose(
      tensionFromMidspanSag({ span: 200, rise: 30 }, 3, { method: 'midspan-sag', sag }),
      3 * c,
      EXACT,
    );
  });
});

describe('offset-sag', () => {
  it('recovers H from a sag taken 62 m into a 350 m span falling 120 m (SPEC §2 formulas)', () => {
    const c = 2100;
    const sag = specCatenary(350, -120, c).sagAt(62);
    expectClose(
      tensionFromOffsetSag({ span: 350, rise: -120 }, 20.5, { method: 'offset-sag', x: 62, sag }),
      20.5 * c,
      EXACT,
    );
  });

  it('recovers H from a reading a metre from the support', () => {
    const c = 1500;
    const sag = specCatenary(300, 45, c).sagAt(1);
    expectClose(
      tensionFromOffsetSag({ span: 300, rise: 45 }, 10, { method: 'offset-sag', x: 1, sag }),
      10 * c,
      EXACT,
    );
  });

  it('rejects an offset at or beyond a support and a non-number offset, by code', () => {
    const g = { span: 200, rise: 0 };
    expectCode(
      () => tensionFromOffsetSag(g, 10, { method: 'offset-sag', x: 0, sag: 1 }),
      'offset-outside-span',
    );
    expectCode(
      () => tensionFromOffsetSag(g, 10, { method: 'offset-sag', x: 200, sag: 1 }),
      'offset-outside-span',
    );
    expectCode(
      () => tensionFromOffsetSag(g, 10, { method: 'offset-sag', x: -5, sag: 1 }),
      'offset-outside-span',
    );
    expectCode(
      () => tensionFromOffsetSag(g, 10, { method: 'offset-sag', x: 250, sag: 1 }),
      'offset-outside-span',
    );
    expectCode(
      () => tensionFromOffsetSag(g, 10, { method: 'offset-sag', x: Number.NaN, sag: 1 }),
      'input-not-finite',
    );
    expectCode(
      () => tensionFromOffsetSag(g, 10, { method: 'offset-sag', x: 50, sag: 0 }),
      'sag-not-positive',
    );
  });
});
