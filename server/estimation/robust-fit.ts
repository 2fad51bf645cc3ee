import type { LinearFit } from '@shared/estimation/least-squares/linear-fit';
import type { SqlRunner } from './in-database-model-spec';
import { inDatabaseFitReport } from './in-database-fit-report';
import { meatPass } from './meat-pass';
import type { ResolvedModel } from './model-source';
import { robustCovariance } from './robust-covariance';
import type { ShiftedSolution } from './shifted-solution';

/**
 * Replaces the classical covariance of `base` by HC1 or cluster-robust errors: the second pass
 * sums the meat from residuals of the shifted solution, whose inverse is the bread.
 */
export async function robustFit(
  runner: SqlRunner,
  model: ResolvedModel,
  shifted: ShiftedSolution,
  base: LinearFit,
): Promise<LinearFit> {
  const meat = await meatPass(runner, model, shifted, base.n);
  const { matrix, summary } = robustCovariance({
    inverseGram: shifted.inverseGram,
    meat,
    weightScale: shifted.weightScale,
    regressorShifts: model.intercept ? shifted.origin.slice(0, model.regressors.length) : null,
    n: base.n,
    clusterColumn: model.cluster?.column,
  });
  return inDatabaseFitReport({
    terms: base.coefficients.map((c) => c.term),
    response: base.response,
    n: base.n,
    intercept: base.intercept,
    weighted: base.weighted,
    estimates: base.coefficients.map((c) => c.estimate),
    covariance: matrix,
    summary,
    residualSumOfSquares: base.residualSumOfSquares,
    totalSumOfSquares: shifted.totalSumOfSquares,
    conditionNumber: base.conditionNumber,
    confidenceLevel: base.confidenceLevel,
  });
}
