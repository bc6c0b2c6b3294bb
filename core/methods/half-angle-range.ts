import { SpanInputError, type SpanInputErrorCode } from '../errors';
import type { RangeLimit } from './bracketed-newton';

/**
 * Search range of the half-angle k = S/(2C) shared by the back-solvers, in log k.
 * k = 1e-9 is a sag of 2.5e-10 spans (a quarter of a micrometre on a kilometre): anything flatter cannot be told
 * from a straight wire in double precision. k = 50 is a sag of about 1e19 spans: far past any real wire, and still
 * clear of overflow in sinh and cosh (which fails near 710).
 */
export const MIN_HALF_ANGLE = 1e-9;
export const MAX_HALF_ANGLE = 50;

/** Lower end of the search: the reading describes a wire flatter than MIN_HALF_ANGLE. */
export function flatLimit(code: SpanInputErrorCode, message: string): RangeLimit {
  return { at: Math.log(MIN_HALF_ANGLE), code, message };
}

/** Upper end of the search: the reading describes a wire slacker than MAX_HALF_ANGLE. */
export function slackLimit(code: SpanInputErrorCode, message: string): RangeLimit {
  return { at: Math.log(MAX_HALF_ANGLE), code, message };
}

/** Horizontal tension H = w·C = w·S/(2k), N, from the solved log half-angle. */
export function tensionFromLogHalfAngle(span: number, weight: number, logHalfAngle: number): number {
  return (weight * span) / (2 * Math.exp(logHalfAngle));
}

/** Throws `code` unless the value is a finite number. */
export function requireFinite(value: number, code: SpanInputErrorCode, message: string): void {
  if (!Number.isFinite(value)) throw new SpanInputError(code, message);
}

/** Log of a starting half-angle, kept inside the search range. */
export function startingLogHalfAngle(halfAngle: number): number {
  const k = Number.isFinite(halfAngle) ? halfAngle : MAX_HALF_ANGLE;
  return Math.log(Math.min(Math.max(k, MIN_HALF_ANGLE), MAX_HALF_ANGLE));
}
