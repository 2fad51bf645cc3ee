import type { FittedDemandCurve } from '../demand-schedule/fitted-demand-curve';
import { normalQuantile } from '../distributions/normal';
import { logistic, type BinomialLogitFit } from '../maximum-likelihood/binomial-logit';
import { deltaMethod, type IntervalEstimate } from '../maximum-likelihood/delta-method';
import { quadraticForm } from '../maximum-likelihood/small-matrix';
import { logisticShareDemand } from '../welfare/standard-curves';
import type { PriceRange } from '../welfare/demand-curve';
import { logisticOptimalPrice, logisticOptimalPriceGradient } from './logistic-optimum';

/** The fitted logistic purchase curve of a price ladder and the prices derived from it. */
export interface LogisticPurchaseSummary {
  readonly coefficients: {
    term: string;
    estimate: number;
    stdError: number;
    ciLow: number;
    ciHigh: number;
  }[];
  readonly logLikelihood: number;
  /** Price at which the purchase share is one half, −a/b. */
  readonly halfSharePrice: IntervalEstimate;
  readonly revenueMaxPrice: IntervalEstimate | null;
  /** p*·P(p*) at the revenue-maximising price (envelope theorem for its SE). */
  readonly maxRevenueIndex: IntervalEstimate | null;
  readonly profitMaxPrice: IntervalEstimate | null;
}

/** Derived prices with delta-method intervals from a logit fit and its covariance. */
export function summariseLogisticCurve(
  fit: BinomialLogitFit,
  covariance: number[][],
  confidenceLevel: number,
  unitCost: number | undefined,
): LogisticPurchaseSummary {
  const { intercept: a, slope: b } = fit;
  const coefficients = [
    { term: '(intercept)', ...deltaMethod(a, [1, 0], covariance, confidenceLevel) },
    { term: 'price', ...deltaMethod(b, [0, 1], covariance, confidenceLevel) },
  ];
  const halfSharePrice = deltaMethod(-a / b, [-1 / b, a / (b * b)], covariance, confidenceLevel);
  if (!(b < 0)) {
    return {
      coefficients,
      logLikelihood: fit.logLikelihood,
      halfSharePrice,
      revenueMaxPrice: null,
      maxRevenueIndex: null,
      profitMaxPrice: null,
    };
  }
  const optimum = (cost: number): IntervalEstimate => {
    const price = logisticOptimalPrice(a, b, cost);
    return deltaMethod(
      price,
      logisticOptimalPriceGradient(a, b, price, cost),
      covariance,
      confidenceLevel,
    );
  };
  const revenueMaxPrice = optimum(0);
  const p = revenueMaxPrice.estimate;
  const share = logistic(a + b * p);
  const dShare = share * (1 - share);
  const maxRevenueIndex = deltaMethod(
    p * share,
    [p * dShare, p * p * dShare],
    covariance,
    confidenceLevel,
  );
  const profitMaxPrice = unitCost === undefined ? null : optimum(unitCost);
  return {
    coefficients,
    logLikelihood: fit.logLikelihood,
    halfSharePrice,
    revenueMaxPrice,
    maxRevenueIndex,
    profitMaxPrice,
  };
}

/**
 * The logistic purchase curve as a fitted demand curve (share), with a band from a normal
 * interval on the logit scale, a + b·p ± z·SE, mapped through the logistic function.
 */
export function logisticPurchaseCurve(
  fit: BinomialLogitFit,
  covariance: number[][],
  observed: PriceRange,
  n: number,
): FittedDemandCurve {
  const { intercept: a, slope: b } = fit;
  const base = logisticShareDemand(a, b, { min: 0, max: Math.max(observed.max * 2, -a / b) });
  return {
    ...base,
    method: 'price-ladder logistic purchase curve',
    quantityKind: 'share',
    observedPriceRange: observed,
    n,
    quantityInterval: (price, level) => {
      const eta = a + b * price;
      const z = normalQuantile(1 - (1 - level) / 2);
      const se = Math.sqrt(quadraticForm(covariance, [1, price]));
      return { low: logistic(eta - z * se), high: logistic(eta + z * se) };
    },
  };
}
