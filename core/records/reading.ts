import { z } from 'zod';
import { finite, geoPositionSchema, isoTime, nonNegative, recordId } from './common';
import { measurementSchema } from './measurement';
import { recordMetaSchema } from './meta';

/**
 * One raw instrument shot at a point on the wire, SI (m, rad); the same fields and frame as core/instrument-shot's
 * StationShot, so a stored shot converts with shotToSpanPoint. The station is given per shot so that a crew can
 * move the instrument between shots.
 */
export const instrumentShotSchema = z.object({
  /** Station position along the span from the near attachment, m. */
  stationX: finite,
  /** Station's perpendicular distance from the span line, m, positive to the left looking near → far. */
  stationOffset: finite,
  /** Ground (or mark) elevation at the station, relative to the near attachment, m. */
  stationElevation: finite,
  /** Height of the instrument's axis above the station mark, m. */
  instrumentHeight: nonNegative,
  /** Slope distance from the instrument to the point, m. */
  slopeDistance: nonNegative,
  /** Vertical angle above horizontal, rad. */
  verticalAngle: finite,
  /** Horizontal angle from the span direction (near → far), rad, positive turning left (counter-clockwise). */
  horizontalAngle: finite,
});

export type InstrumentShot = z.infer<typeof instrumentShotSchema>;

/** A sag reading of one wire, stored raw (SI); results are derived by the solver, never stored here. */
export const readingRecordSchema = recordMetaSchema.extend({
  lineId: recordId,
  spanId: recordId,
  wireId: recordId,
  measurement: measurementSchema,
  /** Return-wave tap times from the tap timer, s from the strike (the strike itself first, at 0 or its time). */
  taps: z.array(finite).optional(),
  /** Raw instrument shots behind a surveyed-points measurement. */
  shots: z.array(instrumentShotSchema).optional(),
  /** Conductor temperature when read, °C. */
  conductorTemperature: finite,
  ambientTemperature: finite.optional(),
  /** When the reading was taken, ISO 8601. */
  takenAt: isoTime,
  location: geoPositionSchema.optional(),
  inspector: z.string(),
  notes: z.string().optional(),
  /** Per-reading overrides of the method's default uncertainties, by name (SI, one standard uncertainty). */
  uncertainty: z.record(z.string(), finite).optional(),
});

export type ReadingRecord = z.infer<typeof readingRecordSchema>;
