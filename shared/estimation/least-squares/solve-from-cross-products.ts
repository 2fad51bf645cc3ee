import { EstimationError } from '../estimation-error';
import { coefficientTable } from './coefficient-table';
import { crossProductMoments, type CrossProductSpec, type Moments } from './cross-product-moments';
import { goodnessOfFit } from './goodness-of-fit';
import type { LinearFit } from './linear-fit';
import { solveNormalEquations, type NormalEquationsSolution } from './normal-equations-solution';
import { INTERCEPT_TERM } from './weighted-design';

export type { CrossProductSpec, SumValue } from './cross-product-moments';

/** Default refusal threshold for float64 sums (≈ 1e5 for the design's own condition number). */
export const DEFAULT_MAX_CROSS_PRODUCT_CONDITION = 1e10;

/**
 * Ordinary least squares from sums of products computed where the rows live (the in-database
 * path). The sums are read exactly (float64 values as the dyadic rationals they are, decimal
 * strings such as PostgreSQL `numeric` prints as exact decimals), centred exactly, and — up to
 * 24 regressors — solved in exact rational arithmetic, so the result is the exact
 * least-squares fit of the sums as given, rounded once to float64. Larger systems use a refined
 * float64 Cholesky. Returns the same LinearFit as fitLinearModel: intercept ȳ − x̄ᵀb,
 * RSS = syy − bᵀs, classical standard errors s²·(XᵀX)⁻¹, R², adjusted R², F, residual SD.
 *
 * Accuracy therefore rests on the sums. Exact decimal sums give the exact fit however
 * ill-conditioned the design. float64 sums carry rounding errors that the normal equations
 * amplify by the condition number of XᵀX, so they are refused with 'ill-conditioned' above
 * `maxConditionNumber` (default 1e10); centre them in the database (means first, then
 * Σ(x − x̄)(y − ȳ), passed with `means`) when columns have large means. Robust (HC1/cluster)
 * standard errors need row-level residuals and are not available on this path.
 */
export function solveFromCrossProducts(spec: CrossProductSpec): LinearFit {
  const names = spec.regressorNames;
  checkNames(names, spec.responseName);
  const moments = crossProductMoments(spec);
  const solved = solveNormalEquations(moments, names, spec.n);
  const conditionNumber = checkConditioning(spec, moments, solved);
  const intercept = moments.regressorMeans !== null;
  const parameters = solved.estimates.length;
  const dfResidual = spec.n - parameters;
  const rss = solved.residualSumOfSquares;
  const covariance = solved.inverseGram.map((row) => row.map((v) => (v * rss) / dfResidual));
  const level = spec.confidenceLevel ?? 0.95;
  const terms = intercept ? [INTERCEPT_TERM, ...names] : [...names];
  return {
    n: spec.n,
    parameters,
    dfResidual,
    response: spec.responseName,
    intercept,
    weighted: false,
    coefficients: coefficientTable(terms, solved.estimates, covariance, dfResidual, level),
    covariance,
    standardErrors: { type: 'classical', smallSampleFactor: 1, df: dfResidual },
    confidenceLevel: level,
    ...goodnessOfFit({
      n: spec.n,
      totalSumOfSquares: moments.responseSquares.toNumber(),
      intercept,
      residualSumOfSquares: rss,
      estimates: solved.estimates,
      covariance,
      robust: false,
      fDenominatorDf: dfResidual,
    }),
    residualSumOfSquares: rss,
    conditionNumber: Math.sqrt(conditionNumber),
    assumptions: [
      `ordinary least squares solved ${solved.exact ? 'exactly' : 'in float64'} from sums of products (in-database path)`,
      'classical standard errors assume independent errors of equal variance',
      ...(intercept ? [] : ['no intercept: R² is uncentred (1 − RSS/Σy²)']),
    ],
  };
}

/** The scaled condition number; float64 sums above the limit are refused. */
function checkConditioning(
  spec: CrossProductSpec,
  moments: Moments,
  solved: NormalEquationsSolution,
): number {
  const gram = moments.gram.map((row) => row.map((v) => v.toNumber()));
  const conditionNumber = scaledCondition(gram, solved.slopeInverse);
  const limit = spec.maxConditionNumber ?? DEFAULT_MAX_CROSS_PRODUCT_CONDITION;
  if ((!moments.exactInput || !solved.exact) && !(conditionNumber <= limit)) {
    throw new EstimationError(
      'ill-conditioned',
      `float64 sums cannot pin these coefficients down (scaled condition number of XᵀX ` +
        `${conditionNumber.toExponential(2)} > ${limit.toExponential(0)}); send centred or exact ` +
        `decimal sums, or drop nearly collinear columns (${spec.regressorNames.join(', ')})`,
    );
  }
  return conditionNumber;
}

function checkNames(names: readonly string[], response: string): void {
  const all = [...names, response];
  const duplicate = all.find((name, i) => all.indexOf(name) !== i);
  if (duplicate !== undefined) {
    throw new EstimationError(
      'duplicate-column',
      `column ${duplicate} appears twice in the model`,
      duplicate,
    );
  }
}

/** Frobenius condition number of D⁻¹SD⁻¹ with D = √diag S (unit diagonal). */
function scaledCondition(gram: number[][], inverse: number[][]): number {
  const d = gram.map((row, j) => Math.sqrt(row[j]));
  let a = 0;
  let b = 0;
  gram.forEach((row, i) =>
    row.forEach((v, j) => {
      a += (v / (d[i] * d[j])) ** 2;
      b += (inverse[i][j] * d[i] * d[j]) ** 2;
    }),
  );
  return Math.sqrt(a * b);
}
