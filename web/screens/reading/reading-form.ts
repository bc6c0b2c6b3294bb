// Reading form: typed text → core Measurement and reading fields, with a message per field. No physics here.
import type { GeoPosition } from '../../../core/records/common';
import type { InstrumentShot } from '../../../core/records/reading';
import type { Measurement, MethodId } from '../../../core/types';
import type { UnitSystem } from '../../../core/units';
import type { DraftValues } from '../../app/drafts';
import { positionFromDraft } from '../../app/geolocation';
import { readField } from '../../app/read-field';
import { isMethodId } from './methods';
import { pointsFromShotsText, type ShotsRead } from './shots-glue';

export interface ReadingFormRead {
  method: MethodId | undefined;
  measurement: Measurement | undefined;
  /** Field name → message (null when fine). */
  errors: Record<string, string | null>;
  conductorTemperature: number | undefined;
  ambientTemperature: number | undefined;
  taps: number[] | undefined;
  shots: InstrumentShot[] | undefined;
  location: GeoPosition | undefined;
  complete: boolean;
}

/** Tap times kept in the draft as "0,2.61,5.20" (seconds from the strike). */
export function tapsFromText(text: string | undefined): number[] | undefined {
  if (text === undefined || text.trim() === '') return undefined;
  const taps = text.split(',').map(Number);
  return taps.every(Number.isFinite) ? taps : undefined;
}

export function tapsToText(taps: readonly number[]): string {
  return taps.map((tap) => String(tap)).join(',');
}

export function readReadingForm(values: DraftValues, units: UnitSystem, submitted: boolean): ReadingFormRead {
  const need = { required: submitted };
  const errors: Record<string, string | null> = {};
  const method = isMethodId(values.method) ? values.method : undefined;
  let measurement: Measurement | undefined;
  let shots: ShotsRead | undefined;

  const length = (name: string, rules = {}) => {
    const read = readField(values[name], 'length', units, { ...need, ...rules });
    errors[name] = read.error;
    return read.value;
  };

  switch (method) {
    case 'midspan-sag': {
      const sag = readField(values.sag, 'sag', units, { ...need, positive: true });
      errors.sag = sag.error;
      if (sag.value !== undefined) measurement = { method, sag: sag.value };
      break;
    }
    case 'offset-sag': {
      const x = length('x', { nonNegative: true });
      const sag = readField(values.sag, 'sag', units, { ...need, positive: true });
      errors.sag = sag.error;
      if (x !== undefined && sag.value !== undefined) measurement = { method, x, sag: sag.value };
      break;
    }
    case 'sight-line': {
      const nearDrop = length('nearDrop', { nonNegative: true });
      const farDrop = length('farDrop', { nonNegative: true });
      if (nearDrop !== undefined && farDrop !== undefined) measurement = { method, nearDrop, farDrop };
      break;
    }
    case 'sight-angle': {
      const nearDrop = length('nearDrop', { nonNegative: true });
      const angle = readField(values.angle, 'angle', units, {
        ...need,
        min: { value: -Math.PI / 2 + 1e-6, message: 'An angle must lie between −90° and 90°.' },
        max: { value: Math.PI / 2 - 1e-6, message: 'An angle must lie between −90° and 90°.' },
      });
      errors.angle = angle.error;
      if (nearDrop !== undefined && angle.value !== undefined)
        measurement = { method, nearDrop, angle: angle.value };
      break;
    }
    case 'return-wave': {
      const returns = readField(values.returns, 'percent', units, { ...need, positive: true, integer: true });
      const seconds = readField(values.seconds, 'time', units, { ...need, positive: true });
      errors.returns = returns.error;
      errors.seconds = seconds.error;
      if (returns.value !== undefined && seconds.value !== undefined) {
        measurement = { method, returns: returns.value, seconds: seconds.value };
      }
      break;
    }
    case 'surveyed-points': {
      shots = pointsFromShotsText(values.shots);
      errors.shots =
        shots.error ??
        (submitted && shots.points.length < 3 ? 'Shoot at least three points on the wire.' : null);
      if (shots.points.length >= 3 && shots.error === null) measurement = { method, points: shots.points };
      break;
    }
    case undefined:
      break;
  }

  const conductor = readField(values.conductorTemperature, 'temperature', units, need);
  const ambient = readField(values.ambientTemperature, 'temperature', units);
  errors.conductorTemperature = conductor.error;
  errors.ambientTemperature = ambient.error;
  const taps = method === 'return-wave' ? tapsFromText(values.taps) : undefined;
  const fieldsOk = Object.values(errors).every((error) => error === null);
  return {
    method,
    measurement,
    errors,
    conductorTemperature: conductor.value,
    ambientTemperature: ambient.value,
    taps,
    shots: shots?.shots,
    location: positionFromDraft('loc', values),
    complete: fieldsOk && measurement !== undefined && conductor.value !== undefined,
  };
}

/** Which field a solver refusal belongs beside (by SpanInputError code). */
export function fieldForSolverCode(code: string, method: MethodId | undefined): string | undefined {
  switch (code) {
    case 'sag-not-positive':
    case 'sag-too-large':
      return 'sag';
    case 'offset-outside-span':
      return 'x';
    case 'drop-negative':
    case 'sight-line-misses-wire':
      return method === 'sight-angle' ? 'angle' : 'farDrop';
    case 'angle-not-finite':
      return 'angle';
    case 'returns-too-few':
      return 'returns';
    case 'time-not-positive':
      return 'seconds';
    case 'points-too-few':
    case 'points-not-finite':
    case 'points-degenerate':
    case 'fit-failed':
      return 'shots';
    default:
      return undefined;
  }
}
