import { EstimationError } from '../estimation-error';

/**
 * ∫ₐᵇ f by adaptive Simpson quadrature with Richardson correction (exact for polynomials up to
 * degree 3). Each panel is split until its estimated error is below its share of `tolerance`
 * (absolute, default 1e-11·max(1, |first estimate|)); refuses a non-finite integrand.
 */
export function adaptiveSimpson(
  f: (x: number) => number,
  a: number,
  b: number,
  field: string,
  tolerance?: number,
): number {
  if (a === b) return 0;
  if (a > b) return -adaptiveSimpson(f, b, a, field, tolerance);
  const fa = f(a);
  const fb = f(b);
  const m = (a + b) / 2;
  const fm = f(m);
  const whole = ((b - a) / 6) * (fa + 4 * fm + fb);
  const tol = tolerance ?? 1e-11 * Math.max(1, Math.abs(whole));
  const value = refine(f, a, b, fa, fm, fb, whole, tol, 60);
  if (!Number.isFinite(value)) {
    throw new EstimationError(
      'invalid-value',
      'the curve is not finite over the integration range',
      field,
    );
  }
  return value;
}

function refine(
  f: (x: number) => number,
  a: number,
  b: number,
  fa: number,
  fm: number,
  fb: number,
  whole: number,
  tol: number,
  depth: number,
): number {
  const m = (a + b) / 2;
  const lm = (a + m) / 2;
  const rm = (m + b) / 2;
  const flm = f(lm);
  const frm = f(rm);
  const left = ((m - a) / 6) * (fa + 4 * flm + fm);
  const right = ((b - m) / 6) * (fm + 4 * frm + fb);
  const delta = left + right - whole;
  if (depth <= 0 || Math.abs(delta) <= 15 * tol) return left + right + delta / 15;
  return (
    refine(f, a, m, fa, flm, fm, left, tol / 2, depth - 1) +
    refine(f, m, b, fm, frm, fb, right, tol / 2, depth - 1)
  );
}
