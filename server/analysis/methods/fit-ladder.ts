import type { FitSpecOf } from '@shared/analysis/fit-spec';
import { EstimationError } from '@shared/estimation/estimation-error';
import { fitBinomialLogit } from '@shared/estimation/maximum-likelihood/binomial-logit';
import {
  defaultIntentCalibration,
  toPurchaseProbabilities,
  type LadderAnswer,
} from '@shared/estimation/price-ladder/ladder-answers';
import { enforceMonotone } from '@shared/estimation/price-ladder/monotone-answers';
import { analysePriceLadder } from '@shared/estimation/price-ladder/price-ladder';
import type { AnalysisDataset } from '../analysis-dataset';
import { rowWeight, type RespondentWeights } from '../respondent-weights';
import { coefficientFrom, figure, type MethodFit } from './method-fit';
import { regressionTermLabel } from './coefficient-labels';

/**
 * Gabor–Granger: the engine's ladder analysis (monotone answers, weighted shares, logistic
 * purchase curve with respondent-clustered errors). The curve's covariance is that of the same
 * logit on the same monotone answers, refitted here because the analysis keeps it inside.
 */
export function fitLadder(
  dataset: AnalysisDataset<'price-ladder'>,
  spec: FitSpecOf<'price-ladder'>,
  weights: RespondentWeights | null,
): MethodFit {
  const scales = new Set(dataset.rows.map((r) => r.scale));
  if (scales.size > 1) {
    throw new EstimationError(
      'invalid-value',
      'the ladders mix yes/no and intent scales; choose one block',
      'blockId',
    );
  }
  const scale = dataset.rows[0]?.scale ?? 'yes-no';
  const answers: LadderAnswer[] = dataset.rows.flatMap((row) =>
    row.steps.map((s) => ({
      respondent: row.interviewId,
      price: s.price,
      buy: s.buy,
      weight: rowWeight(weights, row),
      ...(row.count === undefined ? {} : { count: row.count }),
    })),
  );
  const result = analysePriceLadder({
    answers,
    scale,
    unitCost: spec.unitCost ?? undefined,
    confidenceLevel: spec.confidenceLevel,
  });
  const logit = refitLogit(answers, scale);
  const level = `${Math.round(spec.confidenceLevel * 1000) / 10} %`;
  const { logistic } = result;
  const optional = (
    label: string,
    value: typeof logistic.revenueMaxPrice,
    unit: 'price' | 'index',
  ) => (value ? [figure(label, unit, value)] : []);
  return {
    n: result.n,
    observations: result.answers,
    coefficients: logistic.coefficients.map((c) =>
      coefficientFrom(regressionTermLabel(c.term, []), c),
    ),
    fitStatistics: [
      { label: 'Respondents', value: result.n },
      { label: 'Answers', value: result.answers },
      { label: 'Log-likelihood', value: logistic.logLikelihood },
      { label: 'Respondents with non-monotone answers', value: result.nonMonotoneRespondents },
    ],
    elasticities: [],
    keyFigures: [
      figure('Price at which half would buy', 'price', logistic.halfSharePrice),
      ...optional('Revenue-maximising price (logistic curve)', logistic.revenueMaxPrice, 'price'),
      ...optional('Revenue index at that price', logistic.maxRevenueIndex, 'index'),
      ...optional(
        `Profit-maximising price at unit cost ${spec.unitCost}`,
        logistic.profitMaxPrice,
        'price',
      ),
      {
        label: 'Revenue-maximising ladder price',
        unit: 'price' as const,
        estimate: result.revenueMaxPrice,
        ciLow: result.revenueMaxPriceInterval.ciLow,
        ciHigh: result.revenueMaxPriceInterval.ciHigh,
      },
    ],
    tables: [
      {
        title: 'Ladder steps',
        columns: [
          'Price',
          'Respondents',
          'Purchase share',
          `${level} interval from`,
          'to',
          'Revenue index',
        ],
        columnUnits: ['price', 'count', 'share', 'share', 'share', 'index'],
        rows: result.steps.map((s, j) => {
          const { ciLow, ciHigh } = result.stepIntervals.shares[j];
          return [s.price, s.respondents, s.share, ciLow, ciHigh, s.revenueIndex];
        }),
      },
      {
        title: 'Arc elasticities between ladder prices',
        columns: ['From price', 'To price', 'Arc elasticity', `${level} interval from`, 'to'],
        columnUnits: ['price', 'price', 'elasticity', 'elasticity', 'elasticity'],
        rows: result.arcElasticities.map((a, j) => {
          const { ciLow, ciHigh } = result.stepIntervals.arcElasticities[j];
          return [a.fromPrice, a.toPrice, a.elasticity, ciLow, ciHigh];
        }),
      },
    ],
    residuals: [],
    curve: {
      kind: 'logistic-share',
      intercept: logit.intercept,
      slope: logit.slope,
      covariance: logit.robustCovariance,
      observedPriceRange: result.curve.observedPriceRange,
      n: result.n,
    },
    noCurveReason: null,
    evidence: dataset.rows.map((row) => ({
      points: row.steps.map((s) => s.price),
      count: row.count,
    })),
    warnings: result.warnings,
    assumptions: result.assumptions,
  };
}

/** The logit the ladder analysis fits, with its cluster-robust covariance. */
function refitLogit(answers: readonly LadderAnswer[], scale: 'yes-no' | 'intent-5') {
  const raw = toPurchaseProbabilities(answers, scale, defaultIntentCalibration);
  const respondents = answers.map((a) => a.respondent);
  const prices = answers.map((a) => a.price);
  const monotone = enforceMonotone(respondents, prices, raw, 'carry-no-upward');
  const tabulated = answers.some((a) => a.count !== undefined);
  return fitBinomialLogit(
    {
      x: prices,
      y: monotone.probabilities,
      weights: answers.map((a) => a.weight ?? 1),
      clusters: respondents,
      clusterSizes: tabulated ? answers.map((a) => a.count ?? 1) : undefined,
    },
    'price',
  );
}
