import { normalQuantile } from '../distributions/normal';
import { tQuantile } from '../distributions/student-t';
import { quadraticForm } from '../maximum-likelihood/small-matrix';
import type { PriceRange } from '../welfare/demand-curve';
import { constantElasticityDemand, linearDemand } from '../welfare/standard-curves';
import type { FittedDemandCurve } from './fitted-demand-curve';

/** A two-coefficient demand regression: estimates, their covariance and where it was fitted. */
export interface DemandRegression {
  readonly intercept: number;
  /** Coefficient on price (linear) or on log price (log-log, the elasticity). */
  readonly priceCoefficient: number;
  /** 2×2 covariance of [intercept, priceCoefficient]. */
  readonly covariance: readonly (readonly number[])[];
  /** Residual degrees of freedom for t bands; normal bands when absent. */
  readonly dfResidual?: number;
  readonly observedPriceRange: PriceRange;
  readonly n: number;
}

const critical = (level: number, df?: number) =>
  df === undefined ? normalQuantile(1 - (1 - level) / 2) : tQuantile(1 - (1 - level) / 2, df);

/** Q = intercept + priceCoefficient·P as a fitted curve with a band for the mean prediction. */
export function linearRegressionDemand(fit: DemandRegression): FittedDemandCurve {
  const base = linearDemand(fit.intercept, -fit.priceCoefficient);
  return {
    ...base,
    method: 'linear demand regression',
    quantityKind: 'quantity',
    observedPriceRange: fit.observedPriceRange,
    n: fit.n,
    quantityInterval: (p, level) => {
      const q = fit.intercept + fit.priceCoefficient * p;
      const half =
        critical(level, fit.dfResidual) * Math.sqrt(quadraticForm(fit.covariance, [1, p]));
      return { low: q - half, high: q + half };
    },
  };
}

/**
 * ln Q = intercept + elasticity·ln P as a fitted curve Q = e^intercept·P^elasticity; its band is
 * the interval on the log scale mapped back (a band for the median quantity).
 */
export function logLogRegressionDemand(fit: DemandRegression): FittedDemandCurve {
  const base = constantElasticityDemand(Math.exp(fit.intercept), fit.priceCoefficient, {
    min: 0,
    max: fit.observedPriceRange.max * 2,
  });
  return {
    ...base,
    method: 'log-log (constant-elasticity) demand regression',
    quantityKind: 'quantity',
    observedPriceRange: fit.observedPriceRange,
    n: fit.n,
    quantityInterval: (p, level) => {
      const logQ = fit.intercept + fit.priceCoefficient * Math.log(p);
      const half =
        critical(level, fit.dfResidual) *
        Math.sqrt(quadraticForm(fit.covariance, [1, Math.log(p)]));
      return { low: Math.exp(logQ - half), high: Math.exp(logQ + half) };
    },
  };
}
