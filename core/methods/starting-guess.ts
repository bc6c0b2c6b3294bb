/**
 * Starting values of the half-angle k = S/(2C) from the small-sag expansion of the exact catenary, good to
 * O(k³) so that Newton needs two or three steps. They only start the solvers; the answers never depend on them.
 */

/** Fixed-point passes on k = T/(1 + k·μ + k²·ν); each gains one order in k. */
const PASSES = 3;

/** Inverts k·(1 + k·μ + k²·ν) = base by fixed point from k = base; falls back to `base` outside small sag. */
function invertSeries(base: number, linear: number, quadratic: number): number {
  let k = base;
  for (let pass = 0; pass < PASSES; pass++) {
    const factor = 1 + k * linear + k * k * quadratic;
    if (!(factor > 0.5 && factor < 2)) return base;
    k = base / factor;
  }
  return k;
}

/**
 * k whose sag at span fraction f is `sagRatio` (d/S), from
 *   d/S ≈ k·f(1 − f)·√(1 + r²)·(1 + k·r(2f − 1)/(3√(1 + r²)) + k²·((f² + (1 − f)²)/6 − r²/(6(1 + r²))))
 * (series of sinh, z·coth z and sinh β = r·k/sinh k in scaled-span.ts; r = h/S). The first term alone is the
 * parabola.
 */
export function halfAngleFromSag(sagRatio: number, fraction: number, riseRatio: number): number {
  const f = fraction;
  const r = riseRatio;
  const slopeFactor = Math.sqrt(1 + r * r);
  const base = sagRatio / (f * (1 - f) * slopeFactor);
  const linear = (r * (2 * f - 1)) / (3 * slopeFactor);
  const quadratic = (f * f + (1 - f) * (1 - f)) / 6 - (r * r) / (6 * (1 + r * r));
  return invertSeries(base, linear, quadratic);
}

/**
 * k whose one-return time t₁ gives g·t₁²/S = `timeRatio`, from
 *   g·t₁²/S ≈ 8k·√(1 + r²)·(1 + k²·(2 − r²)/(12(1 + r²)))
 * (series of ∫√cosh u du about β). The first term alone is the rule D = g·t₁²/32.
 */
export function halfAngleFromReturnTime(timeRatio: number, riseRatio: number): number {
  const r2 = riseRatio * riseRatio;
  return invertSeries(timeRatio / (8 * Math.sqrt(1 + r2)), 0, (2 - r2) / (12 * (1 + r2)));
}

/**
 * k whose wire just touches a sight line a·(1 − f) + b·f below the chord (a, b as fractions of S), from the same
 * small-sag profile d(f) ≈ k·√(1 + r²)·f(1 − f)·M(f), M = 1 + k·μ(f) + k²·ν(f), as halfAngleFromSag.
 * The parabola touches at f = √a/(√a + √b); on an inclined span the catenary's lopsided sag moves the touching
 * point by O(k). Alternating a Newton step on the touching condition d′(f) = b − a with k from d(f) = ℓ(f) puts
 * both right to the order of the profile (by the envelope theorem an error δf in f costs only O(δf²) in k).
 */
export function halfAngleFromSight(nearDropRatio: number, farDropRatio: number, riseRatio: number): number {
  const a = nearDropRatio;
  const b = farDropRatio;
  const r = riseRatio;
  const c = Math.sqrt(1 + r * r);
  let f = Math.sqrt(a) / (Math.sqrt(a) + Math.sqrt(b));
  let k = halfAngleFromSag(a * (1 - f) + b * f, f, r);
  for (let pass = 0; pass < 2; pass++) {
    const mu = (r * (2 * f - 1)) / (3 * c);
    const nu = (f * f + (1 - f) * (1 - f)) / 6 - (r * r) / (6 * c * c);
    const shape = 1 + k * mu + k * k * nu;
    const shapeSlope = (k * 2 * r) / (3 * c) + (k * k * (2 * f - 1)) / 3;
    const shapeCurvature = (k * k) / 3;
    const p = f * (1 - f);
    const slope = k * c * ((1 - 2 * f) * shape + p * shapeSlope);
    const curvature = k * c * (-2 * shape + 2 * (1 - 2 * f) * shapeSlope + p * shapeCurvature);
    const next = f - (slope - (b - a)) / curvature;
    if (!(next > 0 && next < 1)) break;
    f = next;
    k = halfAngleFromSag(a * (1 - f) + b * f, f, r);
  }
  return k;
}
