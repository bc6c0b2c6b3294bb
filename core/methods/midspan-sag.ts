import { checkGeometry, checkWeight } from '../catenary';
import { SpanInputError } from '../errors';
import type { Measurement, SpanGeometry } from '../types';
import { solveIncreasing } from './bracketed-newton';
import {
  flatLimit,
  requireFinite,
  slackLimit,
  startingLogHalfAngle,
  tensionFromLogHalfAngle,
} from './half-angle-range';
import { sagRatioAt, scaledSpan } from './scaled-span';
import { halfAngleFromSag } from './starting-guess';

export type MidspanSagReading = Extract<Measurement, { method: 'midspan-sag' }>;

/**
 * Horizontal tension H, N, of the exact catenary whose sag below the chord at midspan equals the reading.
 * @param g span S > 0 m, rise h m (any sign; the lowest point may lie outside the span)
 * @param weight w > 0, N/m
 * @param reading sag D > 0, m, measured vertically from the chord to the wire at x = S/2
 * Method: solve d(S/2) = D for log k (k = S/2C) with the cancellation-free sag of scaled-span.ts, by
 * bracket-checked Newton from the parabola's k ≈ 4D/(S·√(1 + (h/S)²)) refined by the small-sag series; certified to 1e-10 relative in H.
 * Every positive sag has a catenary; 'sag-too-large' only fires beyond computable shapes (sag > ~1e19 spans).
 */
export function tensionFromMidspanSag(g: SpanGeometry, weight: number, reading: MidspanSagReading): number {
  return tensionFromSagAt(g, weight, 0.5, reading.sag);
}

/**
 * Shared by midspan-sag and offset-sag: H for a sag `sag` m at span fraction `fraction` in (0, 1).
 * Start: the small-sag series of starting-guess.ts (the parabola plus its first two corrections).
 */
export function tensionFromSagAt(g: SpanGeometry, weight: number, fraction: number, sag: number): number {
  checkGeometry(g);
  checkWeight(weight);
  requireFinite(sag, 'input-not-finite', 'The sag reading must be a number.');
  if (sag <= 0) {
    throw new SpanInputError(
      'sag-not-positive',
      'The sag must be greater than zero (the wire hangs below the chord).',
    );
  }
  const r = g.rise / g.span;
  const target = Math.log(sag / g.span);
  const guess = halfAngleFromSag(sag / g.span, fraction, r);
  // The residual is passed inline (an unnamed function), which keeps transpilers from wrapping it per call.
  const logHalfAngle = solveIncreasing(
    (y: number) => {
      const k = Math.exp(y);
      const { value, slope } = sagRatioAt(scaledSpan(r, k), fraction);
      // F(y) = ln(d/S) − ln(D/S), increasing in y = ln k; dF/dy = k·(d/S)′/(d/S).
      return { value: Math.log(value) - target, slope: (k * slope) / value };
    },
    startingLogHalfAngle(guess),
    flatLimit('sag-not-positive', 'The sag is too small to tell the wire from a straight line.'),
    slackLimit('sag-too-large', 'The sag is far larger than any wire on this span could hang.'),
  );
  return tensionFromLogHalfAngle(g.span, weight, logHalfAngle);
}
