/**
 * Ground clearance under a span: the smallest vertical distance from the wire to the ground profile.
 */
import { lowPointX, wireElevation } from '../catenary';
import { SpanInputError } from '../errors';
import type { SpanGeometry } from '../types';
import type { ClearanceSite } from './types';

/** Smallest wire-to-ground distance and where it occurs. */
export interface MinimumClearance {
  /** m; NaN when no ground point lies within the span. */
  clearance: number;
  /** Horizontal position from the near attachment, m. */
  x: number;
  /** Ground elevation there, m. */
  groundElevation: number;
}

/** Ground elevation interpolated linearly between the two nearest ground points (sorted by x). */
function groundAt(points: { x: number; elevation: number }[], x: number): number {
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1];
    const b = points[i];
    if (a !== undefined && b !== undefined && x >= a.x && x <= b.x) {
      return b.x === a.x
        ? Math.min(a.elevation, b.elevation)
        : a.elevation + ((x - a.x) / (b.x - a.x)) * (b.elevation - a.elevation);
    }
  }
  return Number.NaN;
}

/**
 * Minimum vertical clearance from the wire to the ground under a span, m.
 * @param g span S > 0 m and rise h m (this wire's attachments)
 * @param catenaryParameter C = H/w > 0, m
 * @param site near attachment elevation (m) and ground points (x m from the near structure, elevation m, same
 *   datum); ground is known only between the first and last point and is clipped to the span [0, S]
 * Method: wire elevation E₀ + y(x) (exact catenary); ground linear between points, so on each piece
 * f(x) = E₀ + y(x) − ground(x) is convex and its minimum is at an end or where y′ equals the ground slope:
 * sinh((x − x_m)/C) = slope, i.e. x = x_m + C·asinh(slope) (closed form, no iteration).
 */
export function minimumClearance(
  g: SpanGeometry,
  catenaryParameter: number,
  site: ClearanceSite,
): MinimumClearance {
  const points = [...site.groundPoints].sort((a, b) => a.x - b.x);
  if (
    points.some((p) => !Number.isFinite(p.x) || !Number.isFinite(p.elevation)) ||
    !Number.isFinite(site.nearAttachmentElevation)
  ) {
    throw new SpanInputError('input-not-finite', 'Ground points and attachment elevations must be numbers.');
  }
  const c = catenaryParameter;
  const lowX = lowPointX(g.span, g.rise, c);
  const clearanceAt = (x: number): number =>
    site.nearAttachmentElevation + wireElevation(x, c, lowX) - groundAt(points, x);
  const candidates: number[] = [];
  const single = points.length === 1 ? points[0] : undefined;
  if (single !== undefined) {
    if (single.x >= 0 && single.x <= g.span) {
      const clearance = site.nearAttachmentElevation + wireElevation(single.x, c, lowX) - single.elevation;
      return { clearance, x: single.x, groundElevation: single.elevation };
    }
  }
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1];
    const b = points[i];
    if (a === undefined || b === undefined) continue;
    const from = Math.max(a.x, 0);
    const to = Math.min(b.x, g.span);
    if (from > to) continue;
    candidates.push(from, to);
    if (b.x > a.x) {
      const slope = (b.elevation - a.elevation) / (b.x - a.x);
      const stationary = lowX + c * Math.asinh(slope);
      if (stationary > from && stationary < to) candidates.push(stationary);
    }
  }
  let best: MinimumClearance = { clearance: Number.NaN, x: Number.NaN, groundElevation: Number.NaN };
  for (const x of candidates) {
    const clearance = clearanceAt(x);
    if (Number.isFinite(clearance) && !(clearance >= best.clearance)) {
      best = { clearance, x, groundElevation: groundAt(points, x) };
    }
  }
  return best;
}
