import { EstimationError } from '../estimation-error';
import { adaptiveSimpson } from '../numerics/adaptive-simpson';
import type { DemandCurve } from './demand-curve';
import { checkPrice, requirePriceRange } from './demand-slope';

/**
 * Consumer surplus at a price, ∫ from P to the top of demand of Q(p) dp. Closed forms: linear
 * ½(a/b − P)·Q(P); constant elasticity ε < −1: A·P^(ε+1)/(−(ε+1)) (unbounded otherwise).
 * Otherwise adaptive Simpson up to the top of the curve's price range, which is then taken as
 * the price at which nobody buys.
 */
export function consumerSurplus(curve: DemandCurve, price: number): number {
  checkPrice(price);
  const form = curve.closedForm;
  if (form?.kind === 'linear') {
    const choke = form.intercept / form.slope;
    return price >= choke ? 0 : 0.5 * (choke - price) * (form.intercept - form.slope * price);
  }
  if (form?.kind === 'constant-elasticity') {
    if (!(form.elasticity < -1)) {
      throw new EstimationError(
        'unbounded-surplus',
        'consumer surplus is unbounded when ε ≥ −1',
        'elasticity',
      );
    }
    if (price === 0)
      throw new EstimationError(
        'unbounded-surplus',
        'consumer surplus at price 0 is unbounded',
        'price',
      );
    return (form.scale * price ** (form.elasticity + 1)) / -(form.elasticity + 1);
  }
  const top = requirePriceRange(curve).max;
  return price >= top ? 0 : adaptiveSimpson((p) => curve.quantity(p), price, top, 'price');
}
