import { z } from 'zod';

/** A finite number (zod 4 numbers already reject NaN and ±Infinity; named here for readability). */
export const finite = z.number();
/** A finite number > 0. */
export const positive = z.number().positive();
/** A finite number ≥ 0. */
export const nonNegative = z.number().nonnegative();
/** Reference to another record by its UUID. */
export const recordId = z.uuid();
/** ISO 8601 date-time with Z or an offset. */
export const isoTime = z.iso.datetime({ offset: true });

/** A place on the earth (WGS 84 degrees), as given by the Geolocation API. */
export const geoPositionSchema = z.object({
  /** Degrees north, −90…90. */
  latitude: z.number().min(-90).max(90),
  /** Degrees east, −180…180. */
  longitude: z.number().min(-180).max(180),
  /** Horizontal accuracy radius, m (95 % in most browsers). */
  accuracy: nonNegative.optional(),
});

export type GeoPosition = z.infer<typeof geoPositionSchema>;
