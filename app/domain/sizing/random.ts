// Seeded random numbers for the simulated year, so a plan's weather is the same every time it is shown.

/** mulberry32: a public-domain 32-bit PRNG; returns a function giving uniform numbers in [0, 1). */
export function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return function next(): number {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates by the Box–Muller transform (Box & Muller 1958), one per call. */
export function normalSource(uniform: () => number): () => number {
  let spare: number | null = null;
  return function nextNormal(): number {
    if (spare !== null) {
      const value = spare;
      spare = null;
      return value;
    }
    const u1 = 1 - uniform(); // (0, 1]: log stays finite
    const u2 = uniform();
    const radius = Math.sqrt(-2 * Math.log(u1));
    spare = radius * Math.sin(2 * Math.PI * u2);
    return radius * Math.cos(2 * Math.PI * u2);
  };
}

/**
 * Standard normal cumulative distribution Φ(z) = ½·erfc(−z/√2), with erfc from Abramowitz & Stegun
 * (1964) formula 7.1.26 (absolute error below 1.5e-7).
 */
export function standardNormalCdf(z: number): number {
  const x = Math.abs(z) / Math.SQRT2;
  const t = 1 / (1 + 0.3275911 * x);
  const poly = t * (0.254829592 + t * (-0.284496736 + t * (1.421413741 + t * (-1.453152027 + t * 1.061405429))));
  const erfcX = poly * Math.exp(-x * x);
  return z >= 0 ? 1 - erfcX / 2 : erfcX / 2;
}
