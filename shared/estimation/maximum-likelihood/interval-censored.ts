import { EstimationError } from '../estimation-error';
import type { LatentDistribution } from './latent-distribution';
import { maximiseLogLikelihood, type LogLikelihoodPoint } from './newton-maximiser';

/** Willingness to pay known only to lie in (lower, upper]; ±Infinity for an open end. */
export interface WtpInterval {
  readonly lower: number;
  readonly upper: number;
  readonly weight?: number;
}

/**
 * Interval-censored model for WTP: G(b) = P(WTP ≤ b) = F(β·b − α), so with a symmetric F the
 * median (and the mean over the whole line) is α/β. For the logistic F this is the utility
 * difference model P(yes | B) = 1/(1 + e^−(α − βB)) (Hanemann 1984); for the normal F,
 * α = μ/σ and β = 1/σ.
 */
export interface IntervalCensoredFit {
  readonly alpha: number;
  readonly beta: number;
  readonly logLikelihood: number;
  /** Inverse information, order [alpha, beta]. */
  readonly covariance: number[][];
  readonly iterations: number;
}

/** The probability of each interval under (α, β). */
export function intervalProbabilities(
  [alpha, beta]: readonly number[],
  data: readonly WtpInterval[],
  dist: LatentDistribution,
): number[] {
  return data.map(({ lower, upper }) => {
    // For an open top, 1 − F(z) = F(−z) keeps precision in the upper tail.
    if (upper === Infinity) return lower === -Infinity ? 1 : dist.cdf(alpha - beta * lower);
    const upperPart = dist.cdf(beta * upper - alpha);
    return lower === -Infinity ? upperPart : upperPart - dist.cdf(beta * lower - alpha);
  });
}

/** Σ w·log P(interval) with its gradient and Hessian in (α, β). */
export function intervalLogLikelihood(
  params: readonly number[],
  data: readonly WtpInterval[],
  dist: LatentDistribution,
): LogLikelihoodPoint {
  const [alpha, beta] = params;
  const probabilities = intervalProbabilities(params, data, dist);
  let value = 0;
  const g = [0, 0];
  const h = [
    [0, 0],
    [0, 0],
  ];
  data.forEach(({ lower, upper, weight = 1 }, i) => {
    const p = probabilities[i];
    value += weight * Math.log(p);
    const { dp, d2p } = intervalDerivatives(lower, upper, alpha, beta, dist);
    for (let j = 0; j < 2; j++) {
      g[j] += (weight * dp[j]) / p;
      for (let k = 0; k < 2; k++) h[j][k] += weight * (d2p[j][k] / p - (dp[j] * dp[k]) / (p * p));
    }
  });
  return { value, gradient: g, hessian: h };
}

/** First and second derivatives of P(lower < WTP ≤ upper) = F(βu − α) − F(βl − α) in (α, β). */
function intervalDerivatives(
  lower: number,
  upper: number,
  alpha: number,
  beta: number,
  dist: LatentDistribution,
): { dp: number[]; d2p: number[][] } {
  const dp = [0, 0];
  const d2p = [
    [0, 0],
    [0, 0],
  ];
  const addEnd = (b: number, sign: number): void => {
    if (!Number.isFinite(b)) return;
    const z = beta * b - alpha;
    const dz = [-1, b];
    const f = dist.density(z);
    const fs = dist.densitySlope(z);
    for (let j = 0; j < 2; j++) {
      dp[j] += sign * f * dz[j];
      for (let k = 0; k < 2; k++) d2p[j][k] += sign * fs * dz[j] * dz[k];
    }
  };
  addEnd(upper, 1);
  addEnd(lower, -1);
  return { dp, d2p };
}

/**
 * Maximum likelihood for interval-censored WTP (single- and double-bounded dichotomous choice,
 * payment cards). Starts from the mean and spread of the finite interval ends.
 */
export function fitIntervalCensored(
  data: readonly WtpInterval[],
  dist: LatentDistribution,
  field: string,
): IntervalCensoredFit {
  const ends = data.flatMap(({ lower, upper }) => [lower, upper].filter(Number.isFinite));
  if (ends.length === 0) {
    throw new EstimationError(
      'too-few-observations',
      'no finite interval ends to estimate from',
      field,
    );
  }
  const mean = ends.reduce((s, v) => s + v, 0) / ends.length;
  const spread =
    Math.sqrt(ends.reduce((s, v) => s + (v - mean) ** 2, 0) / ends.length) || Math.abs(mean) || 1;
  const start = [mean / spread, 1 / spread];
  const fit = maximiseLogLikelihood((p) => intervalLogLikelihood(p, data, dist), start, field);
  const [alpha, beta] = fit.params;
  if (!(beta > 0)) {
    throw new EstimationError(
      'implausible-estimate',
      'acceptance does not fall as the amount rises (slope ≤ 0), so there is no WTP distribution',
      field,
    );
  }
  return {
    alpha,
    beta,
    logLikelihood: fit.logLikelihood,
    covariance: fit.inverseInformation,
    iterations: fit.iterations,
  };
}
