import { checkGeometry } from '../catenary';
import { SpanInputError } from '../errors';
import type { Measurement, SpanGeometry } from '../types';
import { requireFinite } from './half-angle-range';
import { tensionFromSagAt } from './midspan-sag';

export type OffsetSagReading = Extract<Measurement, { method: 'offset-sag' }>;

/**
 * Horizontal tension H, N, of the exact catenary whose sag below the chord at horizontal distance x from the
 * near attachment equals the reading (a sag taken over a road or river rather than at midspan).
 * @param g span S > 0 m, rise h m
 * @param weight w > 0, N/m
 * @param reading x in (0, S) m and sag d > 0 m (vertical, chord to wire)
 * Method: as midspan-sag, solving d(x) = sag for log k; parabola start d ≈ 4·D·(x/S)·(1 − x/S).
 */
export function tensionFromOffsetSag(g: SpanGeometry, weight: number, reading: OffsetSagReading): number {
  checkGeometry(g);
  requireFinite(reading.x, 'input-not-finite', 'The distance along the span must be a number.');
  if (reading.x <= 0 || reading.x >= g.span) {
    throw new SpanInputError(
      'offset-outside-span',
      'The sag must be taken between the two supports (distance greater than zero and less than the span).',
    );
  }
  return tensionFromSagAt(g, weight, reading.x / g.span, reading.sag);
}
