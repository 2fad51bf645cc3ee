import { coefficientTable } from '@shared/estimation/least-squares/coefficient-table';
import { goodnessOfFit } from '@shared/estimation/least-squares/goodness-of-fit';
import type { LinearFit, StandardErrorSummary } from '@shared/estimation/least-squares/linear-fit';

/** Everything a fit's report is made from, once the sums are solved. */
export interface FitReportInput {
  /** Term names in coefficient order, '(intercept)' first when there is one. */
  readonly terms: readonly string[];
  readonly response: string;
  readonly n: number;
  readonly intercept: boolean;
  readonly weighted: boolean;
  readonly estimates: readonly number[];
  readonly covariance: number[][];
  readonly summary: StandardErrorSummary;
  /** Σwᵢeᵢ² and Σwᵢ(yᵢ − ȳ)² (Σwᵢyᵢ² without an intercept), unscaled. */
  readonly residualSumOfSquares: number;
  readonly totalSumOfSquares: number;
  readonly conditionNumber: number;
  readonly confidenceLevel: number;
}

/** The LinearFit of the in-database path: the same shape and conventions as fitLinearModel. */
export function inDatabaseFitReport(input: FitReportInput): LinearFit {
  const p = input.terms.length;
  const robust = input.summary.type !== 'classical';
  return {
    n: input.n,
    parameters: p,
    dfResidual: input.n - p,
    response: input.response,
    intercept: input.intercept,
    weighted: input.weighted,
    coefficients: coefficientTable(
      input.terms,
      input.estimates,
      input.covariance,
      input.summary.df,
      input.confidenceLevel,
    ),
    covariance: input.covariance,
    standardErrors: input.summary,
    confidenceLevel: input.confidenceLevel,
    ...goodnessOfFit({
      n: input.n,
      totalSumOfSquares: input.totalSumOfSquares,
      intercept: input.intercept,
      residualSumOfSquares: input.residualSumOfSquares,
      estimates: input.estimates,
      covariance: input.covariance,
      robust,
      fDenominatorDf: input.summary.df,
    }),
    residualSumOfSquares: input.residualSumOfSquares,
    conditionNumber: input.conditionNumber,
    assumptions: inDatabaseAssumptions(input.summary.type, input.weighted, input.intercept),
  };
}

/** The fit's assumptions, worded as fitLinearModel words them, plus how the sums were made. */
export function inDatabaseAssumptions(
  seType: StandardErrorSummary['type'],
  weighted: boolean,
  intercept: boolean,
): string[] {
  const notes = [
    'errors have mean zero given the regressors (the regressors are exogenous)',
    weighted
      ? 'weighted least squares: observation i counts with weight wᵢ (analytic weights)'
      : 'ordinary least squares: every observation counts equally',
  ];
  if (seType === 'classical')
    notes.push('classical standard errors assume independent errors of equal variance');
  if (seType === 'hc1')
    notes.push('HC1 standard errors: independent errors of any variance, sandwich × n/(n − k)');
  if (seType === 'cluster') {
    notes.push(
      'cluster-robust standard errors: errors independent across clusters, any correlation within; ' +
        'sandwich × G/(G − 1)·(n − 1)/(n − k), t intervals on G − 1 df',
    );
  }
  notes.push(
    'in-database fit: sums of products computed by PostgreSQL in float8 about a shift near each ' +
      'column mean, then solved exactly; the rows never left the database',
  );
  if (!intercept) notes.push('no intercept: R² is uncentred (1 − RSS/Σy²)');
  return notes;
}
