import { EstimationError } from '../estimation-error';

/**
 * Root of a continuous function on [lo, hi] where it changes sign, by Brent's method (bisection,
 * secant and inverse quadratic interpolation; Brent 1973). Stops when the bracket is narrower than
 * `tolerance`·max(1, |x|) — default 1e-13 — or the function is exactly 0.
 */
export function brentRoot(
  f: (x: number) => number,
  lo: number,
  hi: number,
  field: string,
  tolerance = 1e-13,
): number {
  let a = lo;
  let b = hi;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (!(Math.sign(fa) !== Math.sign(fb))) {
    throw new EstimationError('no-root', `no sign change between ${lo} and ${hi}`, field);
  }
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let i = 0; i < 300; i++) {
    if (Math.sign(fb) === Math.sign(fc)) {
      c = a;
      fc = fa;
      d = e = b - a;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      [a, b, c] = [b, c, b];
      [fa, fb, fc] = [fb, fc, fb];
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * tolerance * Math.max(1, Math.abs(b));
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const r = fb / fc;
        const t = fa / fc;
        p = s * (2 * m * t * (t - r) - (b - a) * (r - 1));
        q = (t - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = m;
      }
    } else {
      d = m;
      e = m;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  throw new EstimationError('not-converged', 'root finding did not converge', field);
}
