import type { FitSpecOf } from '@shared/analysis/fit-spec';
import { analyseOpenEndedWtp } from '@shared/estimation/willingness-to-pay/open-ended-wtp';
import type { AnalysisDataset } from '../analysis-dataset';
import { weightOf, type RespondentWeights } from '../respondent-weights';
import { figure, type MethodFit } from './method-fit';

/** Open WTP: the empirical demand curve and mean and median WTP with a seeded bootstrap. */
export function fitWtpOpen(
  dataset: AnalysisDataset<'wtp-open'>,
  spec: FitSpecOf<'wtp-open'>,
  weights: RespondentWeights | null,
): MethodFit {
  const wtp = dataset.rows.map((r) => r.amount);
  const result = analyseOpenEndedWtp({
    wtp,
    weights: dataset.rows.map((r) => weightOf(weights, r.interviewId)),
    confidenceLevel: spec.confidenceLevel,
    replicates: spec.bootstrap.replicates,
    seed: spec.bootstrap.seed,
  });
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
        rows: result.demandCurve.map((p) => [p.price, p.share]),
      },
    ],
    residuals: [],
    curve: {
      kind: 'step-share',
      points: result.demandCurve,
      observedPriceRange: result.curve.observedPriceRange,
      n: result.n,
    },
    noCurveReason: null,
    evidence: dataset.rows.map((r) => ({ points: [r.amount] })),
    warnings: [],
    assumptions: result.assumptions,
  };
}
