import type { FitSpecOf } from '@shared/analysis/fit-spec';
import {
  analysePriceThresholds,
  type PriceThresholdResult,
} from '@shared/estimation/price-thresholds/price-thresholds';
import {
  compactShare,
  resampledBandNote,
  resampledCurveCount,
} from '@shared/analysis/resampled-curves';
import { piecewiseShare } from '@shared/analysis/tabulated-share-curves';
import {
  DEFAULT_RESAMPLES,
  percentileIntervals,
} from '@shared/estimation/resampling/respondent-bootstrap';
import type { ThresholdAnswer } from '@shared/estimation/price-thresholds/threshold-answers';
import type { AnalysisDataset } from '../analysis-dataset';
import { rowWeight, type RespondentWeights } from '../respondent-weights';
import { resampleRespondents } from './resample-respondents';
import { rangeOf, type MethodFit } from './method-fit';

/**
 * Van Westendorp's four curves and price points; when every respondent answered the two
 * purchase-likelihood follow-ups, the Newton–Miller–Smith trial curve is the demand curve.
 */
export function fitThresholds(
  dataset: AnalysisDataset<'price-thresholds'>,
  spec: FitSpecOf<'price-thresholds'>,
  weights: RespondentWeights | null,
): MethodFit {
  const answers: ThresholdAnswer[] = dataset.rows.map((r) => ({
    tooCheap: r.tooCheap,
    cheap: r.cheap,
    expensive: r.expensive,
    tooExpensive: r.tooExpensive,
    weight: rowWeight(weights, r),
    likelihoodCheap: r.likelihoodCheap ?? undefined,
    likelihoodExpensive: r.likelihoodExpensive ?? undefined,
    ...(r.count === undefined ? {} : { count: r.count }),
  }));
  const withTrial =
    dataset.rows.length > 0 &&
    dataset.rows.every((r) => r.likelihoodCheap !== null && r.likelihoodExpensive !== null);
  const analyse = (sample: readonly ThresholdAnswer[]) =>
    analysePriceThresholds({ answers: sample, withTrialCurve: withTrial });
  const result = analyse(answers);
  // The price points are crossings of empirical curves and the trial curve is an average of
  // answers: their intervals and band come from resampling respondents and analysing again.
  const resamples = resampleRespondents(answers, analyse, DEFAULT_RESAMPLES);
  const intervals = percentileIntervals(
    resamples.map((r) => r && pricePoints(r)),
    pricePointKeys,
    spec.confidenceLevel,
  );
  const estimates = pricePoints(result);
  const keyFigures = pricePointKeys.flatMap((key) => {
    const estimate = estimates[key];
    if (estimate === null) return [];
    return [{ label: pricePointLabels[key], unit: 'price' as const, estimate, ...intervals[key] }];
  });
  const { curves, trial } = result;
  const resampledShares = trial ? resampledTrialShares(resamples, trial.prices) : undefined;
  const kept = dataset.rows.filter(
    (r) => r.tooCheap <= r.cheap && r.cheap <= r.expensive && r.expensive <= r.tooExpensive,
  );
  const observed = rangeOf(kept.flatMap((r) => [r.tooCheap, r.tooExpensive]));
  return {
    n: result.n,
    observations: result.n,
    coefficients: [],
    fitStatistics: [
      { label: 'Respondents', value: result.n },
      { label: 'Left out: thresholds out of order', value: result.outOfOrderRespondents },
    ],
    elasticities: [],
    keyFigures,
    tables: [
      {
        title: 'Price threshold curves',
        columns: ['Price', 'Too cheap', 'Cheap', 'Expensive', 'Too expensive'],
        columnUnits: ['price', 'share', 'share', 'share', 'share'],
        plot: 'lines',
        rows: curves.prices.map((p, i) => [
          p,
          curves.tooCheap[i],
          curves.cheap[i],
          curves.expensive[i],
          curves.tooExpensive[i],
        ]),
      },
    ],
    residuals: [],
    curve: trial
      ? {
          kind: 'piecewise-share',
          prices: trial.prices,
          shares: trial.trial,
          resampledShares,
          observedPriceRange: observed,
          n: result.n,
        }
      : null,
    noCurveReason: trial
      ? null
      : 'price thresholds give a demand curve only with the purchase-likelihood follow-ups, and not every respondent answered them',
    evidence: kept.map((r) => ({
      range: { low: r.tooCheap, high: r.tooExpensive },
      count: r.count,
    })),
    warnings: result.warnings,
    assumptions: [
      ...result.assumptions,
      ...(trial
        ? [
            'trial curve: mean calibrated purchase likelihood, 5 → 0.7, 4 → 0.5, 3 → 0.3, 2 → 0.1, 1 → 0 (common practice)',
          ]
        : []),
      ...(resampledShares ? [resampledBandNote(resampledShares.length)] : []),
    ],
  };
}

/**
 * Each resample's trial curve read at the full sample's knots (its own knots differ), for as
 * many resamples as the budget allows; none when a resample has no trial curve.
 */
function resampledTrialShares(
  resamples: readonly (PriceThresholdResult | null)[],
  knots: readonly number[],
): number[][] | undefined {
  const count = resampledCurveCount(knots.length);
  const kept = resamples.slice(0, count);
  if (count === 0 || kept.some((r) => !r?.trial)) return undefined;
  return kept.map((r) => {
    const { prices, trial } = r!.trial!;
    return knots.map((p) => compactShare(piecewiseShare(prices, trial, p)));
  });
}

const pricePointLabels = {
  marginalCheapness: 'Point of marginal cheapness',
  optimal: 'Optimal price point',
  indifference: 'Indifference price point',
  marginalExpensiveness: 'Point of marginal expensiveness',
  highestTrial: 'Price of the highest trial (Newton–Miller–Smith)',
  trialRevenueMax: 'Revenue-maximising price (trial × price)',
} as const;
type PricePoint = keyof typeof pricePointLabels;
const pricePointKeys = Object.keys(pricePointLabels) as PricePoint[];

/** The analysis's price points by name; null where the curves do not give one. */
function pricePoints(result: PriceThresholdResult): Record<PricePoint, number | null> {
  return {
    marginalCheapness: result.marginalCheapnessPrice?.price ?? null,
    optimal: result.optimalPrice?.price ?? null,
    indifference: result.indifferencePrice?.price ?? null,
    marginalExpensiveness: result.marginalExpensivenessPrice?.price ?? null,
    highestTrial: result.trial?.maxTrial.price ?? null,
    trialRevenueMax: result.trial?.maxRevenue.price ?? null,
  };
}
