import { gaussian } from './gaussian';
import { mulberry32 } from './mulberry32';

/**
 * Below this many trials, or this many expected successes (or failures), a draw is by inversion
 * of the distribution function: a short search that starts from (1 − p)ⁿ without underflow.
 */
const inversionTrials = 40;
const inversionMean = 20;

/**
 * Exact Binomial(n, p) draws from a seeded uniform generator, in time that grows with log n.
 * Large n by the order-statistic recursion (Knuth, The Art of Computer Programming vol. 2,
 * §3.4.1): the a-th smallest of n uniforms is Beta(a, n + 1 − a); if it lies at or above p, the
 * successes are among the a − 1 below it, else a plus those among the n − a above it, each a
 * binomial again on a rescaled p. Small n by inverting the distribution function.
 */
export function binomialDraw(seed: number): (n: number, p: number) => number {
  const uniform = mulberry32(seed);
  const normal = gaussian(uniform);
  const gamma = gammaDraw(uniform, normal);
  const beta = (a: number, b: number) => {
    const x = gamma(a);
    return x / (x + gamma(b));
  };
  return (trials, probability) => {
    let n = trials;
    let p = probability;
    let successes = 0;
    while (n > inversionTrials && Math.min(p, 1 - p) * n > inversionMean) {
      const a = 1 + Math.floor(n / 2);
      const b = n + 1 - a;
      const x = beta(a, b);
      if (x >= p) {
        n = a - 1;
        p /= x;
      } else {
        successes += a;
        n = b - 1;
        p = (p - x) / (1 - x);
      }
    }
    return successes + invert(n, p, uniform);
  };
}

function invert(n: number, p: number, uniform: () => number): number {
  if (n <= 0 || p <= 0) return 0;
  if (p >= 1) return n;
  // Guards the search against rounding in the tail: it cannot run past n.
  if (p > 0.5) return n - invert(n, 1 - p, uniform);
  const ratio = p / (1 - p);
  let f = (1 - p) ** n;
  let u = uniform();
  let x = 0;
  while (u > f && x < n) {
    u -= f;
    f *= ((n - x) / (x + 1)) * ratio;
    x++;
  }
  return x;
}

/**
 * Gamma(shape, 1) draws by Marsaglia and Tsang's method (ACM TOMS 26, 2000), for shape ≥ 1
 * (every shape the recursion above asks for).
 */
function gammaDraw(uniform: () => number, normal: () => number): (shape: number) => number {
  return (shape) => {
    const d = shape - 1 / 3;
    const c = 1 / Math.sqrt(9 * d);
    for (;;) {
      let z: number;
      let v: number;
      do {
        z = normal();
        v = 1 + c * z;
      } while (v <= 0);
      v = v * v * v;
      const u = 1 - uniform();
      if (u < 1 - 0.0331 * z ** 4) return d * v;
      if (Math.log(u) < 0.5 * z * z + d * (1 - v + Math.log(v))) return d * v;
    }
  };
}
