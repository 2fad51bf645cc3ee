import { fitBinomialLogit } from '../maximum-likelihood/binomial-logit';
import { EstimationError } from '../estimation-error';
import type { FittedDemandCurve } from '../demand-schedule/fitted-demand-curve';
import {
  defaultIntentCalibration,
  toPurchaseProbabilities,
  type IntentCalibration,
  type LadderAnswer,
  type LadderScale,
} from './ladder-answers';
import {
  arcSteps,
  priceOfMaximum,
  summariseSteps,
  type ArcStep,
  type LadderStep,
} from './ladder-steps';
import {
  logisticPurchaseCurve,
  summariseLogisticCurve,
  type LogisticPurchaseSummary,
} from './logistic-purchase-curve';
import { gridMaximumInterval, type GridMaximumInterval } from './grid-maximum-interval';
import { ladderStepIntervals, type LadderStepIntervals } from './ladder-step-intervals';
import { enforceMonotone, type MonotoneRule } from './monotone-answers';

export interface PriceLadderSpec {
  readonly answers: readonly LadderAnswer[];
  /** Default 'yes-no'. */
  readonly scale?: LadderScale;
  /** Purchase probability per intent level (intent-5 only); default `defaultIntentCalibration`. */
  readonly calibration?: IntentCalibration;
  /** Default 'carry-no-upward'. */
  readonly monotoneRule?: MonotoneRule;
  /** Unit cost for the profit index and the profit-maximising price. */
  readonly unitCost?: number;
  /** Default 0.95. */
  readonly confidenceLevel?: number;
}

export interface PriceLadderResult {
  /** Respondents. */
  readonly n: number;
  readonly answers: number;
  readonly nonMonotoneRespondents: number;
  readonly changedAnswers: number;
  readonly steps: LadderStep[];
  /** Ladder price with the largest revenue index (ties: lowest price). */
  readonly revenueMaxPrice: number;
  /** The ladder prices resampled surveys chose instead (respondent bootstrap). */
  readonly revenueMaxPriceInterval: GridMaximumInterval;
  readonly profitMaxPrice: number | null;
  readonly profitMaxPriceInterval: GridMaximumInterval | null;
  readonly arcElasticities: ArcStep[];
  /** Intervals of each step's share and arc elasticity (respondent bootstrap). */
  readonly stepIntervals: LadderStepIntervals;
  readonly logistic: LogisticPurchaseSummary;
  readonly curve: FittedDemandCurve;
  readonly warnings: string[];
  readonly assumptions: string[];
}

/**
 * Gabor–Granger price ladder: monotone answers per respondent, weighted purchase share, revenue and
 * profit index per price with their maximising prices, arc elasticities, and a logistic purchase
 * curve by maximum likelihood with its continuous revenue- and profit-maximising prices.
 */
export function analysePriceLadder(spec: PriceLadderSpec): PriceLadderResult {
  const scale = spec.scale ?? 'yes-no';
  const rule = spec.monotoneRule ?? 'carry-no-upward';
  const calibration = spec.calibration ?? defaultIntentCalibration;
  if (spec.unitCost !== undefined && !(spec.unitCost >= 0)) {
    throw new EstimationError('invalid-value', 'unit cost must be a number ≥ 0', 'unitCost');
  }
  const { answers, unitCost } = spec;
  const raw = toPurchaseProbabilities(answers, scale, calibration);
  const respondents = answers.map((a) => a.respondent);
  const prices = answers.map((a) => a.price);
  const weights = answers.map((a) => a.weight ?? 1);
  // A frequency table's cell stands for `count` respondents who answered alike.
  const tabulated = answers.some((a) => a.count !== undefined);
  const counts = tabulated ? answers.map((a) => a.count ?? 1) : undefined;
  const monotone = enforceMonotone(respondents, prices, raw, rule, counts);
  const steps = summariseSteps(prices, monotone.probabilities, weights, unitCost, counts);
  const data = {
    x: prices,
    y: monotone.probabilities,
    weights,
    clusters: respondents,
    clusterSizes: counts,
  };
  const fit = fitBinomialLogit(data, 'price');
  const n = fit.clusterCount;
  const logistic = summariseLogisticCurve(
    fit,
    fit.robustCovariance,
    spec.confidenceLevel ?? 0.95,
    unitCost,
  );
  const observed = { min: steps[0].price, max: steps[steps.length - 1].price };
  const level = spec.confidenceLevel ?? 0.95;
  const sample = { respondents, prices, probabilities: monotone.probabilities, weights, counts };
  return {
    n,
    answers: counts ? counts.reduce((sum, c) => sum + c, 0) : answers.length,
    nonMonotoneRespondents: monotone.nonMonotoneCount,
    changedAnswers: monotone.changedAnswers,
    steps,
    revenueMaxPrice: priceOfMaximum(steps, (s) => s.revenueIndex),
    revenueMaxPriceInterval: gridMaximumInterval(sample, (price, share) => price * share, level),
    profitMaxPrice:
      unitCost === undefined ? null : priceOfMaximum(steps, (s) => s.profitIndex ?? 0),
    profitMaxPriceInterval:
      unitCost === undefined
        ? null
        : gridMaximumInterval(sample, (price, share) => (price - unitCost) * share, level),
    arcElasticities: arcSteps(steps),
    stepIntervals: ladderStepIntervals(sample, level),
    logistic,
    curve: logisticPurchaseCurve(fit, fit.robustCovariance, observed, n),
    warnings: logistic.revenueMaxPrice
      ? []
      : ['the fitted purchase share does not fall with price: no revenue maximum'],
    assumptions: ladderAssumptions(scale === 'yes-no' ? null : calibration, rule, fit.clusterCount),
  };
}

function ladderAssumptions(
  calibration: IntentCalibration | null,
  rule: MonotoneRule,
  clusters: number,
): string[] {
  return [
    calibration
      ? `intent read as a purchase probability: ${calibrationText(calibration)}`
      : 'answers are yes/no purchase decisions',
    monotoneRuleText[rule],
    'grid maxima: ties go to the lowest price; their intervals, and those of the step shares and arc elasticities, from 1,000 respondent resamples (percentile bootstrap, seeded)',
    'arc elasticities by the midpoint formula',
    'logistic purchase curve by maximum likelihood (fractional logit when intent is calibrated)',
    `standard errors cluster-robust by respondent (${clusters} clusters, factor G/(G−1)); intervals normal (delta method)`,
  ];
}

/** The monotone rules in words a client can check against the questionnaire. */
const monotoneRuleText: Readonly<Record<MonotoneRule, string>> = {
  'carry-no-upward':
    'answers made consistent per respondent: a no at one price counts as a no at every higher price (a yes above a no is read as no)',
  'carry-yes-downward':
    'answers made consistent per respondent: a yes at one price counts as a yes at every lower price (a no below a yes is read as yes)',
  keep: 'answers used as given, even where a respondent would buy at a higher price but not at a lower one',
};

function calibrationText(calibration: IntentCalibration): string {
  const points = ([5, 4, 3, 2, 1] as const).map(
    (point) => `${point} → ${Math.round(calibration[point] * 100)} %`,
  );
  return `${points.join(', ')} (5 = most likely to buy)`;
}
