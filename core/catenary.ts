import { SpanInputError } from './errors';
import { integrate } from './quadrature';
import type { SpanGeometry, SpanSolution } from './types';

/** Standard gravity, m/s² (ISO 80000-3; CGPM 1901). */
export const STANDARD_GRAVITY = 9.80665;

/** Throws unless the span is finite and positive and the rise finite. */
export function checkGeometry(g: SpanGeometry): void {
  if (!Number.isFinite(g.span) || g.span <= 0) {
    throw new SpanInputError('span-not-positive', 'Span length must be a number greater than zero.');
  }
  if (!Number.isFinite(g.rise)) {
    throw new SpanInputError('rise-not-finite', 'The difference in attachment heights must be a number.');
  }
}

/** Throws unless the weight per unit length is finite and positive. */
export function checkWeight(weight: number): void {
  if (!Number.isFinite(weight) || weight <= 0) {
    throw new SpanInputError(
      'weight-not-positive',
      'Conductor weight per length must be a number greater than zero.',
    );
  }
}

/**
 * Horizontal position of the catenary's lowest point, m from the near attachment (may lie outside [0, S]).
 * x_m = S/2 − C·asinh(h / (2C·sinh(S/2C))), from requiring y(S) = h. C = H/w in m.
 */
export function lowPointX(span: number, rise: number, catenaryParameter: number): number {
  const c = catenaryParameter;
  return span / 2 - c * Math.asinh(rise / (2 * c * Math.sinh(span / (2 * c))));
}

/**
 * Wire elevation above the near attachment at horizontal position x, m.
 * y(x) = C·(cosh((x − x_m)/C) − cosh(x_m/C)), written as 2C·sinh((x − 2x_m)/2C)·sinh(x/2C) so that taut
 * spans (large C) do not lose digits to cancellation.
 */
export function wireElevation(x: number, catenaryParameter: number, lowX: number): number {
  const c = catenaryParameter;
  return 2 * c * Math.sinh((x - 2 * lowX) / (2 * c)) * Math.sinh(x / (2 * c));
}

/** Vertical distance from the chord down to the wire at x, m (positive when the wire hangs below the chord). */
export function sagAt(g: SpanGeometry, x: number, catenaryParameter: number, lowX: number): number {
  return (g.rise * x) / g.span - wireElevation(x, catenaryParameter, lowX);
}

/**
 * Arc length between attachments, m: L = √(h² + (2C·sinh(S/2C))²), the closed form of
 * C·(sinh((S − x_m)/C) + sinh(x_m/C)).
 */
export function arcLength(span: number, rise: number, catenaryParameter: number): number {
  const chordless = 2 * catenaryParameter * Math.sinh(span / (2 * catenaryParameter));
  return Math.hypot(rise, chordless);
}

/**
 * Time for a transverse wave to run from one support to the other and back, s.
 * Wave speed along the arc is √(T/μ) with T = H·cosh(u), ds = cosh(u)·dx, so one way takes
 * √(μ/H)·∫₀ˢ √cosh((x − x_m)/C) dx. μ = w/g is the mass per unit length.
 */
export function returnTimeAt(span: number, weight: number, horizontalTension: number, lowX: number): number {
  const c = horizontalTension / weight;
  const massPerLength = weight / STANDARD_GRAVITY;
  const u0 = -lowX / c;
  const u1 = (span - lowX) / c;
  const panels = Math.max(1, Math.ceil(Math.abs(u1 - u0) / 2));
  const integral = c * integrate((u) => Math.sqrt(Math.cosh(u)), u0, u1, panels);
  return 2 * Math.sqrt(massPerLength / horizontalTension) * integral;
}

/**
 * Arc length (m) and tension averaged along the arc (N) of a span at horizontal tension H: the two figures
 * state change needs, without the return-time quadrature of spanAtTension. Inputs as spanAtTension, unchecked.
 * Mean tension is ∫T ds / L with T = H·cosh u, which integrates exactly to
 * H·(S/2 + (C/2)·cosh(u₀ + u₁)·sinh(S/C)) / L, where u₀ = −x_m/C and u₁ = (S − x_m)/C.
 */
export function arcAndMeanTension(
  g: SpanGeometry,
  weight: number,
  horizontalTension: number,
): { arcLength: number; meanTension: number } {
  const { span, rise } = g;
  const c = horizontalTension / weight;
  const lowX = lowPointX(span, rise, c);
  const length = arcLength(span, rise, c);
  const uSum = (span - 2 * lowX) / c;
  const meanTension =
    (horizontalTension * (span / 2 + (c / 2) * Math.cosh(uSum) * Math.sinh(span / c))) / length;
  return { arcLength: length, meanTension };
}

/**
 * The exact catenary of a span at a given horizontal tension and everything an inspector reads off it.
 * @param g span S > 0 m and rise h m (far minus near attachment elevation)
 * @param weight load per unit length w > 0, N/m (bare or resultant loaded weight)
 * @param horizontalTension H > 0, N
 * Method: closed-form catenary (x_m, y, L above); mean tension as in arcAndMeanTension.
 */
export function spanAtTension(g: SpanGeometry, weight: number, horizontalTension: number): SpanSolution {
  checkGeometry(g);
  checkWeight(weight);
  if (!Number.isFinite(horizontalTension) || horizontalTension <= 0) {
    throw new SpanInputError(
      'tension-not-positive',
      'Horizontal tension must be a number greater than zero.',
    );
  }
  const { span, rise } = g;
  const c = horizontalTension / weight;
  const lowX = lowPointX(span, rise, c);
  if (!Number.isFinite(lowX)) {
    throw new SpanInputError('input-not-finite', 'This tension is too low for the span to be computed.');
  }
  const maxSagX = lowX + c * Math.asinh(rise / span);
  const u0 = -lowX / c;
  const u1 = (span - lowX) / c;
  const { arcLength: length, meanTension } = arcAndMeanTension(g, weight, horizontalTension);
  return {
    horizontalTension,
    catenaryParameter: c,
    lowPointX: lowX,
    midspanSag: sagAt(g, span / 2, c, lowX),
    maxSag: sagAt(g, maxSagX, c, lowX),
    maxSagX,
    arcLength: length,
    nearSupportTension: horizontalTension * Math.cosh(u0),
    farSupportTension: horizontalTension * Math.cosh(u1),
    meanTension,
    returnTime: returnTimeAt(span, weight, horizontalTension, lowX),
  };
}
