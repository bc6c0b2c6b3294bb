// Field readings read off a known exact catenary (the forward model of core/catenary.ts), for round trips.
import { spanAtTension, wireElevation } from '../../../core/catenary';
import type { Measurement, SpanGeometry } from '../../../core/types';

export interface KnownSpan {
  geometry: SpanGeometry;
  weight: number;
  horizontalTension: number;
}

/** Positions along the span as fractions of S, each in (0, 1). */
export interface ReadingPositions {
  offset: number;
  touch: number;
  /** Five fractions for the surveyed points. */
  points: number[];
}

/** The tangent line to the wire at x: its drops below both attachments and its slope. */
export function tangentAt(known: KnownSpan, x: number): { nearDrop: number; farDrop: number; slope: number } {
  const { span, rise } = known.geometry;
  const c = known.horizontalTension / known.weight;
  const lowX = spanAtTension(known.geometry, known.weight, known.horizontalTension).lowPointX;
  const slope = Math.sinh((x - lowX) / c);
  const z = wireElevation(x, c, lowX);
  return { nearDrop: slope * x - z, farDrop: rise - z - slope * (span - x), slope };
}

/** One reading per method, all read off the same exact curve. */
export function readingsFromCurve(known: KnownSpan, at: ReadingPositions): Measurement[] {
  const { span, rise } = known.geometry;
  const forward = spanAtTension(known.geometry, known.weight, known.horizontalTension);
  const c = known.horizontalTension / known.weight;
  const lowX = forward.lowPointX;
  const offsetX = at.offset * span;
  const tangent = tangentAt(known, at.touch * span);
  return [
    { method: 'midspan-sag', sag: forward.midspanSag },
    { method: 'offset-sag', x: offsetX, sag: (rise * offsetX) / span - wireElevation(offsetX, c, lowX) },
    { method: 'sight-line', nearDrop: tangent.nearDrop, farDrop: tangent.farDrop },
    { method: 'sight-angle', nearDrop: tangent.nearDrop, angle: Math.atan(tangent.slope) },
    { method: 'return-wave', returns: 3, seconds: 3 * forward.returnTime },
    {
      method: 'surveyed-points',
      points: at.points.map((fraction) => ({
        x: fraction * span,
        z: wireElevation(fraction * span, c, lowX),
      })),
    },
  ];
}
