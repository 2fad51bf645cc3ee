import { EstimationError } from '../estimation-error';
import { numericDerivative } from '../numerics/numeric-derivative';
import type { DemandCurve, PriceRange } from './demand-curve';

/** dQ/dP: analytic when the curve gives it, else central differences with Richardson extrapolation. */
export function demandSlope(curve: DemandCurve, price: number): number {
  if (curve.discrete) {
    throw new EstimationError(
      'not-differentiable',
      `${curve.description} is a step function: it has no slope`,
      'price',
    );
  }
  return curve.slope ? curve.slope(price) : numericDerivative((p) => curve.quantity(p), price);
}

/** The curve's price range, required by the numerical methods. */
export function requirePriceRange(curve: DemandCurve): PriceRange {
  if (!curve.priceRange) {
    throw new EstimationError(
      'missing-price-range',
      `${curve.description} needs a price range for this calculation`,
      'priceRange',
    );
  }
  return curve.priceRange;
}

/** Refuses a price that is not a finite number ≥ 0. */
export function checkPrice(price: number, field = 'price'): void {
  if (!(Number.isFinite(price) && price >= 0)) {
    throw new EstimationError('invalid-value', `${field} must be a number ≥ 0`, field);
  }
}
