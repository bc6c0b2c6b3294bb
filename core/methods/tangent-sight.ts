import { solveIncreasing } from './bracketed-newton';
import { flatLimit, slackLimit, startingLogHalfAngle, tensionFromLogHalfAngle } from './half-angle-range';
import { fractionWhereSlopeAngleIs, sagRatioAt, scaledSpan } from './scaled-span';
import { halfAngleFromSight } from './starting-guess';

/**
 * A straight sight line below both attachments: it passes nearDrop a below the near attachment and farDrop b
 * below the far one, with slope (dz/dx) = (h + a − b)/S. Both drops are > 0 (checked by the callers).
 */
export interface SightLine {
  nearDrop: number;
  farDrop: number;
  slope: number;
}

/** Residual when the touching point is beyond a support: negative, with no slope to follow. */
const OUTSIDE_SPAN = { value: -1, slope: 0 };

/**
 * Horizontal tension H, N, of the exact catenary that just touches the sight line inside the span.
 * Measured down from the chord, the line sits at ℓ(x) = a·(1 − x/S) + b·x/S, a straight line, and the sag d(x) is
 * concave, so the line touches the wire exactly when max(d − ℓ) = 0; the maximum is where the wire's slope equals
 * the line's (or at a support, where d − ℓ = −a or −b < 0). That maximum grows with slackness k, so
 * max(d − ℓ), as a function of y = ln k, is increasing and has exactly one root, at which the touching point lies
 * strictly inside the span. The solver follows its sign through F = ln(d/ℓ) at the touching point (below).
 * Start: the parabola touches at f = √a/(√a + √b) with D_p = ((√a + √b)/2)² (derived from d = 4D·f·(1 − f)),
 * refined by the small-sag series (halfAngleFromSight).
 */
export function tensionFromSight(span: number, rise: number, weight: number, line: SightLine): number {
  const r = rise / span;
  const a = line.nearDrop / span;
  const b = line.farDrop / span;
  const slopeAngle = Math.asinh(line.slope);
  // The residual is passed inline (an unnamed function), which keeps transpilers from wrapping it per call.
  const logHalfAngle = solveIncreasing(
    (y: number) => {
      const k = Math.exp(y);
      const state = scaledSpan(r, k);
      const f = fractionWhereSlopeAngleIs(state, slopeAngle);
      // Touching point beyond a support: the line passes wholly below the wire (F < 0, flat in k).
      if (f <= 0 || f >= 1) return OUTSIDE_SPAN;
      const sag = sagRatioAt(state, f);
      const depth = a * (1 - f) + b * f;
      // F = ln(d/ℓ) at the touching point f(k): same sign as d − ℓ and nearly linear in ln k, so Newton is quick.
      // dF/dk = (∂d/∂k)/d + f′·(b − a)·(1/d − 1/ℓ), since d and ℓ have equal slope b − a at f, and
      // f′ = (1 − β′ − 2f)/(2k) from f = (k + asinh(slope) − β)/(2k).
      const touchSlope = (1 - state.midspanAngleSlope - 2 * f) / (2 * k);
      const slope = sag.slope / sag.value + touchSlope * (b - a) * (1 / sag.value - 1 / depth);
      return { value: Math.log(sag.value / depth), slope: k * slope };
    },
    startingLogHalfAngle(halfAngleFromSight(a, b, r)),
    flatLimit(
      'sag-not-positive',
      'The sight line is too close to the chord to tell the wire from a straight line.',
    ),
    slackLimit('sag-too-large', 'The sight line lies far lower than any wire on this span could hang.'),
  );
  return tensionFromLogHalfAngle(span, weight, logHalfAngle);
}
