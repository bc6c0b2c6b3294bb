import { SpanInputError } from './errors';

/**
 * One shot from a rangefinder or total station at a point on the wire, with the station located relative to the
 * span. Frame: x along the span's horizontal line from the near attachment toward the far one; "left" is to the
 * left of that direction seen from above; elevations relative to the near attachment. SI units (m, rad).
 * Same fields as the stored InstrumentShot record (core/records/reading.ts), so a stored shot passes straight in.
 */
export interface StationShot {
  /** Station position along the span line, m from the near attachment (may be negative or beyond the span). */
  stationX: number;
  /** Station's perpendicular distance from the span line, m, positive to the left. */
  stationOffset: number;
  /** Ground (or mark) elevation at the station relative to the near attachment, m. */
  stationElevation: number;
  /** Height of the instrument's axis above the station mark, m (≥ 0). */
  instrumentHeight: number;
  /** Slope distance from the instrument to the target, m (> 0). */
  slopeDistance: number;
  /** Vertical angle above horizontal, rad, in [−π/2, π/2]. */
  verticalAngle: number;
  /** Horizontal angle from the span direction (near → far), rad, positive turning left (counter-clockwise from above). */
  horizontalAngle: number;
}

/** The shot reduced to the span's vertical plane. */
export interface ShotPoint {
  /** Along the span from the near attachment, m. */
  x: number;
  /** Elevation relative to the near attachment, m. */
  z: number;
  /** Perpendicular distance of the shot point from the span's vertical plane, m, positive to the left. A point
   * far off the plane was probably not on this wire (or the horizontal angle is wrong): worth a warning. */
  offset: number;
}

/**
 * Converts an instrument shot to a point (x, z) in the span's vertical plane.
 * horizontal distance hd = slope·cos(vertical); z = stationElevation + instrumentHeight + slope·sin(vertical);
 * x = stationX + hd·cos(horizontal); offset = stationOffset + hd·sin(horizontal).
 * Plain trigonometry (any surveying text). Earth curvature and refraction are neglected: about 0.0675·K² m for a
 * sight of K km, so 6 mm at 300 m, well under a sag reading's other errors.
 * Errors: 'input-not-finite', 'distance-not-positive' (slope distance ≤ 0), 'angle-out-of-range' (|vertical| > π/2).
 */
export function shotToSpanPoint(shot: StationShot): ShotPoint {
  const values = [
    shot.stationX,
    shot.stationOffset,
    shot.stationElevation,
    shot.instrumentHeight,
    shot.slopeDistance,
    shot.verticalAngle,
    shot.horizontalAngle,
  ];
  for (const value of values) {
    if (!Number.isFinite(value))
      throw new SpanInputError('input-not-finite', 'Every value of the shot must be a number.');
  }
  if (shot.slopeDistance <= 0) {
    throw new SpanInputError('distance-not-positive', 'The measured distance must be greater than zero.');
  }
  if (Math.abs(shot.verticalAngle) > Math.PI / 2) {
    throw new SpanInputError('angle-out-of-range', 'The vertical angle must lie between −90° and +90°.');
  }
  const horizontalDistance = shot.slopeDistance * Math.cos(shot.verticalAngle);
  return {
    x: shot.stationX + horizontalDistance * Math.cos(shot.horizontalAngle),
    z: shot.stationElevation + shot.instrumentHeight + shot.slopeDistance * Math.sin(shot.verticalAngle),
    offset: shot.stationOffset + horizontalDistance * Math.sin(shot.horizontalAngle),
  };
}
