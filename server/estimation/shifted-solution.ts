import { solveNormalEquations } from '@shared/estimation/least-squares/normal-equations-solution';
import type { MeatInput } from './meat-pass';
import type { ShiftedSums } from './moment-pass';
import type { ResolvedModel } from './model-source';
import { momentsAbout } from './shifted-moments';

/** The fit solved in the coordinates of the sums: u = x − c, v = y − d. */
export interface ShiftedSolution extends MeatInput {
  /** (ZᵀWZ)⁻¹ of the weight-rescaled moments, intercept first when there is one. */
  readonly inverseGram: number[][];
  /** n/Σw (1 unweighted). */
  readonly weightScale: number;
  /** Σw(y − ȳ)², or Σwy² without an intercept, unscaled. */
  readonly totalSumOfSquares: number;
}

/**
 * Solves the first pass's sums exactly about their own shifts (about zero without an
 * intercept, where shifting would change the model). The second pass computes residuals from
 * these coefficients, and the sandwich uses this well-conditioned inverse.
 */
export function solveShifted(sums: ShiftedSums, model: ResolvedModel): ShiftedSolution {
  const origin = model.intercept ? sums.shifts : sums.shifts.map(() => 0);
  const { moments, scale } = momentsAbout(sums, origin, model.intercept);
  const names = model.regressors.map((r) => r.name);
  const solved = solveNormalEquations(moments, names, sums.n);
  const weightScale = scale.toNumber();
  return {
    origin,
    intercept: model.intercept ? solved.estimates[0] : 0,
    slopes: model.intercept ? solved.estimates.slice(1) : solved.estimates,
    inverseGram: solved.inverseGram,
    weightScale,
    totalSumOfSquares: moments.responseSquares.toNumber() / weightScale,
  };
}
