/** Seeded random numbers for simulation tests (common practice: mulberry32 and Box–Muller). */

/** Uniform deviates in [0, 1) from mulberry32. */
export function uniform(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviates: mulberry32 uniforms through Box–Muller. */
export function gaussian(seed: number): () => number {
  const u = uniform(seed);
  return () => Math.sqrt(-2 * Math.log(1 - u())) * Math.cos(2 * Math.PI * u());
}

/** Binomial(n, p) by summing Bernoulli draws (fine for the n of a test). */
export function binomial(u: () => number, n: number, p: number): number {
  let x = 0;
  for (let i = 0; i < n; i++) if (u() < p) x++;
  return x;
}
