/**
 * Gauss–Legendre quadrature with nodes computed once at load (Newton on P_n, Abramowitz & Stegun 25.4.29).
 * Used for smooth integrands such as the return-wave travel time, where a fixed rule beats adaptive ones.
 */
const ORDER = 20;

function legendreRule(n: number): { nodes: Float64Array; weights: Float64Array } {
  const nodes = new Float64Array(n);
  const weights = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (n + 0.5));
    let derivative = 0;
    for (let k = 0; k < 100; k++) {
      let p0 = 1;
      let p1 = x;
      for (let j = 2; j <= n; j++) {
        const p2 = ((2 * j - 1) * x * p1 - (j - 1) * p0) / j;
        p0 = p1;
        p1 = p2;
      }
      derivative = (n * (x * p1 - p0)) / (x * x - 1);
      const step = p1 / derivative;
      x -= step;
      if (Math.abs(step) < 1e-16) break;
    }
    nodes[i] = x;
    weights[i] = 2 / ((1 - x * x) * derivative * derivative);
  }
  return { nodes, weights };
}

const RULE = legendreRule(ORDER);

/**
 * ∫ f(u) du over [a, b] by composite 20-point Gauss–Legendre with `panels` equal panels.
 * For analytic integrands the error falls like (width/panels)^40; callers choose panels from the width.
 */
export function integrate(f: (u: number) => number, a: number, b: number, panels = 1): number {
  const width = (b - a) / panels;
  const half = width / 2;
  let total = 0;
  for (let p = 0; p < panels; p++) {
    const mid = a + (p + 0.5) * width;
    let sum = 0;
    for (let i = 0; i < ORDER; i++) sum += RULE.weights[i]! * f(mid + half * RULE.nodes[i]!);
    total += sum * half;
  }
  return total;
}
