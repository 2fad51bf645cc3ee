import type { FittedDemandCurve } from '../demand-schedule/fitted-demand-curve';
import { EstimationError } from '../estimation-error';
import {
  frequencyPercentileBootstrap,
  percentileBootstrap,
  type BootstrapInterval,
  type BootstrapOptions,
} from './bootstrap';
import { weightedMean, weightedMedian } from './weighted-quantiles';
import { largest, smallest } from '../numerics/extent';

export interface OpenEndedWtpSpec extends BootstrapOptions {
  /** Stated maximum willingness to pay, one per respondent, ≥ 0. */
  readonly wtp: readonly number[];
  readonly weights?: readonly number[];
  /**
   * Respondents behind each amount (a frequency table of stated amounts; default 1 each); the
   * weight of an entry is then the total weight of its respondents.
   */
  readonly counts?: readonly number[];
  /** Default 0.95. */
  readonly confidenceLevel?: number;
}

export interface WtpStatistic {
  readonly estimate: number;
  readonly stdError: number;
  readonly ciLow: number;
  readonly ciHigh: number;
}

export interface OpenEndedWtpResult {
  readonly n: number;
  readonly meanWtp: WtpStatistic;
  readonly medianWtp: WtpStatistic;
  /** Share with WTP at or above each distinct stated amount. */
  readonly demandCurve: { price: number; share: number }[];
  readonly curve: FittedDemandCurve;
  readonly assumptions: string[];
}

/**
 * Open-ended willingness to pay: the empirical demand curve (weighted share with WTP ≥ price),
 * mean and median with percentile-bootstrap intervals from a seeded generator.
 */
export function analyseOpenEndedWtp(spec: OpenEndedWtpSpec): OpenEndedWtpResult {
  const { wtp } = spec;
  const weights = spec.weights ?? wtp.map(() => 1);
  validate(wtp, weights, spec.counts);
  const level = spec.confidenceLevel ?? 0.95;
  const boot = (statistic: typeof weightedMean) =>
    spec.counts
      ? frequencyPercentileBootstrap(wtp, weights, spec.counts, statistic, level, spec)
      : percentileBootstrap(wtp, weights, statistic, level, spec);
  const meanBoot = boot(weightedMean);
  const medianBoot = boot(weightedMedian);
  const strip = ({ stdError, ciLow, ciHigh }: BootstrapInterval) => ({ stdError, ciLow, ciHigh });
  const n = spec.counts ? spec.counts.reduce((s, c) => s + c, 0) : wtp.length;
  const curve = { ...empiricalWtpCurve(wtp, weights), n };
  const prices = [...new Set(wtp)].sort((a, b) => a - b);
  return {
    n,
    meanWtp: { estimate: weightedMean(wtp, weights), ...strip(meanBoot) },
    medianWtp: { estimate: weightedMedian(wtp, weights), ...strip(medianBoot) },
    demandCurve: prices.map((price) => ({ price, share: curve.quantity(price) })),
    curve,
    assumptions: [
      'each stated amount is the respondent’s maximum willingness to pay',
      'demand at a price = weighted share with WTP at or above it',
      'median: midpoint of the two middle amounts when the cumulative weight is exactly half',
      spec.counts
        ? `percentile bootstrap, ${meanBoot.replicates} resamples of respondents drawn as multinomial counts over the table of stated amounts, seed ${meanBoot.seed}`
        : `percentile bootstrap, ${meanBoot.replicates} resamples of respondents, mulberry32 seed ${meanBoot.seed}`,
    ],
  };
}

/** The empirical (step) demand curve of stated WTP amounts. */
export function empiricalWtpCurve(
  wtp: readonly number[],
  weights: readonly number[],
): FittedDemandCurve {
  const total = weights.reduce((s, w) => s + w, 0);
  const max = largest(wtp);
  return {
    description: 'share with stated WTP at or above the price',
    method: 'open-ended willingness to pay',
    quantityKind: 'share',
    quantity: (price) => wtp.reduce((s, v, i) => s + (v >= price ? weights[i] : 0), 0) / total,
    priceRange: { min: 0, max },
    observedPriceRange: { min: smallest(wtp), max },
    n: wtp.length,
    discrete: true,
    steps: [...new Set(wtp)].sort((a, b) => a - b),
  };
}

function validate(
  wtp: readonly number[],
  weights: readonly number[],
  counts: readonly number[] | undefined,
): void {
  if ((counts ? counts.reduce((s, c) => s + c, 0) : wtp.length) < 2) {
    throw new EstimationError('too-few-observations', 'need at least two WTP answers', 'wtp');
  }
  if (weights.length !== wtp.length) {
    throw new EstimationError(
      'length-mismatch',
      `${wtp.length} WTP answers but ${weights.length} weights`,
      'weight',
    );
  }
  wtp.forEach((v, i) => {
    if (!(Number.isFinite(v) && v >= 0)) {
      throw new EstimationError('invalid-value', `WTP answer ${i + 1} must be a number ≥ 0`, 'wtp');
    }
    if (!(Number.isFinite(weights[i]) && weights[i] > 0)) {
      throw new EstimationError('invalid-value', `weight ${i + 1} must be a number > 0`, 'weight');
    }
  });
}
