/**
 * Standard normal deviates from a uniform generator (Box–Muller transform; the second deviate of
 * each pair is kept for the next call). Pair with `mulberry32(seed)` for reproducible draws.
 */
export function gaussian(uniform: () => number): () => number {
  let spare: number | undefined;
  return () => {
    if (spare !== undefined) {
      const value = spare;
      spare = undefined;
      return value;
    }
    // 1 − u lies in (0, 1], so the logarithm is finite.
    const radius = Math.sqrt(-2 * Math.log(1 - uniform()));
    const angle = 2 * Math.PI * uniform();
    spare = radius * Math.sin(angle);
    return radius * Math.cos(angle);
  };
}
