import type { FitSpecOf } from '@shared/analysis/fit-spec';
import { buildDemandDesign } from '@shared/estimation/least-squares/demand-design';
import type { DemandFit } from '@shared/estimation/least-squares/demand-fit';
import { fitDemandModel } from '@shared/estimation/least-squares/fit-demand-model';
import { INTERCEPT_TERM } from '@shared/estimation/least-squares/weighted-design';
import type { AnalysisDataset } from '../analysis-dataset';
import type { RespondentWeights } from '../respondent-weights';
import { regressionTermLabel } from './coefficient-labels';
import { curveAtMeans } from './curve-at-means';
import { figure, rangeOf, type MethodFit } from './method-fit';
import { observedModelSpec } from './observed-model-spec';
import { optimalPriceFigures } from './optimal-price-figures';
import { weakInstrumentWarnings } from './weak-instrument';

/** Residuals beyond this many are not kept in the result (the plot would not show them anyway). */
const maxResiduals = 2000;

/**
 * Least squares (or two-stage least squares with the peer-price instrument) on observed prices
 * and quantities in the chosen form, with covariates, region effects, raking weights and the
 * chosen standard errors; the curve is drawn with covariates at their means.
 */
export function fitObserved(
  dataset: AnalysisDataset<'observed-prices'>,
  spec: FitSpecOf<'observed-prices'>,
  weights: RespondentWeights | null,
): MethodFit {
  const { rows } = dataset;
  const model = observedModelSpec(rows, spec, weights);
  const fit = fitDemandModel(model);
  const design = buildDemandDesign(model);
  const observed = rangeOf(model.price.values);
  const { curve, reason } = curveAtMeans(fit, design, model.weights, 'price', observed);
  const own = fit.elasticities.find((e) => e.kind === 'own-price');
  const prices = curve ? optimalPriceFigures(curve, spec.unitCost, spec.confidenceLevel) : [];
  return {
    n: new Set(rows.map((r) => r.interviewId)).size,
    observations: fit.n,
    coefficients: fit.coefficients.map(({ term, estimate, stdError, ciLow, ciHigh, pValue }) => ({
      term: regressionTermLabel(term, design.loggedColumns, design.fixedEffectBases),
      estimate,
      stdError,
      ciLow,
      ciHigh,
      pValue,
    })),
    fitStatistics: statistics(fit),
    elasticities: fit.elasticities,
    keyFigures: [...(own ? [figure('Own-price elasticity', 'elasticity', own)] : []), ...prices],
    tables: [],
    residuals: residuals(fit, design).slice(0, maxResiduals),
    curve,
    noCurveReason: reason,
    evidence: rows.map((r) => ({ points: [r.price] })),
    warnings: weakInstrumentWarnings(fit),
    assumptions: [
      ...fit.assumptions,
      'the demand curve holds covariates and region effects at their (weighted) sample means',
      spec.source === 'shelf'
        ? 'shelf observations: price per pack unit, quantity in pack units sold per 30 days'
        : 'purchase recall: price paid, units bought per 30 days; households that bought nothing have no price and are left out',
    ],
  };
}

function statistics(fit: DemandFit): MethodFit['fitStatistics'] {
  const stats = [
    { label: 'Observations', value: fit.n },
    { label: 'R²', value: fit.rSquared },
    { label: 'Adjusted R²', value: fit.adjustedRSquared },
    { label: 'Residual SD', value: fit.residualSD },
    { label: 'Degrees of freedom', value: fit.standardErrors.df },
  ];
  if (fit.fStatistic !== null) stats.push({ label: 'F statistic', value: fit.fStatistic });
  for (const stage of fit.firstStages ?? []) {
    if (stage.fStatistic !== null)
      stats.push({ label: `First-stage F (${stage.endogenous})`, value: stage.fStatistic });
  }
  return stats.filter((s) => Number.isFinite(s.value));
}

/** Fitted values and residuals on the model's scale (logs for the log forms). */
function residuals(fit: DemandFit, design: ReturnType<typeof buildDemandDesign>) {
  const columns = new Map(design.regressors.map((c) => [c.name, c.values]));
  return design.response.values.map((y, i) => {
    const fitted = fit.coefficients.reduce(
      (sum, row) =>
        sum + row.estimate * (row.term === INTERCEPT_TERM ? 1 : (columns.get(row.term)?.[i] ?? 0)),
      0,
    );
    return { fitted, residual: y - fitted };
  });
}
