// Forward at a known H on the exact catenary, read each field method off the curve, back-solve: H must come back
// to 1e-9 (issue 2) for level and inclined spans, including those whose lowest point lies outside the span.
import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { spanAtTension } from '../../../core/catenary';
import { solveSpan } from '../../../core/solve';
import type { MethodId } from '../../../core/types';
import { expectClose } from '../../helpers/expect-close';
import { readingsFromCurve } from './readings-from-curve';

/** Required by issue 2 / SPEC §3 for exact inputs. */
const ROUND_TRIP_TOLERANCE = 1e-9;
const SEED = 20261201;
const RUNS = 200;

const largestError = new Map<MethodId, number>();
afterAll(() => {
  console.log('largest relative round-trip error on H per method:', Object.fromEntries(largestError));
});

/** Spans 20–1000 m, rise/span −0.5…0.5, sag/span 0.3 %–10 % (set through H = w·S/(8·sag/span), the parabola). */
const spanCase = fc.record({
  span: fc.double({ min: 20, max: 1000, noNaN: true }),
  riseRatio: fc.double({ min: -0.5, max: 0.5, noNaN: true }),
  sagRatio: fc.double({ min: 0.003, max: 0.1, noNaN: true }),
  weight: fc.double({ min: 0.5, max: 40, noNaN: true }),
  offset: fc.double({ min: 0.02, max: 0.98, noNaN: true }),
  touch: fc.double({ min: 0.1, max: 0.9, noNaN: true }),
  // Five points, one in each fifth of the span, so no two coincide.
  pointJitter: fc.array(fc.double({ min: 0.05, max: 0.95, noNaN: true }), { minLength: 5, maxLength: 5 }),
});

function checkRoundTrip(method: MethodId) {
  fc.assert(
    fc.property(spanCase, (c) => {
      const geometry = { span: c.span, rise: c.riseRatio * c.span };
      const horizontalTension = (c.weight * c.span) / (8 * c.sagRatio);
      const known = { geometry, weight: c.weight, horizontalTension };
      const points = c.pointJitter.map((jitter, i) => (i + jitter) / 5);
      const reading = readingsFromCurve(known, { offset: c.offset, touch: c.touch, points }).find(
        (m) => m.method === method,
      )!;
      const solved = solveSpan(geometry, c.weight, reading).horizontalTension;
      const error = Math.abs(solved - horizontalTension) / horizontalTension;
      largestError.set(method, Math.max(largestError.get(method) ?? 0, error));
      expectClose(solved, horizontalTension, ROUND_TRIP_TOLERANCE, `${method} on ${JSON.stringify(c)}`);
    }),
    { seed: SEED, numRuns: RUNS },
  );
}

describe('round trip: forward at known H, read the field method off the curve, back-solve', () => {
  for (const method of [
    'midspan-sag',
    'offset-sag',
    'sight-line',
    'sight-angle',
    'return-wave',
    'surveyed-points',
  ] as const) {
    it(`solveSpan recovers H from ${method} to 1e-9 over spans 20–1000 m, rise ±0.5, sag 0.3–10 %`, () => {
      checkRoundTrip(method);
    });
  }

  it('recovers H by every method on a steep span whose lowest point lies beyond the near support', () => {
    // 300 m span rising 150 m at 0.5 % sag/span (parabola): the wire climbs all the way from the near support.
    const geometry = { span: 300, rise: 150 };
    const weight = 15.2;
    const horizontalTension = (weight * 300) / (8 * 0.005);
    const known = { geometry, weight, horizontalTension };
    expect(spanAtTension(geometry, weight, horizontalTension).lowPointX).toBeLessThan(0);
    for (const reading of readingsFromCurve(known, {
      offset: 0.27,
      touch: 0.61,
      points: [0.1, 0.3, 0.5, 0.7, 0.9],
    })) {
      expectClose(
        solveSpan(geometry, weight, reading).horizontalTension,
        horizontalTension,
        ROUND_TRIP_TOLERANCE,
        reading.method,
      );
    }
  });

  it('recovers H by every method on a falling span whose lowest point lies beyond the far support', () => {
    const geometry = { span: 480, rise: -210 };
    const weight = 9.7;
    const horizontalTension = (weight * 480) / (8 * 0.012);
    const known = { geometry, weight, horizontalTension };
    expect(spanAtTension(geometry, weight, horizontalTension).lowPointX).toBeGreaterThan(480);
    for (const reading of readingsFromCurve(known, {
      offset: 0.83,
      touch: 0.35,
      points: [0.05, 0.2, 0.45, 0.6, 0.95],
    })) {
      expectClose(
        solveSpan(geometry, weight, reading).horizontalTension,
        horizontalTension,
        ROUND_TRIP_TOLERANCE,
        reading.method,
      );
    }
  });
});
