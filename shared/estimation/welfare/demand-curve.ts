/** A closed price interval. */
export interface PriceRange {
  readonly min: number;
  readonly max: number;
}

/** Q = intercept − slope·P, with slope > 0 for a falling curve. */
export interface LinearDemandForm {
  readonly kind: 'linear';
  readonly intercept: number;
  readonly slope: number;
}

/** Q = scale·P^elasticity. */
export interface ConstantElasticityForm {
  readonly kind: 'constant-elasticity';
  readonly scale: number;
  readonly elasticity: number;
}

/**
 * Anything that gives a quantity (or purchase share) at a price. Welfare calculations use the
 * closed form when one is declared, the analytic slope when given, and careful numerics otherwise
 * (they then need `priceRange` to know where to look).
 */
export interface DemandCurve {
  readonly description: string;
  quantity(price: number): number;
  /** dQ/dP at a price, when known analytically. */
  slope?(price: number): number;
  /** Prices over which the curve is meant to hold (and over which numerics search). */
  readonly priceRange?: PriceRange;
  readonly closedForm?: LinearDemandForm | ConstantElasticityForm;
  /** True for a step function (an empirical curve): it has no slope or point elasticity. */
  readonly discrete?: boolean;
  /**
   * For a step function that holds its value up to each step, Q(P) = Q(step) on the interval
   * ending at it: the prices of the steps, ascending. (P − c)·Q(P) rises across each interval,
   * so its maxima lie on these prices.
   */
  readonly steps?: readonly number[];
}
