import { SpanInputError, type SpanInputErrorCode } from '../errors';
import { findRoot } from '../roots';
import type { ValueAndSlope } from './scaled-span';

/**
 * Width in the unknown (log k, so a relative width in k, C and H) across which a sign change certifies the
 * root: ten times tighter than the 1e-9 the solvers promise on H. (The value returned is a Newton step from inside
 * that bracket, so it is in practice good to ~1e-14.)
 */
export const CERTIFIED_WIDTH = 1e-10;
/**
 * Newton is taken as converged when its step is below this (relative in k); the probe then goes PROBE_DISTANCE
 * past the estimate, so the certifying bracket is at most STEP_TOLERANCE + PROBE_DISTANCE < CERTIFIED_WIDTH wide.
 */
const STEP_TOLERANCE = 0.5 * CERTIFIED_WIDTH;
const PROBE_DISTANCE = 0.4 * CERTIFIED_WIDTH;
/** Largest Newton step in log k, a factor e in k: keeps a poor first guess from jumping out of range. */
const MAX_STEP = 1;
/** Newton/bisection steps before handing the bracket to Brent (never reached in the round-trip tests). */
const MAX_NEWTON_STEPS = 60;

/** What to say when the root lies beyond one end of the search range. */
export interface RangeLimit {
  at: number;
  code: SpanInputErrorCode;
  message: string;
}

/**
 * Root of an increasing function f(y) by Newton's method inside a bracket that it builds and checks.
 * @param f returns f(y) and f′(y); must increase through the root (all back-solvers here do, in y = log k)
 * @param guess starting point (from the parabola)
 * @param below the lower end of the search range and the error raised when f(below.at) > 0 (root under it)
 * @param above the upper end of the search range and the error raised when f(above.at) < 0 (root over it)
 * Method: Newton steps limited to MAX_STEP; every evaluation narrows the bracket [lo, hi] with f(lo) < 0 < f(hi);
 * a step leaving the bracket is replaced by bisection. When Newton's step falls below STEP_TOLERANCE the answer is
 * certified by evaluating just past it on the side not yet bracketed, so a root is only returned with a sign
 * change of f across an interval narrower than CERTIFIED_WIDTH. After MAX_NEWTON_STEPS the bracket goes to
 * Brent's method (findRoot). Non-finite f raises 'no-root'.
 */
export function solveIncreasing(
  f: (y: number) => ValueAndSlope,
  guess: number,
  below: RangeLimit,
  above: RangeLimit,
): number {
  let lo = below.at;
  let hi = above.at;
  let haveLo = false;
  let haveHi = false;
  let y = Math.min(Math.max(guess, lo), hi);
  for (let step = 0; step < MAX_NEWTON_STEPS; step++) {
    const { value, slope } = f(y);
    if (!Number.isFinite(value)) {
      throw new SpanInputError('no-root', 'The readings led the solver outside the range it can compute.');
    }
    if (value === 0) return y;
    if (value < 0) {
      lo = y;
      haveLo = true;
    } else {
      hi = y;
      haveHi = true;
    }
    const bracketed = haveLo && haveHi;
    if (bracketed && hi - lo <= CERTIFIED_WIDTH) return newtonPointOrMiddle(y, value, slope, lo, hi);
    let newton = -value / slope;
    if (!Number.isFinite(newton) || slope <= 0) newton = value < 0 ? MAX_STEP : -MAX_STEP;
    newton = Math.max(-MAX_STEP, Math.min(MAX_STEP, newton));
    let next = y + newton;
    if (Math.abs(next - y) <= STEP_TOLERANCE) {
      // Converged by Newton's measure: probe just past the estimate on the side not yet seen, so the loop
      // ends on a checked sign change (the bracket test above) rather than on the step size alone.
      next = value < 0 ? Math.min(next + PROBE_DISTANCE, hi) : Math.max(next - PROBE_DISTANCE, lo);
    } else if (next <= lo || next >= hi) {
      if (bracketed) next = 0.5 * (lo + hi);
      else if (value < 0) {
        if (y >= above.at) throw new SpanInputError(above.code, above.message);
        next = above.at;
      } else {
        if (y <= below.at) throw new SpanInputError(below.code, below.message);
        next = below.at;
      }
    }
    y = next;
  }
  if (haveLo && haveHi) return findRoot((x) => f(x).value, lo, hi).root;
  throw new SpanInputError('no-root', 'The solver did not converge for these readings.');
}

/**
 * One last Newton step from y, kept inside the certified bracket (it can fall a rounding error outside when the
 * root sits on a bracket end), or the bracket's middle if the step is not a number.
 */
function newtonPointOrMiddle(y: number, value: number, slope: number, lo: number, hi: number): number {
  const next = y - value / slope;
  return Number.isFinite(next) ? Math.min(Math.max(next, lo), hi) : 0.5 * (lo + hi);
}
