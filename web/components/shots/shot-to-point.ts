// Kept for callers written before core/instrument-shot.ts existed; new code should call shotToSpanPoint directly.
import { shotToSpanPoint } from '../../../core/instrument-shot';
import type { InstrumentShot } from '../../../core/records/reading';

/**
 * The wire point (x m along the span, z m above the near attachment) of one stored shot, via core's
 * shotToSpanPoint. Throws SpanInputError ('distance-not-positive', 'angle-out-of-range', 'input-not-finite').
 */
export function shotToPoint(shot: InstrumentShot): { x: number; z: number } {
  const point = shotToSpanPoint(shot);
  return { x: point.x, z: point.z };
}
