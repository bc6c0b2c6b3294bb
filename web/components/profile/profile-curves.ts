// Samples the wires to draw. The catenary comes from core; nothing here solves anything.
import { lowPointX, sagAt, wireElevation } from '../../../core/catenary';
import { parabolicSag } from '../../../core/parabola';

/** How a wire is drawn and what it stands for. */
export type CurveStyle = 'measured' | 'design' | 'hot' | 'parabola';

/** One wire to draw through both attachments. */
export interface ProfileCurve {
  /** Legend text, e.g. "measured 14 °C". */
  label: string;
  /** C = H/w, m (> 0). */
  catenaryParameter: number;
  style: CurveStyle;
}

/** Points along the wire from the near to the far attachment, m. */
export interface SampledCurve {
  curve: ProfileCurve;
  points: { x: number; z: number }[];
}

/** Number of straight pieces per wire: smooth at any phone width, small enough for a printed report. */
export const CURVE_SEGMENTS = 96;

/** True when a curve has a usable catenary parameter. */
export function isDrawable(curve: ProfileCurve): boolean {
  return Number.isFinite(curve.catenaryParameter) && curve.catenaryParameter > 0;
}

/**
 * Elevation of a wire above the near attachment at x, m. Catenary styles use the exact curve from core;
 * the 'parabola' style is the textbook comparison through both attachments with core's parabolic midspan sag
 * D (w·S²/8H = S²/8C): z = h·x/S − 4D·x·(S − x)/S².
 */
export function curveElevation(span: number, rise: number, curve: ProfileCurve, x: number): number {
  const c = curve.catenaryParameter;
  if (curve.style === 'parabola') {
    // Unit weight, so the tension argument is C itself: D = S²/(8C).
    const sag = parabolicSag(span, 1, c);
    return (rise * x) / span - (4 * sag * x * (span - x)) / (span * span);
  }
  return wireElevation(x, c, lowPointX(span, rise, c));
}

/** Vertical chord-to-wire distance of a wire at x, m (core's sagAt for catenaries). */
export function curveSagAt(span: number, rise: number, curve: ProfileCurve, x: number): number {
  if (curve.style === 'parabola') return (rise * x) / span - curveElevation(span, rise, curve, x);
  const c = curve.catenaryParameter;
  return sagAt({ span, rise }, x, c, lowPointX(span, rise, c));
}

/** Samples a wire at evenly spaced x from 0 to S inclusive (the ends land on the attachments). */
export function sampleCurve(span: number, rise: number, curve: ProfileCurve): SampledCurve {
  const points: { x: number; z: number }[] = [];
  for (let k = 0; k <= CURVE_SEGMENTS; k += 1) {
    const x = (span * k) / CURVE_SEGMENTS;
    points.push({ x, z: curveElevation(span, rise, curve, x) });
  }
  return { curve, points };
}
