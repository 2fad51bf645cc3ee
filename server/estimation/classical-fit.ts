import { solveNormalEquations } from '@shared/estimation/least-squares/normal-equations-solution';
import type { LinearFit } from '@shared/estimation/least-squares/linear-fit';
import {
  DEFAULT_MAX_CROSS_PRODUCT_CONDITION,
  solveFromCrossProducts,
} from '@shared/estimation/least-squares/solve-from-cross-products';
import { INTERCEPT_TERM } from '@shared/estimation/least-squares/weighted-design';
import { checkFloatSumsConditioning, scaledCondition } from './float-sums-conditioning';
import { inDatabaseAssumptions, inDatabaseFitReport } from './in-database-fit-report';
import type { ShiftedSums } from './moment-pass';
import { crossProductSpecOf, momentsAbout } from './shifted-moments';

/** Names and options of the model being solved. */
export interface SolveOptions {
  readonly regressors: readonly string[];
  readonly response: string;
  readonly intercept: boolean;
  readonly confidenceLevel: number;
  readonly maxConditionNumber?: number;
}

/**
 * The fit with classical standard errors from the first pass's sums. Unweighted sums go to
 * solveFromCrossProducts as exact decimals (the solve is exact, so only the float8 sums
 * themselves carry rounding, and their conditioning is checked here). Weighted sums, which it
 * does not take, are solved from weight-rescaled exact moments by the same normal-equations
 * solver — as is a fit whose RSS a residual pass has computed (`residualSumOfSquares`).
 */
export function classicalFit(
  sums: ShiftedSums,
  options: SolveOptions,
  residualSumOfSquares?: number,
): LinearFit {
  const limit = options.maxConditionNumber ?? DEFAULT_MAX_CROSS_PRODUCT_CONDITION;
  if (sums.weighted || residualSumOfSquares !== undefined) {
    return fromMoments(sums, options, limit, residualSumOfSquares);
  }
  const names = { regressors: options.regressors, response: options.response };
  const fit = solveFromCrossProducts(crossProductSpecOf(sums, names, options));
  checkFloatSumsConditioning(fit.conditionNumber ** 2, limit, options.regressors);
  return { ...fit, assumptions: inDatabaseAssumptions('classical', false, options.intercept) };
}

function fromMoments(
  sums: ShiftedSums,
  options: SolveOptions,
  limit: number,
  residualSumOfSquares: number | undefined,
): LinearFit {
  const names = options.regressors;
  const { moments, scale } = momentsAbout(
    sums,
    sums.shifts.map(() => 0),
    options.intercept,
  );
  const solved = solveNormalEquations(moments, names, sums.n);
  const gram = moments.gram.map((row) => row.map((v) => v.toNumber()));
  const condition = scaledCondition(gram, solved.slopeInverse);
  checkFloatSumsConditioning(condition, limit, names);
  const terms = options.intercept ? [INTERCEPT_TERM, ...names] : [...names];
  const dfResidual = sums.n - terms.length;
  // Rescaled moments make RSS and TSS n/Σw times the true ones; s²·(XᵀWX)⁻¹ is unchanged.
  const weightScale = scale.toNumber();
  const rss = residualSumOfSquares ?? solved.residualSumOfSquares / weightScale;
  const s2 = (rss * weightScale) / dfResidual;
  return inDatabaseFitReport({
    terms,
    response: options.response,
    n: sums.n,
    intercept: options.intercept,
    weighted: sums.weighted,
    estimates: solved.estimates,
    covariance: solved.inverseGram.map((row) => row.map((v) => v * s2)),
    summary: { type: 'classical', smallSampleFactor: 1, df: dfResidual },
    residualSumOfSquares: rss,
    totalSumOfSquares: moments.responseSquares.toNumber() / weightScale,
    conditionNumber: Math.sqrt(condition),
    confidenceLevel: options.confidenceLevel,
  });
}
