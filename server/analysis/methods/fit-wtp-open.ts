import type { FitSpecOf } from '@shared/analysis/fit-spec';
import {
  compactShare,
  resampledBandNote,
  resampledCurveCount,
} from '@shared/analysis/resampled-curves';

import { analyseOpenEndedWtp } from '@shared/estimation/willingness-to-pay/open-ended-wtp';
import type { AnalysisDataset } from '../analysis-dataset';
import { respondentsOf } from '../analysis-dataset';
import { rowWeight, type RespondentWeights } from '../respondent-weights';
import { resampleRespondents } from './resample-respondents';
import { figure, type MethodFit } from './method-fit';

/** Open WTP: the empirical demand curve and mean and median WTP with a seeded bootstrap. */
export function fitWtpOpen(
  dataset: AnalysisDataset<'wtp-open'>,
  spec: FitSpecOf<'wtp-open'>,
  weights: RespondentWeights | null,
): MethodFit {
  const wtp = dataset.rows.map((r) => r.amount);
  const tabulated = dataset.rows.some((r) => r.count !== undefined);
  const result = analyseOpenEndedWtp({
    wtp,
    weights: dataset.rows.map((r) => rowWeight(weights, r)),
    counts: tabulated ? dataset.rows.map(respondentsOf) : undefined,
    confidenceLevel: spec.confidenceLevel,
    replicates: spec.bootstrap.replicates,
    seed: spec.bootstrap.seed,
  });
  const resampledShares = resampledStepShares(
    dataset.rows.map((r) => ({ amount: r.amount, weight: rowWeight(weights, r), count: r.count })),
    result.demandCurve.map((p) => p.price),
  );
  return {
    n: result.n,
    observations: result.n,
    coefficients: [],
    fitStatistics: [{ label: 'Respondents', value: result.n }],
    elasticities: [],
    keyFigures: [
      figure('Mean willingness to pay', 'price', result.meanWtp),
      figure('Median willingness to pay', 'price', result.medianWtp),
    ],
    tables: [
      {
        title: 'Share willing to pay at least each amount',
        columns: ['Amount', 'Share'],
        columnUnits: ['price', 'share'],
        rows: result.demandCurve.map((p) => [p.price, p.share]),
      },
    ],
    residuals: [],
    curve: {
      kind: 'step-share',
      points: result.demandCurve,
      resampledShares,
      observedPriceRange: result.curve.observedPriceRange,
      n: result.n,
    },
    noCurveReason: null,
    evidence: dataset.rows.map((r) => ({ points: [r.amount], count: r.count })),
    warnings: [],
    assumptions: [
      ...result.assumptions,
      ...(resampledShares ? [resampledBandNote(resampledShares.length)] : []),
    ],
  };
}

interface StatedAmount {
  amount: number;
  weight: number;
  count?: number;
}

/**
 * The share with WTP at or above each of the full sample's amounts in respondent resamples (for
 * the curve's band), as many as the budget allows for that many amounts.
 */
function resampledStepShares(
  stated: readonly StatedAmount[],
  amounts: readonly number[],
): number[][] | undefined {
  const count = resampledCurveCount(amounts.length);
  if (count === 0) return undefined;
  const resamples = resampleRespondents(stated, (s) => sharesAtOrAbove(s, amounts), count);
  return resamples.every((r) => r !== null) ? resamples : undefined;
}

/** Weighted share with an amount at or above each price (prices ascending), in one sweep. */
function sharesAtOrAbove(sample: readonly StatedAmount[], prices: readonly number[]): number[] {
  const sorted = [...sample].sort((a, b) => a.amount - b.amount);
  const total = sorted.reduce((sum, s) => sum + s.weight, 0);
  let below = 0;
  let next = 0;
  return prices.map((price) => {
    while (next < sorted.length && sorted[next].amount < price) below += sorted[next++].weight;
    return compactShare((total - below) / total);
  });
}
