import { EstimationError } from '../estimation-error';
import { coefficientCovariance, type StandardErrorSpec } from './coefficient-covariance';
import { coefficientTable } from './coefficient-table';
import { CompensatedSum } from './compensated-dot';
import { assembleFit } from './fit-linear-model';
import type { FirstStage, InstrumentalFit } from './instrumental-fit';
import type { NamedColumn } from './named-column';
import { DEFAULT_MAX_CONDITION_NUMBER, solveLeastSquares } from './solve-least-squares';
import { waldF } from './wald-test';
import { buildWeightedDesign, type WeightedDesign } from './weighted-design';

/** y = Xβ + e where some regressors are endogenous and excluded instruments identify them. */
export interface InstrumentalModelSpec {
  readonly response: NamedColumn;
  /** Regressors assumed uncorrelated with the error (they instrument themselves). */
  readonly exogenous: readonly NamedColumn[];
  readonly endogenous: readonly NamedColumn[];
  /** Excluded instruments: correlated with the endogenous regressors, not with the error. */
  readonly instruments: readonly NamedColumn[];
  readonly intercept?: boolean;
  readonly weights?: NamedColumn;
  readonly standardErrors?: StandardErrorSpec;
  readonly confidenceLevel?: number;
  readonly maxConditionNumber?: number;
}

/**
 * Two-stage least squares. Each endogenous regressor is regressed on the exogenous regressors and
 * the instruments; the response is then regressed on the exogenous regressors and those fitted
 * values. Standard errors use the structural residuals y − Xβ (with the actual, not the fitted,
 * endogenous values) in s² or the sandwich, with (X̂ᵀX̂)⁻¹ as the bread. The first-stage F tests
 * the excluded instruments with the same kind of covariance.
 */
export function fitInstrumentalModel(spec: InstrumentalModelSpec): InstrumentalFit {
  checkIdentified(spec);
  const intercept = spec.intercept ?? true;
  const standardErrors = spec.standardErrors ?? { type: 'classical' };
  const maxCondition = spec.maxConditionNumber ?? DEFAULT_MAX_CONDITION_NUMBER;
  const structural = buildWeightedDesign({
    response: spec.response,
    regressors: [...spec.exogenous, ...spec.endogenous],
    intercept,
    weights: spec.weights,
  });
  const firstStages = spec.endogenous.map((column) =>
    firstStage(spec, column, intercept, standardErrors, maxCondition),
  );
  const firstEndogenous = structural.columns.length - spec.endogenous.length;
  const fitted = structural.columns.map((column, j) =>
    j < firstEndogenous ? column : firstStages[j - firstEndogenous].fitted,
  );
  const instruments = buildWeightedDesign({
    response: spec.response,
    regressors: [...spec.exogenous, ...spec.instruments],
    intercept,
    weights: spec.weights,
  }).raw.columns;
  const second = solveLeastSquares(fitted, structural.response, structural.names, maxCondition, {
    ...structural.raw,
    instruments,
  });
  // The exact path's residuals and RSS are already the structural ones.
  const residuals = second.exact
    ? second.residuals
    : structuralResiduals(structural, second.coefficients);
  const rss = new CompensatedSum();
  for (const u of residuals) rss.addProduct(u, u);
  const fit = assembleFit(structural, {
    coefficients: second.coefficients,
    residualSumOfSquares: second.exact ? second.residualSumOfSquares : rss.value(),
    sandwich: (groups) => second.sandwich(groups, residuals),
    inverseGram: second.inverseGram,
    conditionNumber: second.conditionNumber,
    standardErrors,
    confidenceLevel: spec.confidenceLevel ?? 0.95,
    responseName: spec.response.name,
    instrumental: true,
  });
  return {
    ...fit,
    instruments: spec.instruments.map((c) => c.name),
    endogenous: spec.endogenous.map((c) => c.name),
    firstStages: firstStages.map((stage) => stage.summary),
  };
}

function checkIdentified(spec: InstrumentalModelSpec): void {
  if (spec.endogenous.length === 0) {
    throw new EstimationError(
      'invalid-option',
      'name at least one endogenous regressor',
      'endogenous',
    );
  }
  if (spec.instruments.length < spec.endogenous.length) {
    throw new EstimationError(
      'under-identified',
      `${spec.endogenous.length} endogenous regressor(s) need at least as many instruments; ` +
        `got ${spec.instruments.length}`,
      'instruments',
    );
  }
}

function firstStage(
  spec: InstrumentalModelSpec,
  endogenous: NamedColumn,
  intercept: boolean,
  standardErrors: StandardErrorSpec,
  maxCondition: number,
): { fitted: Float64Array; summary: FirstStage } {
  const design = buildWeightedDesign({
    response: endogenous,
    regressors: [...spec.exogenous, ...spec.instruments],
    intercept,
    weights: spec.weights,
  });
  const solution = solveLeastSquares(
    design.columns,
    design.response,
    design.names,
    maxCondition,
    design.raw,
  );
  const fitted = design.response.map((value, i) => value - solution.residuals[i]);
  const covariance = coefficientCovariance(
    {
      n: design.n,
      k: design.names.length,
      inverseGram: solution.inverseGram,
      residualSumOfSquares: solution.residualSumOfSquares,
      sandwich: (groups) => solution.sandwich(groups, solution.residuals),
    },
    standardErrors,
  );
  const k = design.names.length;
  const excluded = Array.from(
    { length: spec.instruments.length },
    (_, i) => k - spec.instruments.length + i,
  );
  const statistic = waldF(solution.coefficients, covariance.matrix, excluded);
  return {
    fitted,
    summary: {
      endogenous: endogenous.name,
      fStatistic: Number.isFinite(statistic) ? statistic : null,
      fDf: [excluded.length, covariance.summary.df],
      coefficients: coefficientTable(
        design.names,
        solution.coefficients,
        covariance.matrix,
        covariance.summary.df,
        spec.confidenceLevel ?? 0.95,
      ),
    },
  };
}

/** ũ = ỹ − X̃β with the actual endogenous values, in double-double. */
function structuralResiduals(design: WeightedDesign, beta: Float64Array): Float64Array {
  return design.response.map((y, i) => {
    const sum = new CompensatedSum(y);
    design.columns.forEach((column, j) => sum.addProduct(-column[i], beta[j]));
    return sum.value();
  });
}
