/**
 * A seeded uniform generator on [0, 1): Tommy Ettinger's public-domain "mulberry32", a 32-bit
 * state generator that is small, fast and good enough for simulations and bootstrap resampling.
 * The same seed always gives the same sequence, so seeded tests and resamples are reproducible.
 */
export function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
