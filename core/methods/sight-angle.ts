import { checkGeometry, checkWeight } from '../catenary';
import { SpanInputError } from '../errors';
import type { Measurement, SpanGeometry } from '../types';
import { requireFinite } from './half-angle-range';
import { tensionFromSight } from './tangent-sight';

export type SightAngleReading = Extract<Measurement, { method: 'sight-angle' }>;

/**
 * Horizontal tension H, N, from an angle of sight: an instrument nearDrop a m below the near attachment reads the
 * vertical angle θ of the line of sight that just touches the wire.
 * @param g span S > 0 m, rise h m
 * @param weight w > 0, N/m
 * @param reading a > 0 m; θ in (−π/2, π/2) rad above horizontal, looking from the near support toward the far one
 * Method: the line through (0, −a) with slope tan θ passes b = a + h − S·tan θ below the far attachment; it can
 * touch the wire between the supports only if b > 0 (else it passes over or through the far attachment:
 * 'sight-line-misses-wire'). Then exact tangency as for two targets (tangent-sight.ts), with the slope taken
 * straight from tan θ. Parabola check: tan θ = (h + a − b)/S, D ≈ ((√a + √b)/2)².
 */
export function tensionFromSightAngle(g: SpanGeometry, weight: number, reading: SightAngleReading): number {
  checkGeometry(g);
  checkWeight(weight);
  const { nearDrop, angle } = reading;
  requireFinite(nearDrop, 'input-not-finite', 'The instrument drop must be a number.');
  requireFinite(angle, 'angle-not-finite', 'The vertical angle must be a number.');
  if (nearDrop < 0) {
    throw new SpanInputError(
      'drop-negative',
      'The instrument drop is measured down from the near attachment and cannot be negative.',
    );
  }
  if (Math.abs(angle) >= Math.PI / 2) {
    throw new SpanInputError(
      'angle-out-of-range',
      'The vertical angle must lie strictly between −90° and +90°.',
    );
  }
  const slope = Math.tan(angle);
  const farDrop = nearDrop + g.rise - g.span * slope;
  if (nearDrop === 0 || !(farDrop > 0)) {
    throw new SpanInputError(
      'sight-line-misses-wire',
      nearDrop === 0
        ? 'A sight from the near attachment itself cannot touch the wire between the supports.'
        : 'This sight line passes above the far attachment, so it cannot touch the wire between the supports.',
    );
  }
  return tensionFromSight(g.span, g.rise, weight, { nearDrop, farDrop, slope });
}
