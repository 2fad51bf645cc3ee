import type { FittedDemandCurve } from '../demand-schedule/fitted-demand-curve';
import { EstimationError } from '../estimation-error';
import { fitIntervalCensored, type WtpInterval } from '../maximum-likelihood/interval-censored';
import { logisticDistribution } from '../maximum-likelihood/latent-distribution';
import { assertLogitOverlap } from '../maximum-likelihood/logit-overlap';
import { summariseWtpModel, wtpModelCurve, type WtpModelSummary } from './wtp-model-summary';
import { largest, smallest } from '../numerics/extent';

/** One dichotomous-choice answer: yes/no at a bid, and for double-bounded data a follow-up. */
export interface BidAnswer {
  readonly bid: number;
  readonly yes: boolean;
  /** Follow-up bid: higher than `bid` after a yes, lower after a no (double-bounded only). */
  readonly bid2?: number;
  readonly yes2?: boolean;
  readonly weight?: number;
}

export interface DichotomousChoiceResult extends WtpModelSummary {
  readonly n: number;
  readonly format: 'single-bounded' | 'double-bounded';
  readonly curve: FittedDemandCurve;
  readonly assumptions: string[];
}

/**
 * Dichotomous-choice contingent valuation by maximum likelihood with a linear-logit utility
 * difference, P(yes | B) = 1/(1 + e^−(α − βB)) (Hanemann 1984); double-bounded answers enter as
 * intervals (Hanemann, Loomis & Kanninen 1991). Median WTP = α/β.
 */
export function analyseDichotomousChoice(
  answers: readonly BidAnswer[],
  format: 'single-bounded' | 'double-bounded',
  confidenceLevel = 0.95,
): DichotomousChoiceResult {
  const intervals = answers.map((a, i) => toInterval(a, i, format));
  const bids = answers.map((a) => a.bid);
  if (new Set(bids).size < 2) {
    throw new EstimationError('too-few-levels', 'need at least two different bids', 'bid');
  }
  if (format === 'single-bounded') {
    const w = answers.map((a) => a.weight ?? 1);
    assertLogitOverlap(
      bids,
      answers.map((a, i) => (a.yes ? w[i] : 0)),
      answers.map((a, i) => (a.yes ? 0 : w[i])),
      'bid',
    );
  } else {
    assertTwoSided(intervals);
  }
  const fit = fitIntervalCensored(intervals, logisticDistribution, 'bid');
  const allBids = answers.flatMap((a) => (a.bid2 === undefined ? [a.bid] : [a.bid, a.bid2]));
  return {
    n: answers.length,
    format,
    ...summariseWtpModel(fit, logisticDistribution, confidenceLevel),
    curve: wtpModelCurve(
      fit,
      logisticDistribution,
      `${format} dichotomous choice`,
      {
        min: smallest(allBids),
        max: largest(allBids),
      },
      answers.length,
    ),
    assumptions: [
      'WTP has a logistic distribution on the whole real line: P(yes | B) = 1/(1 + exp(−(α − βB)))',
      'median = mean over the real line = α/β; mean of max(WTP, 0) = ln(1 + e^α)/β',
      'intervals by the delta method from the inverse information (normal)',
      ...(format === 'double-bounded'
        ? ['follow-up answers come from the same WTP as the first']
        : []),
    ],
  };
}

function toInterval(a: BidAnswer, i: number, format: string): WtpInterval {
  const where = `answer ${i + 1}`;
  if (!(Number.isFinite(a.bid) && a.bid >= 0)) {
    throw new EstimationError('invalid-value', `${where}: bid must be a number ≥ 0`, 'bid');
  }
  if (a.weight !== undefined && !(Number.isFinite(a.weight) && a.weight > 0)) {
    throw new EstimationError('invalid-value', `${where}: weight must be a number > 0`, 'weight');
  }
  const weight = a.weight ?? 1;
  if (format === 'single-bounded') {
    return a.yes
      ? { lower: a.bid, upper: Infinity, weight }
      : { lower: -Infinity, upper: a.bid, weight };
  }
  const bid2 = a.bid2 ?? NaN;
  if (!Number.isFinite(bid2) || a.yes2 === undefined) {
    throw new EstimationError(
      'invalid-value',
      `${where}: the follow-up bid and answer are missing`,
      'bid2',
    );
  }
  if (a.yes ? bid2 <= a.bid : bid2 >= a.bid) {
    throw new EstimationError(
      'invalid-value',
      `${where}: the follow-up bid must be ${a.yes ? 'above' : 'below'} the first after a ${a.yes ? 'yes' : 'no'}`,
      'bid2',
    );
  }
  if (a.yes)
    return a.yes2
      ? { lower: bid2, upper: Infinity, weight }
      : { lower: a.bid, upper: bid2, weight };
  return a.yes2 ? { lower: bid2, upper: a.bid, weight } : { lower: -Infinity, upper: bid2, weight };
}

/** With every interval open at the same end the likelihood has no maximum. */
function assertTwoSided(intervals: readonly WtpInterval[]): void {
  if (
    intervals.every((i) => i.upper === Infinity) ||
    intervals.every((i) => i.lower === -Infinity)
  ) {
    throw new EstimationError(
      'no-finite-estimate',
      'every answer is yes (or every answer no): WTP has no finite estimate',
      'yes',
    );
  }
}
