import { EstimationError } from '../estimation-error';
import type { DemandCurve } from './demand-curve';
import { checkPrice, demandSlope } from './demand-slope';

/** Point price elasticity (dQ/dP)·P/Q at a price; refused where Q = 0. */
export function pointElasticity(curve: DemandCurve, price: number): number {
  checkPrice(price);
  const form = curve.closedForm;
  if (form?.kind === 'constant-elasticity') return form.elasticity;
  const q = curve.quantity(price);
  if (!(q > 0)) {
    throw new EstimationError(
      'undefined-elasticity',
      `quantity is 0 at price ${price}: elasticity undefined`,
      'price',
    );
  }
  return (demandSlope(curve, price) * price) / q;
}

/** Marginal revenue d(P·Q)/dQ = P + Q/(dQ/dP) = P·(1 + 1/ε) at a price. */
export function marginalRevenue(curve: DemandCurve, price: number): number {
  checkPrice(price);
  const slope = demandSlope(curve, price);
  if (slope === 0) {
    throw new EstimationError(
      'undefined-elasticity',
      `the curve is flat at price ${price}: marginal revenue undefined`,
      'price',
    );
  }
  return price + curve.quantity(price) / slope;
}
