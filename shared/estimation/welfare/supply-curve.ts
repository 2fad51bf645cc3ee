import { EstimationError } from '../estimation-error';
import { formulaNumber, formulaTerm } from '../formula-number';

/** Quantity offered at a price; `linear` declares Qs = intercept + slope·P for closed forms. */
export interface SupplyCurve {
  readonly description: string;
  quantity(price: number): number;
  slope(price: number): number;
  readonly linear?: { readonly intercept: number; readonly slope: number };
}

/** Linear supply Qs = intercept + slope·P, slope > 0. */
export function linearSupply(intercept: number, slope: number): SupplyCurve {
  if (!(slope > 0) || !Number.isFinite(intercept)) {
    throw new EstimationError(
      'invalid-value',
      'linear supply needs a finite intercept and slope > 0',
      'supplySlope',
    );
  }
  return {
    description: `Qs = ${formulaNumber(intercept)} ${formulaTerm(slope)}·P`,
    quantity: (p) => intercept + slope * p,
    slope: () => slope,
    linear: { intercept, slope },
  };
}

/** Linear supply with the given slope through the point (price, quantity). */
export function linearSupplyThrough(price: number, quantity: number, slope: number): SupplyCurve {
  return linearSupply(quantity - slope * price, slope);
}

/** Constant-elasticity supply Qs = quantity·(P/price)^elasticity through (price, quantity). */
export function constantElasticitySupply(
  price: number,
  quantity: number,
  elasticity: number,
): SupplyCurve {
  if (!(elasticity > 0) || !(price > 0) || !(quantity > 0)) {
    throw new EstimationError(
      'invalid-value',
      'supply elasticity, price and quantity must be > 0',
      'supplyElasticity',
    );
  }
  return {
    description: `Qs = ${formulaNumber(quantity)}·(P/${formulaNumber(price)})^${formulaNumber(elasticity)}`,
    quantity: (p) => (p <= 0 ? 0 : quantity * (p / price) ** elasticity),
    slope: (p) => (p <= 0 ? 0 : (quantity * elasticity * (p / price) ** (elasticity - 1)) / price),
  };
}
