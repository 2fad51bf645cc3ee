import { EstimationError } from '../estimation-error';
import { brentRoot } from '../numerics/brent-root';
import type { DemandCurve } from './demand-curve';
import type { SupplyCurve } from './supply-curve';

/** Where demand meets supply. */
export interface Equilibrium {
  readonly price: number;
  readonly quantity: number;
}

/**
 * The seller price at which demand at the buyer price `buyerPrice(ps)` equals supply at ps. With a
 * linear demand and supply and an affine wedge (buyer price = k·ps + t) the root is in closed
 * form; otherwise Brent's method on excess demand, bracketed on [0, top of the demand range].
 */
export function solveSellerPrice(
  demand: DemandCurve,
  supply: SupplyCurve,
  wedge: { readonly factor: number; readonly add: number },
): number {
  const d = demand.closedForm;
  if (d?.kind === 'linear' && supply.linear) {
    // a − b·(k·ps + t) = c + s·ps
    const { intercept: a, slope: b } = d;
    const { intercept: c, slope: s } = supply.linear;
    return (a - b * wedge.add - c) / (b * wedge.factor + s);
  }
  const excess = (ps: number) =>
    demand.quantity(wedge.factor * ps + wedge.add) - supply.quantity(ps);
  let hi = demand.priceRange?.max ?? 1;
  for (let i = 0; i < 60 && excess(hi) > 0; i++) hi *= 2;
  const lo = Math.max(0, -wedge.add / wedge.factor) + 1e-12 * hi;
  if (!(excess(lo) > 0 && excess(hi) < 0)) {
    throw new EstimationError(
      'no-equilibrium',
      'demand and supply do not cross at a positive price',
      'supply',
    );
  }
  return brentRoot(excess, lo, hi, 'supply');
}

/** Market equilibrium of a demand and a supply curve. */
export function marketEquilibrium(demand: DemandCurve, supply: SupplyCurve): Equilibrium {
  const price = solveSellerPrice(demand, supply, { factor: 1, add: 0 });
  const quantity = demand.quantity(price);
  if (!(price > 0 && quantity > 0)) {
    throw new EstimationError(
      'no-equilibrium',
      'demand and supply do not cross at a positive price and quantity',
      'supply',
    );
  }
  return { price, quantity };
}
