import type { FitSpecOf } from '@shared/analysis/fit-spec';
import { analyseDichotomousChoice } from '@shared/estimation/willingness-to-pay/dichotomous-choice';
import { analysePaymentCard } from '@shared/estimation/willingness-to-pay/payment-card';
import type { WtpModelSummary } from '@shared/estimation/willingness-to-pay/wtp-model-summary';
import {
  fitIntervalCensored,
  type WtpInterval,
} from '@shared/estimation/maximum-likelihood/interval-censored';
import {
  logisticDistribution,
  normalDistribution,
} from '@shared/estimation/maximum-likelihood/latent-distribution';
import type { AnalysisDataset } from '../analysis-dataset';
import { respondentsOf } from '../analysis-dataset';
import { rowWeight, type RespondentWeights } from '../respondent-weights';
import { coefficientFrom, figure, type MethodFit } from './method-fit';
import { wtpTermLabels } from './coefficient-labels';

/** Payment cards by interval maximum likelihood (normal or logistic WTP). */
export function fitPaymentCard(
  dataset: AnalysisDataset<'payment-card'>,
  spec: FitSpecOf<'payment-card'>,
  weights: RespondentWeights | null,
): MethodFit {
  const intervals = dataset.rows.map((r) => ({
    lower: r.lower,
    upper: r.upper ?? Infinity,
    weight: rowWeight(weights, r),
  }));
  const result = withRespondents(
    analysePaymentCard(intervals, spec.distribution, spec.confidenceLevel),
    dataset.rows,
  );
  const dist = spec.distribution === 'normal' ? normalDistribution : logisticDistribution;
  const { covariance } = fitIntervalCensored(intervals, dist, 'lower');
  return wtpModelFit(result, covariance, {
    distribution: spec.distribution,
    method: 'payment card',
    evidence: dataset.rows.map((r) => ({
      points: r.upper === null ? [r.lower] : [r.lower, r.upper],
      count: r.count,
    })),
  });
}

/** Single- or double-bounded dichotomous choice by logit maximum likelihood. */
export function fitDichotomousChoice(
  dataset: AnalysisDataset<'dichotomous-choice'>,
  spec: FitSpecOf<'dichotomous-choice'>,
  weights: RespondentWeights | null,
): MethodFit {
  const format = dataset.bounds === 'double' ? 'double-bounded' : 'single-bounded';
  const answers = dataset.rows.map((r) => ({
    bid: r.bid,
    yes: r.yes,
    bid2: r.bid2 ?? undefined,
    yes2: r.yes2 ?? undefined,
    weight: rowWeight(weights, r),
  }));
  const result = withRespondents(
    analyseDichotomousChoice(answers, format, spec.confidenceLevel),
    dataset.rows,
  );
  const { covariance } = fitIntervalCensored(answers.map(bidInterval), logisticDistribution, 'bid');
  return wtpModelFit(result, covariance, {
    distribution: 'logistic',
    method: `${format} dichotomous choice`,
    evidence: dataset.rows.map((r) => ({
      points: r.bid2 === null ? [r.bid] : [r.bid, r.bid2],
      count: r.count,
    })),
  });
}

/**
 * The respondents behind the rows: the estimator counts rows, and a frequency table's row
 * stands for a cell of respondents (its weight already carries them into the likelihood).
 */
function withRespondents<R extends { n: number; curve: { n: number } }>(
  result: R,
  rows: readonly { count?: number }[],
): R {
  const n = rows.reduce((s, r) => s + respondentsOf(r), 0);
  return { ...result, n, curve: { ...result.curve, n } };
}

type WtpModelResult = WtpModelSummary & {
  curve: { observedPriceRange: { min: number; max: number } };
  assumptions: string[];
};

/**
 * The interval a bid answer places WTP in (Hanemann, Loomis & Kanninen 1991), as the engine's
 * dichotomous-choice analysis forms it; refitted here for the covariance the curve's band needs.
 */
function bidInterval(a: {
  bid: number;
  yes: boolean;
  bid2?: number;
  yes2?: boolean;
  weight: number;
}): WtpInterval {
  const { bid, bid2, weight } = a;
  if (bid2 === undefined || a.yes2 === undefined)
    return a.yes
      ? { lower: bid, upper: Infinity, weight }
      : { lower: -Infinity, upper: bid, weight };
  if (a.yes)
    return a.yes2 ? { lower: bid2, upper: Infinity, weight } : { lower: bid, upper: bid2, weight };
  return a.yes2 ? { lower: bid2, upper: bid, weight } : { lower: -Infinity, upper: bid2, weight };
}

function wtpModelFit(
  result: WtpModelResult & { n: number },
  covariance: number[][],
  options: { distribution: 'normal' | 'logistic'; method: string; evidence: MethodFit['evidence'] },
): MethodFit {
  const [alpha, beta] = result.coefficients;
  const { n } = result;
  return {
    n,
    observations: n,
    coefficients: result.coefficients.map((c) => coefficientFrom(wtpTermLabels[c.term], c)),
    fitStatistics: [
      { label: 'Respondents', value: n },
      { label: 'Log-likelihood', value: result.logLikelihood },
    ],
    elasticities: [],
    keyFigures: [
      figure('Median willingness to pay', 'price', result.medianWtp),
      figure('Mean willingness to pay (WTP ≥ 0)', 'price', result.meanWtpNonNegative),
    ],
    tables: [],
    residuals: [],
    curve: {
      kind: 'wtp-model',
      method: options.method,
      distribution: options.distribution,
      alpha: alpha.estimate,
      beta: beta.estimate,
      covariance,
      observedPriceRange: result.curve.observedPriceRange,
      n,
    },
    noCurveReason: null,
    evidence: options.evidence,
    warnings: [],
    assumptions: result.assumptions,
  };
}
