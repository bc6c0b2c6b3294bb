import { STANDARD_GRAVITY, checkGeometry, checkWeight } from '../catenary';
import { SpanInputError } from '../errors';
import type { Measurement, SpanGeometry } from '../types';
import { solveIncreasing } from './bracketed-newton';
import {
  flatLimit,
  requireFinite,
  slackLimit,
  startingLogHalfAngle,
  tensionFromLogHalfAngle,
} from './half-angle-range';
import { midspanAngle, scaledSpan } from './scaled-span';
import { halfAngleFromReturnTime } from './starting-guess';

export type ReturnWaveReading = Extract<Measurement, { method: 'return-wave' }>;

/** 10-point Gauss–Legendre nodes (positive half) and weights on [−1, 1] (Abramowitz & Stegun, Table 25.4). */
const NODES = [
  0.1488743389816312, 0.4333953941292472, 0.6794095682990244, 0.8650633666889845, 0.9739065285171717,
];
const WEIGHTS = [
  0.2955242247147529, 0.2692667193099963, 0.219086362515982, 0.1494513491505806, 0.0666713443086881,
];
/**
 * Widest panel in u. √cosh u is analytic in the strip |Im u| < π/2, so on a panel of half-width ≤ 1/2 the
 * Bernstein ellipse parameter is ρ ≥ π + √(π² + 1) ≈ 6.44 and the 10-point rule's error is of order ρ^−20 ≈ 1e-16
 * relative (Trefethen, "Approximation Theory and Approximation Practice", ch. 19).
 */
const PANEL_WIDTH = 1;

/** √cosh u, through one exp. */
function rootCosh(u: number): number {
  const e = Math.exp(u);
  return Math.sqrt(0.5 * (e + 1 / e));
}

/** ∫ √cosh u du over [from, to] by composite 10-point Gauss–Legendre on panels no wider than PANEL_WIDTH. */
function travelIntegral(from: number, to: number): number {
  const panels = Math.max(1, Math.ceil((to - from) / PANEL_WIDTH));
  const width = (to - from) / panels;
  const half = width / 2;
  let total = 0;
  for (let panel = 0; panel < panels; panel++) {
    const mid = from + (panel + 0.5) * width;
    for (let i = 0; i < NODES.length; i++) {
      const offset = half * NODES[i]!;
      total += WEIGHTS[i]! * (rootCosh(mid - offset) + rootCosh(mid + offset));
    }
  }
  return total * half;
}

/**
 * Horizontal tension H, N, from a return-wave timing: the wire is struck near a support and `returns` N ≥ 1
 * returns of the wave take `seconds` T > 0, so one return (there and back) takes t₁ = T/N.
 * @param g span S > 0 m, rise h m
 * @param weight w > 0, N/m (mass per length μ = w/g with g = STANDARD_GRAVITY)
 * @param reading N ≥ 1 (need not be whole: a timing may stop on a half return), T > 0 s
 * Method: exact time of flight at wave speed √(T(x)/μ) along the arc (as returnTimeAt):
 *   t₁ = 2·√(C/g)·I,  I = ∫ √cosh u du over [β − k, β + k]   (C = S/2k, u = (x − x_m)/C),
 * so g·t₁²/S = 2·I²/k, solved for log k by bracket-checked Newton with dI/dk = √cosh(β+k)·(1 + β′) +
 * √cosh(β−k)·(1 − β′). The integral is composite 10-point Gauss–Legendre (error bound at PANEL_WIDTH).
 * Start: the small-sag rule D ≈ g·t₁²/32 (RUS Bulletin 1726C-115 eq. 1), i.e. k ≈ g·t₁²/(8S·√(1 + (h/S)²)),
 * refined by the series of starting-guess.ts.
 */
export function tensionFromReturnWave(g: SpanGeometry, weight: number, reading: ReturnWaveReading): number {
  checkGeometry(g);
  checkWeight(weight);
  const { returns, seconds } = reading;
  requireFinite(returns, 'input-not-finite', 'The number of returns must be a number.');
  requireFinite(
    seconds,
    'time-not-positive',
    'The timed duration must be a number of seconds greater than zero.',
  );
  if (returns < 1) throw new SpanInputError('returns-too-few', 'Time at least one full return of the wave.');
  if (seconds <= 0)
    throw new SpanInputError('time-not-positive', 'The timed duration must be greater than zero.');
  const oneReturn = seconds / returns;
  const r = g.rise / g.span;
  const target = Math.log((STANDARD_GRAVITY * oneReturn * oneReturn) / g.span);
  const guess = halfAngleFromReturnTime((STANDARD_GRAVITY * oneReturn * oneReturn) / g.span, r);
  // The residual is passed inline (an unnamed function), which keeps transpilers from wrapping it per call.
  const logHalfAngle = solveIncreasing(
    (y: number) => {
      const k = Math.exp(y);
      const state = scaledSpan(r, k);
      const beta = midspanAngle(state);
      const travel = travelIntegral(beta - k, beta + k);
      const betaSlope = state.midspanAngleSlope;
      const travelSlope = rootCosh(beta + k) * (1 + betaSlope) + rootCosh(beta - k) * (1 - betaSlope);
      // F(y) = ln(2·I²/k) − ln(g·t₁²/S); dF/dy = 2k·I′/I − 1.
      return {
        value: Math.log((2 * travel * travel) / k) - target,
        slope: (2 * k * travelSlope) / travel - 1,
      };
    },
    startingLogHalfAngle(guess),
    flatLimit('time-not-positive', 'The return time is too short for any wire on this span.'),
    slackLimit(
      'sag-too-large',
      'The return time implies a sag far larger than any wire on this span could hang.',
    ),
  );
  return tensionFromLogHalfAngle(g.span, weight, logHalfAngle);
}
