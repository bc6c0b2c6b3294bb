/**
 * Seeded pseudo-random numbers for Monte Carlo checks. core has no Math.random: the seed is a parameter, so
 * every run with the same seed gives the same numbers.
 */

/**
 * Uniform generator on (0, 1) from a 32-bit seed: mulberry32 (Tommy Ettinger's 32-bit mixing generator, public
 * domain; period 2³²). Good enough for a few thousand Monte Carlo samples, not for cryptography.
 */
export function uniformGenerator(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    const bits = (t ^ (t >>> 14)) >>> 0;
    // (bits + 0.5) / 2³² lies strictly inside (0, 1), so log() below never sees 0.
    return (bits + 0.5) / 4294967296;
  };
}

/**
 * Standard normal generator from a seed: Box–Muller transform, z = √(−2 ln u₁)·cos(2π u₂), with the sine
 * partner kept for the next call (G.E.P. Box and M.E. Muller, Ann. Math. Statist. 29 (1958) 610–611).
 */
export function normalGenerator(seed: number): () => number {
  const uniform = uniformGenerator(seed);
  let spare: number | undefined;
  return () => {
    if (spare !== undefined) {
      const value = spare;
      spare = undefined;
      return value;
    }
    const radius = Math.sqrt(-2 * Math.log(uniform()));
    const angle = 2 * Math.PI * uniform();
    spare = radius * Math.sin(angle);
    return radius * Math.cos(angle);
  };
}
