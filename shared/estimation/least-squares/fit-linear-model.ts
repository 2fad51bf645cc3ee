import { EstimationError } from '../estimation-error';
import { coefficientCovariance, type StandardErrorSpec } from './coefficient-covariance';
import { coefficientTable } from './coefficient-table';
import { goodnessOfFit, totalSumOfSquares } from './goodness-of-fit';
import { linearAssumptions } from './linear-assumptions';
import type { LinearFit } from './linear-fit';
import type { NamedColumn } from './named-column';
import { DEFAULT_MAX_CONDITION_NUMBER, solveLeastSquares } from './solve-least-squares';
import { buildWeightedDesign, type WeightedDesign } from './weighted-design';

/** A linear model y = Xβ + e to fit by ordinary or weighted least squares. */
export interface LinearModelSpec {
  readonly response: NamedColumn;
  readonly regressors: readonly NamedColumn[];
  /** Include a constant term (default true). */
  readonly intercept?: boolean;
  /** Positive analytic weights: minimise Σ wᵢ·eᵢ². */
  readonly weights?: NamedColumn;
  /** Default classical. */
  readonly standardErrors?: StandardErrorSpec;
  /** Default 0.95. */
  readonly confidenceLevel?: number;
  /** Refuse designs whose scaled condition number exceeds this (default 1e8). */
  readonly maxConditionNumber?: number;
}

/**
 * Fits y = Xβ + e by least squares (weighted when `weights` is given) through a column-scaled
 * Householder QR refined in double-double arithmetic, and reports coefficients with standard
 * errors (classical, HC1 or cluster-robust), t intervals, R², adjusted R², F and residual SD.
 * Every refusal is an EstimationError naming the column at fault.
 */
export function fitLinearModel(spec: LinearModelSpec): LinearFit {
  const design = buildWeightedDesign({
    response: spec.response,
    regressors: spec.regressors,
    intercept: spec.intercept ?? true,
    weights: spec.weights,
  });
  const solution = solveLeastSquares(
    design.columns,
    design.response,
    design.names,
    spec.maxConditionNumber ?? DEFAULT_MAX_CONDITION_NUMBER,
    design.raw,
  );
  return assembleFit(design, {
    coefficients: solution.coefficients,
    residualSumOfSquares: solution.residualSumOfSquares,
    sandwich: (groups) => solution.sandwich(groups, solution.residuals),
    inverseGram: solution.inverseGram,
    conditionNumber: solution.conditionNumber,
    standardErrors: spec.standardErrors ?? { type: 'classical' },
    confidenceLevel: spec.confidenceLevel ?? 0.95,
    responseName: spec.response.name,
  });
}

/** The pieces of a solved fit that the report is assembled from (shared with 2SLS). */
export interface SolvedFit {
  readonly coefficients: ArrayLike<number>;
  readonly residualSumOfSquares: number;
  /** The robust sandwich without its factor (see LeastSquaresSolution.sandwich). */
  sandwich(groups: readonly number[] | null): number[][];
  readonly inverseGram: readonly (readonly number[])[];
  readonly conditionNumber: number;
  readonly standardErrors: StandardErrorSpec;
  readonly confidenceLevel: number;
  readonly responseName: string;
  /** Two-stage least squares: F becomes a Wald test, assumptions speak of instruments. */
  readonly instrumental?: boolean;
}

/** Turns a solved fit into the reported LinearFit. */
export function assembleFit(design: WeightedDesign, solved: SolvedFit): LinearFit {
  checkConfidenceLevel(solved.confidenceLevel);
  const covariance = coefficientCovariance(
    {
      n: design.n,
      k: design.names.length,
      inverseGram: solved.inverseGram,
      residualSumOfSquares: solved.residualSumOfSquares,
      sandwich: (groups) => solved.sandwich(groups),
    },
    solved.standardErrors,
  );
  const df = covariance.summary.df;
  return {
    n: design.n,
    parameters: design.names.length,
    dfResidual: design.n - design.names.length,
    response: solved.responseName,
    intercept: design.intercept,
    weighted: design.rootWeights !== null,
    coefficients: coefficientTable(
      design.names,
      solved.coefficients,
      covariance.matrix,
      df,
      solved.confidenceLevel,
    ),
    covariance: covariance.matrix,
    standardErrors: covariance.summary,
    confidenceLevel: solved.confidenceLevel,
    ...goodnessOfFit({
      n: design.n,
      totalSumOfSquares: totalSumOfSquares(design.response, design.rootWeights, design.intercept),
      intercept: design.intercept,
      residualSumOfSquares: solved.residualSumOfSquares,
      estimates: solved.coefficients,
      covariance: covariance.matrix,
      robust: covariance.summary.type !== 'classical' || solved.instrumental === true,
      fDenominatorDf: df,
    }),
    residualSumOfSquares: solved.residualSumOfSquares,
    conditionNumber: solved.conditionNumber,
    assumptions: linearAssumptions(design, covariance.summary.type, solved.instrumental === true),
  };
}

function checkConfidenceLevel(level: number): void {
  if (!(level > 0 && level < 1)) {
    throw new EstimationError(
      'invalid-option',
      `confidence level must lie strictly between 0 and 1, got ${level}`,
      'confidenceLevel',
    );
  }
}
