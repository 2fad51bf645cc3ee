import { analysisMethodLabels } from '@shared/analysis/analysis-method';
import { fitResultSchema, type FitResult } from '@shared/analysis/fit-result';
import type { FitSpec } from '@shared/analysis/fit-spec';
import { fittedCurveFrom } from '@shared/analysis/fitted-curve';
import { EstimationError } from '@shared/estimation/estimation-error';
import { minorUnitDigits } from '@shared/money/minor-unit-digits';
import type { AnalysisDataset } from './analysis-dataset';
import type { AnalysisInterview } from './analysis-interview';
import { buildDataset } from './build-dataset';
import { dataHash } from './data-hash';
import { datasetTable } from './dataset-table';
import { fitSchedule } from './fit-schedule';
import { fitLadder } from './methods/fit-ladder';
import { fitObserved } from './methods/fit-observed';
import { fitThresholds } from './methods/fit-thresholds';
import { fitWtpOpen } from './methods/fit-wtp-open';
import { fitDichotomousChoice, fitPaymentCard } from './methods/fit-wtp-models';
import type { MethodFit } from './methods/method-fit';
import { respondentWeights, type RespondentWeights } from './respondent-weights';

/** The interviews a fit's filters matched, and the study's currency. */
export interface FitInput {
  readonly interviews: readonly AnalysisInterview[];
  readonly currency: string;
}

/** The data of a fit, ready to estimate: rows, their hash, and the raking weights. */
export interface PreparedFit {
  readonly dataset: AnalysisDataset;
  readonly dataHash: string;
  readonly weights: RespondentWeights | null;
  readonly currency: string;
}

/** Builds the method's rows, hashes exactly what is used, and rakes when the spec asks. */
export function prepareFit(input: FitInput, spec: FitSpec): PreparedFit {
  const dataset = buildDataset(input.interviews, spec, minorUnitDigits(input.currency));
  if (dataset.rows.length === 0) {
    const why = dataset.skipped.map((s) => `${s.count}: ${s.reason}`).join('; ');
    throw new EstimationError(
      'too-few-observations',
      `none of the ${dataset.interviewsMatched} interviews the filters match has answers for this method` +
        (why ? ` (${why})` : ''),
      'filters',
    );
  }
  const hash = dataHash(spec.method, datasetTable(dataset, spec));
  return {
    dataset,
    dataHash: hash,
    weights: respondentWeights(dataset, spec.weighting),
    currency: input.currency,
  };
}

/** Runs the method's estimator and tabulates the schedule on the spec's grid. */
export function estimateFit(prepared: PreparedFit, spec: FitSpec): FitResult {
  const { dataset, weights } = prepared;
  const fit = runMethod(dataset, spec, weights);
  if (fit.curve?.kind === 'loglog' && spec.priceGrid.from === 0) {
    throw new EstimationError(
      'non-positive-log',
      'a log-log demand curve has no quantity at price 0; start the price grid above 0',
      'priceGrid.from',
    );
  }
  const outcome = fit.curve
    ? fitSchedule(
        fittedCurveFrom(fit.curve),
        spec.priceGrid,
        spec.confidenceLevel,
        fit.evidence,
        dataset.designLevels,
        prepared.currency,
      )
    : null;
  return fitResultSchema.parse({
    method: spec.method,
    methodLabel: analysisMethodLabels[spec.method],
    blockIds: [...dataset.blockIds],
    currency: prepared.currency,
    n: fit.n,
    observations: fit.observations,
    dataHash: prepared.dataHash,
    interviewsMatched: dataset.interviewsMatched,
    skipped: [...dataset.skipped],
    weighting: weights?.summary ?? null,
    coefficients: fit.coefficients,
    fitStatistics: fit.fitStatistics,
    elasticities: fit.elasticities,
    keyFigures: fit.keyFigures,
    tables: fit.tables,
    residuals: fit.residuals,
    curve: fit.curve,
    schedule: outcome?.schedule ?? null,
    noScheduleReason: fit.noCurveReason,
    warnings: [...fit.warnings, ...(outcome?.warnings ?? [])],
    assumptions: [
      ...fit.assumptions,
      ...(weights
        ? [`raked to margins of ${weights.summary.variables.join(', ')}; weights sum to n`]
        : []),
    ],
  } satisfies FitResult);
}

/** Both steps at once: what a worker runs, and what tests compare its stored result with. */
export function runFit(input: FitInput, spec: FitSpec): FitResult {
  return estimateFit(prepareFit(input, spec), spec);
}

function runMethod(
  dataset: AnalysisDataset,
  spec: FitSpec,
  weights: RespondentWeights | null,
): MethodFit {
  const as = <M extends FitSpec['method']>(_m: M) => dataset as AnalysisDataset<M>;
  switch (spec.method) {
    case 'observed-prices':
      return fitObserved(as('observed-prices'), spec, weights);
    case 'price-ladder':
      return fitLadder(as('price-ladder'), spec, weights);
    case 'price-thresholds':
      return fitThresholds(as('price-thresholds'), spec, weights);
    case 'wtp-open':
      return fitWtpOpen(as('wtp-open'), spec, weights);
    case 'payment-card':
      return fitPaymentCard(as('payment-card'), spec, weights);
    case 'dichotomous-choice':
      return fitDichotomousChoice(as('dichotomous-choice'), spec, weights);
  }
}
