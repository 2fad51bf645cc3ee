import { EstimationError } from '../estimation-error';
import { maximiseOnInterval } from '../numerics/maximise-on-interval';
import type { DemandCurve } from './demand-curve';
import { brentRoot } from '../numerics/brent-root';
import { demandSlope, requirePriceRange } from './demand-slope';

/**
 * Price maximising (P − unitCost)·Q(P); unitCost 0 gives the revenue-maximising price. Closed forms:
 * linear Q = a − bP gives (a/b + c)/2; constant elasticity ε < −1 gives c·ε/(1 + ε) (the inverse-
 * elasticity rule) and has no revenue maximum. Otherwise a scan of the curve's price range and
 * golden-section search to 1e-10 relative; a maximum on the edge of the range is refused.
 */
export function optimalPrice(curve: DemandCurve, unitCost = 0): number {
  if (!(Number.isFinite(unitCost) && unitCost >= 0)) {
    throw new EstimationError('invalid-value', 'unit cost must be a number ≥ 0', 'unitCost');
  }
  const form = curve.closedForm;
  if (form?.kind === 'linear') {
    const choke = form.intercept / form.slope;
    if (unitCost >= choke)
      throw noInterior(
        curve,
        'the unit cost is at or above the price at which demand reaches zero',
      );
    return (choke + unitCost) / 2;
  }
  if (form?.kind === 'constant-elasticity') {
    if (!(form.elasticity < -1))
      throw noInterior(
        curve,
        'demand is inelastic (elasticity −1 or above), so a higher price always earns more',
      );
    if (unitCost === 0)
      throw noInterior(
        curve,
        'demand is elastic (elasticity below −1), so revenue falls as the price rises, at every price',
      );
    return inverseElasticityPrice(unitCost, form.elasticity);
  }
  if (curve.discrete) return stepOptimalPrice(curve, unitCost);
  const range = requirePriceRange(curve);
  const lo = Math.max(range.min, unitCost);
  const best = maximiseOnInterval((p) => (p - unitCost) * curve.quantity(p), lo, range.max);
  const edge = 1e-7 * Math.max(1, range.max - lo);
  if (best.x - lo < edge || range.max - best.x < edge)
    throw noInterior(curve, 'the best value lies at the edge of the prices the curve covers');
  return polishOnFirstOrderCondition(curve, unitCost, best.x, edge);
}

/**
 * The best price of a step curve: (P − c)·Q(P) rises across each step's interval, so the best
 * of the step prices above the unit cost is the maximum (ties to the lowest price, as for a
 * ladder grid). A curve without its step prices, or with no positive margin at any, has none.
 */
function stepOptimalPrice(curve: DemandCurve, unitCost: number): number {
  if (!curve.steps) {
    throw new EstimationError(
      'not-differentiable',
      `${curve.description} is a step function whose steps are not known`,
      'price',
    );
  }
  let best: number | null = null;
  let bestValue = 0;
  for (const price of curve.steps) {
    const value = (price - unitCost) * curve.quantity(price);
    if (value > bestValue) [best, bestValue] = [price, value];
  }
  if (best === null) throw noInterior(curve, 'no price step is above the unit cost');
  return best;
}

/**
 * A search on the objective locates a smooth maximum only to about √ε relative; the root of the
 * marginal profit Q + (P − c)·Q′ near it is found to 1e-13.
 */
function polishOnFirstOrderCondition(
  curve: DemandCurve,
  unitCost: number,
  guess: number,
  width: number,
): number {
  const marginal = (p: number) => curve.quantity(p) + (p - unitCost) * demandSlope(curve, p);
  const lo = guess - 100 * width;
  const hi = guess + 100 * width;
  if (!(marginal(lo) > 0 && marginal(hi) < 0)) return guess;
  return brentRoot(marginal, lo, hi, 'price');
}

/** Profit-maximising price from the inverse-elasticity (Lerner) rule P = MC·ε/(1 + ε), ε < −1. */
export function inverseElasticityPrice(marginalCost: number, elasticity: number): number {
  if (!(elasticity < -1)) {
    throw new EstimationError(
      'invalid-value',
      'the inverse-elasticity rule needs elastic demand (ε < −1)',
      'elasticity',
    );
  }
  return (marginalCost * elasticity) / (1 + elasticity);
}

/** Lerner index (P − MC)/P = −1/ε at the profit-maximising price. */
export function lernerIndex(elasticity: number): number {
  if (!(elasticity < -1)) {
    throw new EstimationError(
      'invalid-value',
      'the Lerner index needs elastic demand (ε < −1)',
      'elasticity',
    );
  }
  return -1 / elasticity;
}

function noInterior(curve: DemandCurve, why: string): EstimationError {
  return new EstimationError(
    'no-interior-maximum',
    `no best price inside the curve's price range: ${why} (curve ${curve.description})`,
    'price',
  );
}
