import { SpanInputError } from './errors';

/** Relative tolerance the solvers aim for on their unknown (H or C). */
export const ROOT_RELATIVE_TOLERANCE = 1e-13;
const MAX_ITERATIONS = 200;

export interface RootResult {
  root: number;
  iterations: number;
  /** f(root) at the returned point. */
  residual: number;
}

/**
 * Brent's method (inverse quadratic interpolation guarded by bisection) for f(x) = 0 on [lo, hi].
 * Refuses to start unless f changes sign over the bracket, so it can never return a non-root silently.
 * Converges when the bracket is narrower than relTol·|x| (absolute floor 1e-300) or f is exactly 0.
 * Source: R.P. Brent, "Algorithms for Minimization without Derivatives" (1973), ch. 4.
 */
export function findRoot(
  f: (x: number) => number,
  lo: number,
  hi: number,
  relTol: number = ROOT_RELATIVE_TOLERANCE,
): RootResult {
  let a = lo;
  let b = hi;
  let fa = f(a);
  let fb = f(b);
  if (!Number.isFinite(fa) || !Number.isFinite(fb) || fa * fb > 0) {
    throw new SpanInputError(
      'no-root',
      'The readings do not correspond to any wire shape (no solution in range).',
    );
  }
  if (fa === 0) return { root: a, iterations: 0, residual: 0 };
  if (fb === 0) return { root: b, iterations: 0, residual: 0 };
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 1; iteration <= MAX_ITERATIONS; iteration++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * relTol * Math.abs(b) + 1e-300;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return { root: b, iterations: iteration, residual: fb };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      // Interpolation step: secant when only two points, inverse quadratic otherwise.
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  throw new SpanInputError('no-root', 'The solver did not converge for these readings.');
}

/**
 * Grows a bracket geometrically from [lo, hi] (both > 0) until f changes sign, for unknowns such as C or H
 * whose scale is known only roughly. Throws 'no-root' when no sign change exists within maxDoublings.
 */
export function expandBracket(
  f: (x: number) => number,
  lo: number,
  hi: number,
  maxDoublings = 200,
): [number, number] {
  let flo = f(lo);
  let fhi = f(hi);
  for (let i = 0; i < maxDoublings && flo * fhi > 0; i++) {
    if (Math.abs(flo) < Math.abs(fhi)) {
      lo /= 2;
      flo = f(lo);
    } else {
      hi *= 2;
      fhi = f(hi);
    }
  }
  if (!(flo * fhi <= 0)) {
    throw new SpanInputError(
      'no-root',
      'The readings do not correspond to any wire shape (no solution in range).',
    );
  }
  return [lo, hi];
}
