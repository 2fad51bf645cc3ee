/**
 * Maximum of f on [lo, hi]: a scan of `gridPoints` (default 400) equally spaced points finds the
 * best neighbourhood, then golden-section search narrows it to `tolerance`·max(1, |x|) (default
 * 1e-10). A scan first guards against the nearest local maximum not being the largest.
 */
export function maximiseOnInterval(
  f: (x: number) => number,
  lo: number,
  hi: number,
  gridPoints = 400,
  tolerance = 1e-10,
): { x: number; value: number } {
  const step = (hi - lo) / gridPoints;
  let bestK = 0;
  let bestValue = f(lo);
  for (let k = 1; k <= gridPoints; k++) {
    const v = f(lo + k * step);
    if (v > bestValue) {
      bestValue = v;
      bestK = k;
    }
  }
  let a = lo + Math.max(0, bestK - 1) * step;
  let b = lo + Math.min(gridPoints, bestK + 1) * step;
  const ratio = (Math.sqrt(5) - 1) / 2;
  let x1 = b - ratio * (b - a);
  let x2 = a + ratio * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  while (b - a > tolerance * Math.max(1, Math.abs(a))) {
    if (f1 < f2) {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + ratio * (b - a);
      f2 = f(x2);
    } else {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - ratio * (b - a);
      f1 = f(x1);
    }
  }
  const x = (a + b) / 2;
  const value = f(x);
  return value >= bestValue ? { x, value } : { x: lo + bestK * step, value: bestValue };
}
