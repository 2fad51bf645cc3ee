import type { DemandCurve, PriceRange } from '../welfare/demand-curve';

/** A confidence interval for the predicted quantity (or share) at one price. */
export interface QuantityInterval {
  readonly low: number;
  readonly high: number;
}

/**
 * A demand curve fitted to data: what a demand schedule needs on top of a plain curve — what
 * it predicts (a quantity or a purchase share), the prices it was fitted over, the sample size,
 * and, where the model allows, a confidence band.
 */
export interface FittedDemandCurve extends DemandCurve {
  readonly method: string;
  readonly quantityKind: 'quantity' | 'share';
  readonly observedPriceRange: PriceRange;
  readonly n: number;
  quantityInterval?(price: number, confidenceLevel: number): QuantityInterval;
}
