import { checkGeometry, checkWeight } from '../catenary';
import { SpanInputError } from '../errors';
import type { Measurement, SpanGeometry } from '../types';

export type SurveyedPointsReading = Extract<Measurement, { method: 'surveyed-points' }>;

/** A catenary z = z_m + C·(cosh((x − x_m)/C) − 1) fitted to surveyed points, and how well it fits. */
export interface CatenaryFit {
  /** C = H/w, m. */
  catenaryParameter: number;
  /** x of the fitted curve's lowest point, m (same frame as the points; may lie outside them). */
  lowPointX: number;
  /** z of the fitted curve's lowest point, m. */
  lowPointZ: number;
  /** RMS of the vertical residuals, m. */
  fitResidual: number;
  iterations: number;
}

/** The fit plus the tension it implies for a given weight. */
export interface SurveyedPointsFit extends CatenaryFit {
  /** H = w·C, N. */
  horizontalTension: number;
}

/** Relative step in the fitted parameters below which the fit has converged. */
const FIT_STEP_TOLERANCE = 1e-13;
/**
 * Residuals this close to rounding (per point, relative to the largest scaled coordinate) count as an exact fit:
 * further steps would only chase rounding noise. 16 ulps of headroom for the model's few operations.
 */
const ROUNDING_RESIDUAL = 16 * Number.EPSILON;
/** An accepted step that lowers the cost by less than this fraction, with a step under STALL_STEP, is a stall. */
const STALL_COST = 1e-12;
const STALL_STEP = 1e-9;
/** Levenberg–Marquardt damping after the first rejected step; below it, damping drops back to pure Gauss–Newton. */
const FIRST_DAMPING = 1e-6;
/** Damping beyond which no step lowers the cost: a minimum to rounding, so the fit stops there. */
const MAX_DAMPING = 1e16;
const MAX_FIT_STEPS = 200;
/** Scaled second-order coefficient (z/L against x/L) below which the points show no sag at all. */
const NO_SAG_CURVATURE = 1e-12;

/**
 * Least-squares catenary through three or more surveyed points (vertical residuals), all three shape
 * parameters free: C, x_m and the vertical offset. The fitted curve need not pass through the attachments.
 * @param points x m (horizontal, from the near attachment) and z m (elevation, relative to the near attachment);
 *   at least 3 points at 3 distinct x
 * Method: coordinates are centred on the mean x and scaled by the half-width L of the points. The curve is
 * written about the centre x_c as z = z_c + C·(cosh u_c·(cosh v − 1) + sinh u_c·sinh v), v = (x − x_c)/C, with
 * unknowns q = L/C (curvature) and u_c (slope angle at x_c, sinh u_c = dz/dx), which stays well conditioned from
 * taut to slack and with the lowest point far outside the points. The offset z_c enters linearly and is
 * eliminated (residuals are centred). Levenberg–Marquardt (Marquardt's diagonal scaling) with the analytic
 * Jacobian, started from a least-squares parabola (slope and curvature at x_c); converged when a step is below
 * 1e-13 relative, the residuals are down to rounding, or a step no longer lowers the cost. Source: K. Levenberg (1944), D.W. Marquardt (1963); the elimination of linear parameters as in
 * Golub & Pereyra's variable projection (1973).
 * Errors: 'points-too-few', 'points-not-finite', 'points-degenerate' (fewer than 3 distinct x, or the points
 * show no sag), 'fit-failed' (no convergence).
 */
export function fitCatenaryToPoints(points: readonly { x: number; z: number }[]): CatenaryFit {
  const n = points.length;
  if (n < 3) throw new SpanInputError('points-too-few', 'Survey at least three points on the wire.');
  for (const point of points) {
    if (!Number.isFinite(point.x) || !Number.isFinite(point.z)) {
      throw new SpanInputError(
        'points-not-finite',
        'Every surveyed point needs a numeric position and height.',
      );
    }
  }
  let meanX = 0;
  let meanZ = 0;
  for (const point of points) {
    meanX += point.x / n;
    meanZ += point.z / n;
  }
  let halfWidth = 0;
  for (const point of points) halfWidth = Math.max(halfWidth, Math.abs(point.x - meanX));
  if (!(halfWidth > 0) || distinctCount(points) < 3) {
    throw new SpanInputError(
      'points-degenerate',
      'The points must be spread along the span (three different distances).',
    );
  }
  const xs = new Float64Array(n);
  const zs = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    xs[i] = (points[i]!.x - meanX) / halfWidth;
    zs[i] = (points[i]!.z - meanZ) / halfWidth;
  }
  const scratch = {
    residuals: new Float64Array(n),
    slopesQ: new Float64Array(n),
    slopesU: new Float64Array(n),
  };
  const start = parabolaStart(xs, zs);
  let q = start.curvature;
  let u = start.slopeAngle;
  let model = evaluate(xs, zs, q, u, scratch);
  let largest = 0;
  for (let i = 0; i < n; i++) largest = Math.max(largest, Math.abs(xs[i]!), Math.abs(zs[i]!));
  const roundingCost = n * (ROUNDING_RESIDUAL * largest) ** 2;
  let damping = 0;
  for (let iteration = 1; iteration <= MAX_FIT_STEPS; iteration++) {
    const { jqq, jqu, juu, gq, gu } = model;
    const aqq = jqq * (1 + damping);
    const auu = juu * (1 + damping);
    const det = aqq * auu - jqu * jqu;
    const dq = (-gq * auu + gu * jqu) / det;
    const du = (-gu * aqq + gq * jqu) / det;
    const small =
      Math.abs(dq) <= FIT_STEP_TOLERANCE * Math.abs(q) &&
      Math.abs(du) <= FIT_STEP_TOLERANCE * (1 + Math.abs(u));
    const trial =
      q + dq > 0 && Number.isFinite(dq) && Number.isFinite(du)
        ? evaluate(xs, zs, q + dq, u + du, scratch)
        : null;
    let done = small;
    if (trial && trial.cost <= model.cost) {
      const stalled =
        trial.cost >= model.cost * (1 - STALL_COST) &&
        Math.abs(dq) <= STALL_STEP * Math.abs(q) &&
        Math.abs(du) <= STALL_STEP * (1 + Math.abs(u));
      q += dq;
      u += du;
      model = trial;
      damping = damping < FIRST_DAMPING ? 0 : damping / 10;
      done ||= stalled || model.cost <= roundingCost;
    } else {
      damping = damping === 0 ? FIRST_DAMPING : damping * 10;
    }
    if (done || damping > MAX_DAMPING) return result(q, u, model, meanX, meanZ, halfWidth, n, iteration);
  }
  throw new SpanInputError(
    'fit-failed',
    'No catenary could be fitted to these points; check them for blunders.',
  );
}

/**
 * Horizontal tension H, N, from surveyed points on the wire: H = w·C with C from fitCatenaryToPoints.
 * @param g span S > 0 m, rise h m (checked; the points themselves fix the shape)
 * @param weight w > 0, N/m
 */
export function tensionFromSurveyedPoints(
  g: SpanGeometry,
  weight: number,
  reading: SurveyedPointsReading,
): SurveyedPointsFit {
  checkGeometry(g);
  checkWeight(weight);
  const fit = fitCatenaryToPoints(reading.points);
  return { ...fit, horizontalTension: weight * fit.catenaryParameter };
}

interface ModelState {
  cost: number;
  /** Normal matrix JᵀJ (centred columns) and gradient Jᵀr. */
  jqq: number;
  jqu: number;
  juu: number;
  gq: number;
  gu: number;
  /** Mean of (model without offset − z): the eliminated offset. */
  offset: number;
}

/** Scratch arrays reused by every evaluation of one fit (the centring needs two passes). */
interface Scratch {
  residuals: Float64Array;
  slopesQ: Float64Array;
  slopesU: Float64Array;
}

/** Residuals, cost and normal equations at (q, u) in scaled coordinates. */
function evaluate(xs: Float64Array, zs: Float64Array, q: number, u: number, scratch: Scratch): ModelState {
  const n = xs.length;
  const { residuals, slopesQ, slopesU } = scratch;
  const cu = Math.cosh(u);
  const su = Math.sinh(u);
  let meanRes = 0;
  let meanQ = 0;
  let meanU = 0;
  for (let i = 0; i < n; i++) {
    const v = xs[i]!;
    // sinh(qv) and cosh(qv) − 1 from one expm1, without cancellation for small qv.
    const e = Math.expm1(q * v);
    const ratio = e / (1 + e);
    const sinhV = 0.5 * (e + ratio);
    const coshMinusOne = 0.5 * e * ratio;
    // A = (cosh qv − 1)/q, B = sinh(qv)/q; model z = z_c + cosh u·A + sinh u·B.
    const a = coshMinusOne / q;
    const b = sinhV / q;
    const aSlope = (v * sinhV - a) / q;
    const bSlope = (v * (1 + coshMinusOne) - b) / q;
    const res = cu * a + su * b - zs[i]!;
    const slopeQ = cu * aSlope + su * bSlope;
    const slopeU = su * a + cu * b;
    residuals[i] = res;
    slopesQ[i] = slopeQ;
    slopesU[i] = slopeU;
    meanRes += res;
    meanQ += slopeQ;
    meanU += slopeU;
  }
  meanRes /= n;
  meanQ /= n;
  meanU /= n;
  let cost = 0;
  let jqq = 0;
  let jqu = 0;
  let juu = 0;
  let gq = 0;
  let gu = 0;
  for (let i = 0; i < n; i++) {
    const r = residuals[i]! - meanRes;
    const jq = slopesQ[i]! - meanQ;
    const ju = slopesU[i]! - meanU;
    cost += r * r;
    jqq += jq * jq;
    jqu += jq * ju;
    juu += ju * ju;
    gq += jq * r;
    gu += ju * r;
  }
  return { cost, jqq, jqu, juu, gq, gu, offset: meanRes };
}

/** Slope angle and curvature q = L/C at the centre from the least-squares parabola z ≈ c0 + c1·x + c2·x². */
function parabolaStart(xs: Float64Array, zs: Float64Array): { curvature: number; slopeAngle: number } {
  // Normal equations of the centred quadratic (Σx = 0 by construction); Cramer's rule on the 3×3 system.
  let s2 = 0;
  let s3 = 0;
  let s4 = 0;
  let t0 = 0;
  let t1 = 0;
  let t2 = 0;
  const n = xs.length;
  for (let i = 0; i < n; i++) {
    const x = xs[i]!;
    const z = zs[i]!;
    const x2 = x * x;
    s2 += x2;
    s3 += x2 * x;
    s4 += x2 * x2;
    t0 += z;
    t1 += z * x;
    t2 += z * x2;
  }
  // | n  0  s2 | |c0|   |t0|
  // | 0  s2 s3 | |c1| = |t1|
  // | s2 s3 s4 | |c2|   |t2|
  const det = n * (s2 * s4 - s3 * s3) - s2 * s2 * s2;
  const c1 = (n * (t1 * s4 - s3 * t2) + s2 * (s3 * t0 - s2 * t1)) / det;
  const c2 = (n * (s2 * t2 - s3 * t1) - s2 * s2 * t0) / det;
  if (!Number.isFinite(c2) || c2 <= NO_SAG_CURVATURE * (1 + Math.abs(c1))) {
    throw new SpanInputError(
      'points-degenerate',
      'The points lie on a straight line or bulge upward: they show no sag.',
    );
  }
  const slopeAngle = Math.asinh(c1);
  return { curvature: (2 * c2) / Math.cosh(slopeAngle), slopeAngle };
}

function result(
  q: number,
  u: number,
  model: ModelState,
  meanX: number,
  meanZ: number,
  halfWidth: number,
  n: number,
  iterations: number,
): CatenaryFit {
  const c = halfWidth / q;
  // Model z at the centre is z_c = −offset (scaled); the lowest point is C·u back along x and 2C·sinh²(u/2) down.
  const centreZ = meanZ - model.offset * halfWidth;
  const halfU = Math.sinh(u / 2);
  return {
    catenaryParameter: c,
    lowPointX: meanX - c * u,
    lowPointZ: centreZ - 2 * c * halfU * halfU,
    fitResidual: halfWidth * Math.sqrt(model.cost / n),
    iterations,
  };
}

/** Number of different x among the points. */
function distinctCount(points: readonly { x: number }[]): number {
  const sorted = Float64Array.from(points, (point) => point.x).sort();
  let count = sorted.length > 0 ? 1 : 0;
  for (let i = 1; i < sorted.length; i++) if (sorted[i] !== sorted[i - 1]) count++;
  return count;
}
