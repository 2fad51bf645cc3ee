import { EstimationError } from '../estimation-error';
import { logistic } from '../maximum-likelihood/binomial-logit';

/**
 * The price maximising (p − c)·P(p) for the purchase curve P(p) = 1/(1 + e^−(a + b·p)), b < 0
 * (c = 0: revenue). It is the single root of h(p) = 1 + (p − c)·b·(1 − P(p)) above c — log of
 * the objective has derivative 1/(p − c) + b(1 − P), strictly falling — found by bisection to
 * 1e-14 relative.
 */
export function logisticOptimalPrice(a: number, b: number, unitCost = 0): number {
  if (!(b < 0)) {
    throw new EstimationError(
      'implausible-estimate',
      'the purchase curve does not fall with price',
      'price',
    );
  }
  const h = (p: number): number => 1 + (p - unitCost) * b * (1 - logistic(a + b * p));
  let lo = unitCost;
  let hi = unitCost - 1 / b;
  while (h(hi) > 0) hi = unitCost + 2 * (hi - unitCost);
  for (let i = 0; i < 200 && hi - lo > 1e-14 * Math.max(1, Math.abs(hi)); i++) {
    const mid = (lo + hi) / 2;
    if (h(mid) > 0) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/**
 * Gradient of the optimal price with respect to (a, b) by the implicit function theorem,
 * d(p*)/dθ = −(∂h/∂θ)/(∂h/∂p), for the delta method.
 */
export function logisticOptimalPriceGradient(
  a: number,
  b: number,
  price: number,
  unitCost = 0,
): number[] {
  const p = logistic(a + b * price);
  const q = 1 - p;
  const u = price - unitCost;
  const dhda = -u * b * p * q;
  const dhdb = u * q - u * b * price * p * q;
  const dhdp = b * q - u * b * b * p * q;
  return [-dhda / dhdp, -dhdb / dhdp];
}
