import type { FittedDemandCurve } from '../demand-schedule/fitted-demand-curve';
import { normalQuantile } from '../distributions/normal';
import { deltaMethod, type IntervalEstimate } from '../maximum-likelihood/delta-method';
import type { IntervalCensoredFit } from '../maximum-likelihood/interval-censored';
import type { LatentDistribution } from '../maximum-likelihood/latent-distribution';
import { softplus } from '../maximum-likelihood/binomial-logit';
import { quadraticForm } from '../maximum-likelihood/small-matrix';
import { formulaNumber, formulaTerm } from '../formula-number';

/** WTP figures of a fitted model P(WTP > b) = F(α − β·b). */
export interface WtpModelSummary {
  readonly coefficients: ({ term: 'alpha' | 'beta' } & IntervalEstimate)[];
  readonly logLikelihood: number;
  /** α/β; with a symmetric F also the mean over the whole real line. */
  readonly medianWtp: IntervalEstimate;
  readonly meanWtp: IntervalEstimate;
  /** Mean of max(WTP, 0): ∫₀^∞ P(WTP > b) db. */
  readonly meanWtpNonNegative: IntervalEstimate;
}

/** Median and means with delta-method intervals from (α, β) and their covariance. */
export function summariseWtpModel(
  fit: IntervalCensoredFit,
  dist: LatentDistribution,
  confidenceLevel: number,
): WtpModelSummary {
  const { alpha: a, beta: b, covariance: v } = fit;
  const median = deltaMethod(a / b, [1 / b, -a / (b * b)], v, confidenceLevel);
  // Logistic: ln(1 + e^α)/β (Hanemann 1989). Normal: (α·Φ(α) + φ(α))/β, i.e. μΦ(μ/σ) + σφ(μ/σ).
  const level = dist.name === 'logistic' ? softplus(a) : a * dist.cdf(a) + dist.density(a);
  // Both levels have derivative F(α) in α.
  const slope = dist.cdf(a);
  return {
    coefficients: [
      { term: 'alpha', ...deltaMethod(a, [1, 0], v, confidenceLevel) },
      { term: 'beta', ...deltaMethod(b, [0, 1], v, confidenceLevel) },
    ],
    logLikelihood: fit.logLikelihood,
    medianWtp: median,
    meanWtp: median,
    meanWtpNonNegative: deltaMethod(level / b, [slope / b, -level / (b * b)], v, confidenceLevel),
  };
}

/**
 * The fitted WTP model as a demand curve: share with WTP above the price, F(α − β·p), with a band
 * from a normal interval on the index α − β·p.
 */
export function wtpModelCurve(
  fit: IntervalCensoredFit,
  dist: LatentDistribution,
  method: string,
  observed: { min: number; max: number },
  n: number,
): FittedDemandCurve {
  const { alpha: a, beta: b, covariance: v } = fit;
  return {
    description: `share = F(${formulaNumber(a)} ${formulaTerm(-b)}·P), F the ${dist.name} distribution function`,
    method,
    quantityKind: 'share',
    quantity: (p) => dist.cdf(a - b * p),
    slope: (p) => -b * dist.density(a - b * p),
    priceRange: { min: 0, max: Math.max(observed.max * 2, (a + 6) / b) },
    observedPriceRange: observed,
    n,
    quantityInterval: (p, level) => {
      const z = normalQuantile(1 - (1 - level) / 2);
      const se = Math.sqrt(quadraticForm(v, [1, -p]));
      return { low: dist.cdf(a - b * p - z * se), high: dist.cdf(a - b * p + z * se) };
    },
  };
}
