// One GPS fix through the Geolocation API, with the reasons it can fail said in plain words.
import type { GeoPosition } from '../../core/records/common';

export type GpsResult = { ok: true; position: GeoPosition } | { ok: false; message: string };

/** Longest wait for a fix, ms: long enough for a cold GPS start outdoors. */
const GPS_TIMEOUT_MS = 30_000;

export function capturePosition(): Promise<GpsResult> {
  if (typeof navigator === 'undefined' || !('geolocation' in navigator)) {
    return Promise.resolve({
      ok: false,
      message: 'This browser has no location service. Enter the position later.',
    });
  }
  return new Promise((resolve) => {
    navigator.geolocation.getCurrentPosition(
      (fix) =>
        resolve({
          ok: true,
          position: {
            latitude: fix.coords.latitude,
            longitude: fix.coords.longitude,
            accuracy: fix.coords.accuracy,
          },
        }),
      (error) => {
        const messages: Record<number, string> = {
          1: 'Location permission was refused. Allow location for this site in the browser settings to capture it.',
          2: 'No position available here (no GPS fix). Try again in the open, or skip it.',
          3: 'The GPS took too long to answer. Try again in the open, or skip it.',
        };
        resolve({ ok: false, message: messages[error.code] ?? `Location failed: ${error.message}` });
      },
      { enableHighAccuracy: true, timeout: GPS_TIMEOUT_MS, maximumAge: 60_000 },
    );
  });
}

/** Draft text fields for a position (lat, lon, accuracy) under a prefix, e.g. 'near' → nearLat… */
export function positionToDraft(prefix: string, position: GeoPosition | undefined): Record<string, string> {
  return {
    [`${prefix}Lat`]: position ? String(position.latitude) : '',
    [`${prefix}Lon`]: position ? String(position.longitude) : '',
    [`${prefix}Acc`]: position?.accuracy !== undefined ? String(position.accuracy) : '',
  };
}

/** The position kept in draft fields by positionToDraft, or undefined when none (or unreadable). */
export function positionFromDraft(prefix: string, values: Record<string, string>): GeoPosition | undefined {
  const latitude = Number(values[`${prefix}Lat`] ?? '');
  const longitude = Number(values[`${prefix}Lon`] ?? '');
  if ((values[`${prefix}Lat`] ?? '') === '' || !Number.isFinite(latitude) || !Number.isFinite(longitude))
    return undefined;
  const accuracy = Number(values[`${prefix}Acc`] ?? '');
  return {
    latitude,
    longitude,
    ...((values[`${prefix}Acc`] ?? '') !== '' && Number.isFinite(accuracy) ? { accuracy } : {}),
  };
}

export function describePosition(position: GeoPosition): string {
  const accuracy = position.accuracy !== undefined ? ` (±${Math.round(position.accuracy)} m)` : '';
  return `${position.latitude.toFixed(6)}, ${position.longitude.toFixed(6)}${accuracy}`;
}
