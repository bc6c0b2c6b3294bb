/**
 * The catenary of a span written in dimensionless form, the common ground of every back-solver.
 *
 * With C = H/w the catenary parameter, the half-angle k = S/(2C) says how slack the span is (k ≈ 4·sag/span for
 * small sag) and β, the wire's slope angle parameter at midspan, says how inclined it is:
 *   sinh β = (h/S)·k / sinh k        (from y(S) = h; β = (S/2 − x_m)/C)
 * A point at the fraction f = x/S of the span has p = k·f, q = k·(1 − f), and its sag below the chord is
 *   d/S = (sinh p · sinh q / k) · (cosh β + sinh β · (χ(p) − χ(q)) / k),   χ(z) = z·coth z.
 * This is d(x) = h·x/S − C·(cosh((x − x_m)/C) − cosh(x_m/C)) rearranged so that no large terms cancel: the
 * chord term is gone, and for small k the bracket is 1 + O(k) instead of a difference of O(1) numbers.
 * Solving for k (then C = S/2k, H = w·C) keeps every back-solver well scaled from taut to very slack spans.
 */

/** Below this |z| the series forms of z·coth z − 1 and its derivative are used (truncation below 1e-17). */
const SERIES_LIMIT = 0.1;

/*
 * sinh z and cosh z for z ≥ 0 come from one expm1 call each, to full relative precision (no e^z − e^−z
 * cancellation for small z): with e = e^z − 1, sinh z = (e + e/(1 + e))/2 and cosh z − 1 = e²/(2(1 + e)).
 * Written out in place below because these functions are the solvers' inner loop.
 */

/** ψ(z) = z·coth z − 1 (≈ z²/3 for small z), given sinh z and cosh z. Series: Abramowitz & Stegun 4.5.67. */
function cothTermMinusOne(z: number, sinhZ: number, coshZ: number): number {
  if (z < SERIES_LIMIT) {
    const z2 = z * z;
    return z2 * (1 / 3 - z2 * (1 / 45 - z2 * (2 / 945 - z2 * (1 / 4725 - z2 * (2 / 93555)))));
  }
  return (z * coshZ) / sinhZ - 1;
}

/** χ′(z) = coth z − z/sinh² z (≈ 2z/3 for small z), given sinh z and cosh z. */
function cothTermSlope(z: number, sinhZ: number, coshZ: number): number {
  if (z < SERIES_LIMIT) {
    const z2 = z * z;
    return z * (2 / 3 - z2 * (4 / 45 - z2 * (12 / 945 - z2 * (8 / 4725 - z2 * (20 / 93555)))));
  }
  return (coshZ - z / sinhZ) / sinhZ;
}

/** The span's shape at one value of the half-angle k, with the derivative of β that the Newton steps need. */
export interface ScaledSpan {
  /** k = S/(2C), dimensionless, > 0. */
  halfAngle: number;
  /** h/S. */
  riseRatio: number;
  /** sinh β and cosh β, β = (S/2 − x_m)/C the slope angle parameter at midspan. */
  sinhMidspanAngle: number;
  coshMidspanAngle: number;
  /** dβ/dk = tanh β · (1/k − coth k). */
  midspanAngleSlope: number;
}

/**
 * Dimensionless state of a span (rise/span ratio r) at half-angle k = S/(2C) > 0.
 * sinh β = r·k/sinh k (exact for the catenary through both attachments).
 */
export function scaledSpan(riseRatio: number, halfAngle: number): ScaledSpan {
  const k = halfAngle;
  // sinh k and cosh k from one expm1 (identity above).
  const e = Math.expm1(k);
  const ratio = e / (1 + e);
  const sinhK = 0.5 * (e + ratio);
  const sinhBeta = (riseRatio * k) / sinhK;
  const coshBeta = Math.sqrt(1 + sinhBeta * sinhBeta);
  // 1/k − coth k = −ψ(k)/k, free of the cancellation of the direct form for small k.
  const inverseMinusCoth = -cothTermMinusOne(k, sinhK, 1 + 0.5 * e * ratio) / k;
  return {
    halfAngle: k,
    riseRatio,
    sinhMidspanAngle: sinhBeta,
    coshMidspanAngle: coshBeta,
    midspanAngleSlope: (sinhBeta / coshBeta) * inverseMinusCoth,
  };
}

/** β itself (asinh of sinh β), needed where positions are found from slopes. */
export function midspanAngle(state: ScaledSpan): number {
  return Math.asinh(state.sinhMidspanAngle);
}

/** A dimensionless quantity and its derivative with respect to k at fixed position. */
export interface ValueAndSlope {
  value: number;
  slope: number;
}

/**
 * Sag below the chord as a fraction of the span, d/S, at the span fraction f = x/S in (0, 1), and its
 * derivative with respect to k at fixed f. Formula in the file comment; exact, no parabolic step.
 */
export function sagRatioAt(state: ScaledSpan, fraction: number): ValueAndSlope {
  const k = state.halfAngle;
  const f = fraction;
  const p = k * f;
  const q = k * (1 - f);
  // sinh and cosh of p and q from one expm1 each (identity above).
  const ep = Math.expm1(p);
  const rp = ep / (1 + ep);
  const sinhP = 0.5 * (ep + rp);
  const coshP = 1 + 0.5 * ep * rp;
  const eq = p === q ? ep : Math.expm1(q);
  const rq = eq / (1 + eq);
  const sinhQ = 0.5 * (eq + rq);
  const coshQ = 1 + 0.5 * eq * rq;
  // d/S = P·Q with P = sinh p·sinh q/k and Q = cosh β + sinh β·E, E = (χ(p) − χ(q))/k.
  const outer = (sinhP * sinhQ) / k;
  const outerSlope = (f * coshP * sinhQ + (1 - f) * sinhP * coshQ - outer) / k;
  const sb = state.sinhMidspanAngle;
  const cb = state.coshMidspanAngle;
  let inner = cb;
  let innerSlope = state.midspanAngleSlope * sb;
  if (sb !== 0 && p !== q) {
    const asymmetry = (cothTermMinusOne(p, sinhP, coshP) - cothTermMinusOne(q, sinhQ, coshQ)) / k;
    const asymmetrySlope =
      (f * cothTermSlope(p, sinhP, coshP) - (1 - f) * cothTermSlope(q, sinhQ, coshQ) - asymmetry) / k;
    inner += sb * asymmetry;
    innerSlope += state.midspanAngleSlope * cb * asymmetry + sb * asymmetrySlope;
  }
  return { value: outer * inner, slope: outerSlope * inner + outer * innerSlope };
}

/**
 * Span fraction f = x/S where the wire's slope equals `slope` (dz/dx), on the catenary extended beyond the
 * supports if need be: sinh((x − x_m)/C) = slope gives f = (k + asinh(slope) − β)/(2k).
 * @param slopeAngle asinh(slope), passed in so that callers compute it once per solve
 */
export function fractionWhereSlopeAngleIs(state: ScaledSpan, slopeAngle: number): number {
  const k = state.halfAngle;
  return (k + slopeAngle - midspanAngle(state)) / (2 * k);
}
