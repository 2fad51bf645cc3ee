import type { FittedDemandCurve } from '../demand-schedule/fitted-demand-curve';
import { EstimationError } from '../estimation-error';
import { fitIntervalCensored, type WtpInterval } from '../maximum-likelihood/interval-censored';
import {
  logisticDistribution,
  normalDistribution,
} from '../maximum-likelihood/latent-distribution';
import { summariseWtpModel, wtpModelCurve, type WtpModelSummary } from './wtp-model-summary';
import { extent } from '../numerics/extent';

/** A payment-card choice: WTP in [lower, upper); upper = Infinity for the open top interval. */
export interface CardInterval {
  readonly lower: number;
  readonly upper: number;
  readonly weight?: number;
}

export interface PaymentCardResult extends WtpModelSummary {
  readonly n: number;
  readonly distribution: 'normal' | 'logistic';
  /** For the normal model: μ = α/β and σ = 1/β. */
  readonly sigma: number;
  readonly curve: FittedDemandCurve;
  readonly assumptions: string[];
}

/**
 * Payment-card (interval) data by maximum likelihood (Cameron & Huppert 1989): WTP ~ N(μ, σ²) by
 * default, or logistic; each respondent contributes P(lower ≤ WTP < upper).
 */
export function analysePaymentCard(
  intervals: readonly CardInterval[],
  distribution: 'normal' | 'logistic' = 'normal',
  confidenceLevel = 0.95,
): PaymentCardResult {
  if (intervals.length === 0)
    throw new EstimationError('too-few-observations', 'there are no card answers', 'lower');
  const data: WtpInterval[] = intervals.map((c, i) => {
    if (!Number.isFinite(c.lower))
      throw new EstimationError(
        'invalid-value',
        `answer ${i + 1}: lower must be a number`,
        'lower',
      );
    if (!(c.upper > c.lower) || Number.isNaN(c.upper)) {
      throw new EstimationError(
        'invalid-value',
        `answer ${i + 1}: upper must exceed lower (or be open)`,
        'upper',
      );
    }
    if (c.weight !== undefined && !(Number.isFinite(c.weight) && c.weight > 0)) {
      throw new EstimationError(
        'invalid-value',
        `answer ${i + 1}: weight must be a number > 0`,
        'weight',
      );
    }
    return { lower: c.lower, upper: c.upper, weight: c.weight ?? 1 };
  });
  if (new Set(data.map((d) => `${d.lower}:${d.upper}`)).size < 2) {
    throw new EstimationError(
      'too-few-levels',
      'every answer is the same interval: the spread is not identified',
      'lower',
    );
  }
  const dist = distribution === 'normal' ? normalDistribution : logisticDistribution;
  const fit = fitIntervalCensored(data, dist, 'lower');
  const ends = data.flatMap((d) => [d.lower, d.upper]).filter(Number.isFinite);
  return {
    n: data.length,
    distribution,
    ...summariseWtpModel(fit, dist, confidenceLevel),
    sigma: 1 / fit.beta,
    curve: wtpModelCurve(fit, dist, 'payment card', extent(ends), data.length),
    assumptions: [
      `WTP has a ${distribution} distribution on the whole real line; a stated lower bound of 0 is taken literally`,
      'each answer means lower ≤ WTP < upper; the top interval is open',
      'median = mean over the real line = α/β (μ); mean of max(WTP, 0) = μΦ(μ/σ) + σφ(μ/σ), the mean shown with WTP ≥ 0',
      'intervals by the delta method from the inverse information',
    ],
  };
}
