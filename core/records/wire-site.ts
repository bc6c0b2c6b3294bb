import type { ClearanceSite } from '../assess/types';
import type { SpanGeometry } from '../types';
import type { SpanRecord } from './span';
import type { WireRecord } from './wire';

/**
 * The solver's view of one wire in a stored span: span and rise from the span's attachment elevations plus the
 * wire's own vertical offsets, and the wire's near attachment elevation (m, site datum).
 */
export function wireGeometry(
  span: SpanRecord,
  wire: WireRecord | undefined,
): { geometry: SpanGeometry; nearElevation: number } {
  const nearElevation = span.nearAttachmentElevation + (wire?.nearOffset ?? 0);
  const farElevation = span.farAttachmentElevation + (wire?.farOffset ?? 0);
  return { geometry: { span: span.length, rise: farElevation - nearElevation }, nearElevation };
}

/** Ground under a span: near ground at x = 0, surveyed points, far ground at x = span; sorted by x (m). */
export function groundPointsOf(span: SpanRecord): { x: number; elevation: number }[] {
  const points: { x: number; elevation: number }[] = [];
  if (span.nearGroundElevation !== undefined) points.push({ x: 0, elevation: span.nearGroundElevation });
  for (const point of span.groundPoints ?? []) points.push({ x: point.x, elevation: point.elevation });
  if (span.farGroundElevation !== undefined)
    points.push({ x: span.length, elevation: span.farGroundElevation });
  return points.sort((a, b) => a.x - b.x);
}

/** The clearance site of a wire in a span (core/assess minimumClearance), or undefined with no ground known. */
export function clearanceSiteFor(span: SpanRecord, wire: WireRecord | undefined): ClearanceSite | undefined {
  const groundPoints = groundPointsOf(span);
  if (groundPoints.length === 0) return undefined;
  return {
    nearAttachmentElevation: wireGeometry(span, wire).nearElevation,
    groundPoints,
    ...(span.requiredClearance === undefined ? {} : { requiredClearance: span.requiredClearance }),
  };
}
