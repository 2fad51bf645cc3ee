import { EstimationError } from '../estimation-error';

/**
 * Arc (midpoint) elasticity between (p1, q1) and (p2, q2): the change in quantity over the mean
 * quantity, divided by the change in price over the mean price (Allen 1934). Undefined, and
 * refused, when both quantities are zero or the prices are equal.
 */
export function arcElasticity(p1: number, q1: number, p2: number, q2: number): number {
  if (p1 === p2)
    throw new EstimationError(
      'invalid-value',
      'arc elasticity needs two different prices',
      'price',
    );
  if (q1 + q2 === 0) {
    throw new EstimationError(
      'undefined-elasticity',
      'both quantities are zero, so the arc elasticity is undefined',
      'quantity',
    );
  }
  return (q2 - q1) / ((q1 + q2) / 2) / ((p2 - p1) / ((p1 + p2) / 2));
}
