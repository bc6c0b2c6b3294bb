import { checkGeometry, checkWeight } from '../catenary';
import { SpanInputError } from '../errors';
import type { Measurement, SpanGeometry } from '../types';
import { requireFinite } from './half-angle-range';
import { tensionFromSight } from './tangent-sight';

export type SightLineReading = Extract<Measurement, { method: 'sight-line' }>;

/**
 * Horizontal tension H, N, from a tangent sight between two targets: one nearDrop a m below the near attachment,
 * one farDrop b m below the far attachment, set so the line of sight just touches the wire (a = b is the
 * equal-target case).
 * @param g span S > 0 m, rise h m
 * @param weight w > 0, N/m
 * @param reading a ≥ 0 and b ≥ 0, m; a drop of exactly 0 puts the line through a support, where it can only
 *   touch the wire at that support, so it raises 'sight-line-misses-wire'
 * Method: exact tangency on the catenary (tangent-sight.ts); the parabola ((√a + √b)/2)² only starts the search.
 */
export function tensionFromSightLine(g: SpanGeometry, weight: number, reading: SightLineReading): number {
  checkGeometry(g);
  checkWeight(weight);
  const { nearDrop, farDrop } = reading;
  requireFinite(nearDrop, 'input-not-finite', 'The near target drop must be a number.');
  requireFinite(farDrop, 'input-not-finite', 'The far target drop must be a number.');
  if (nearDrop < 0 || farDrop < 0) {
    throw new SpanInputError(
      'drop-negative',
      'Target drops are measured down from the attachments and cannot be negative.',
    );
  }
  if (nearDrop === 0 || farDrop === 0) {
    throw new SpanInputError(
      'sight-line-misses-wire',
      'A sight line through a support cannot touch the wire between the supports: set both targets below the attachments.',
    );
  }
  const slope = (g.rise + nearDrop - farDrop) / g.span;
  return tensionFromSight(g.span, g.rise, weight, { nearDrop, farDrop, slope });
}
