import type { FittedDemandCurve } from '../estimation/demand-schedule/fitted-demand-curve';
import { normalQuantile } from '../estimation/distributions/normal';
import { tQuantile } from '../estimation/distributions/student-t';
import { quadraticForm } from '../estimation/maximum-likelihood/small-matrix';
import { formulaNumber, formulaTerm } from '../estimation/formula-number';

/** The coefficients of ln q = a + b·p with their covariance and where they were fitted. */
export interface SemiLogRegression {
  readonly intercept: number;
  readonly priceCoefficient: number;
  readonly covariance: readonly (readonly number[])[];
  readonly dfResidual: number | null;
  readonly observedPriceRange: { readonly min: number; readonly max: number };
  readonly n: number;
}

/**
 * Semi-log demand Q = e^(a + b·P): elasticity b·P grows with the price; the band is the interval
 * of a + b·P mapped back (a band for the median quantity, as for the log-log form).
 */
export function semiLogRegressionDemand(fit: SemiLogRegression): FittedDemandCurve {
  const { intercept: a, priceCoefficient: b } = fit;
  const critical = (level: number) =>
    fit.dfResidual === null
      ? normalQuantile(1 - (1 - level) / 2)
      : tQuantile(1 - (1 - level) / 2, fit.dfResidual);
  return {
    description: `Q = exp(${formulaNumber(a)} ${formulaTerm(b)}·P)`,
    method: 'semi-log demand regression',
    quantityKind: 'quantity',
    quantity: (p) => Math.exp(a + b * p),
    slope: (p) => b * Math.exp(a + b * p),
    priceRange: {
      min: 0,
      max:
        b < 0 ? Math.max(fit.observedPriceRange.max * 2, -12 / b) : fit.observedPriceRange.max * 2,
    },
    observedPriceRange: fit.observedPriceRange,
    n: fit.n,
    quantityInterval: (p, level) => {
      const half = critical(level) * Math.sqrt(quadraticForm(fit.covariance, [1, p]));
      return { low: Math.exp(a + b * p - half), high: Math.exp(a + b * p + half) };
    },
  };
}
