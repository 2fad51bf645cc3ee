/**
 * f′(x) by central differences with one Richardson step, (4·D(h/2) − D(h))/3, error O(h⁴);
 * h = 1e-3·max(1, |x|), which balances truncation and rounding for smooth curves (~1e-10 relative).
 */
export function numericDerivative(f: (x: number) => number, x: number): number {
  const h = 1e-3 * Math.max(1, Math.abs(x));
  const central = (step: number) => (f(x + step) - f(x - step)) / (2 * step);
  return (4 * central(h / 2) - central(h)) / 3;
}
