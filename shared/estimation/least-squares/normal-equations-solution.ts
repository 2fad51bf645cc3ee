import { Rational } from '../exact/rational';
import { exactLinearSolve } from '../exact/exact-linear-solve';
import { CompensatedSum } from './compensated-dot';
import type { Moments } from './cross-product-moments';
import { refinedCholesky } from './refined-cholesky';

/** Systems up to this many regressors are solved exactly (well under a second, measured). */
export const EXACT_SOLVE_LIMIT = 24;

/** The solved normal equations, rounded to float64 once. */
export interface NormalEquationsSolution {
  /** Intercept first when there is one, then the slopes. */
  readonly estimates: number[];
  readonly residualSumOfSquares: number;
  /** (XᵀX)⁻¹ including the intercept row and column when there is one. */
  readonly inverseGram: number[][];
  /** The (centred) S⁻¹ of the slopes only. */
  readonly slopeInverse: number[][];
  readonly exact: boolean;
}

/**
 * Solves the centred normal equations: exactly in rational arithmetic up to EXACT_SOLVE_LIMIT
 * regressors, beyond that by a refined float64 Cholesky.
 * Intercept ȳ − x̄ᵀb, RSS = syy − bᵀs (floored at 0), and
 * (XᵀX)⁻¹ = [[1/n + x̄ᵀS⁻¹x̄, −(S⁻¹x̄)ᵀ], [−S⁻¹x̄, S⁻¹]] for the design [1, X].
 */
export function solveNormalEquations(
  moments: Moments,
  names: readonly string[],
  n: number,
): NormalEquationsSolution {
  return names.length <= EXACT_SOLVE_LIMIT
    ? exactSolve(moments, names, n)
    : floatSolve(moments, names, n);
}

function exactSolve(
  moments: Moments,
  names: readonly string[],
  n: number,
): NormalEquationsSolution {
  const { solution: b, inverse } = exactLinearSolve(moments.gram, moments.cross, names);
  const rss = b.reduce((sum, bj, j) => sum.sub(bj.mul(moments.cross[j])), moments.responseSquares);
  const means = moments.regressorMeans;
  const slopeInverse = inverse.map((row) => row.map((v) => v.toNumber()));
  const base = { residualSumOfSquares: Math.max(rss.toNumber(), 0), slopeInverse, exact: true };
  if (means === null)
    return { ...base, estimates: b.map((v) => v.toNumber()), inverseGram: slopeInverse };
  const intercept = b.reduce((sum, bj, j) => sum.sub(bj.mul(means[j])), moments.responseMean!);
  const sx = inverse.map((row) =>
    row.reduce((sum, v, j) => sum.add(v.mul(means[j])), Rational.ZERO),
  );
  const corner = means.reduce((sum, m, j) => sum.add(m.mul(sx[j])), Rational.of(1n, BigInt(n)));
  const sxNumbers = sx.map((v) => v.toNumber());
  return {
    ...base,
    estimates: [intercept, ...b].map((v) => v.toNumber()),
    inverseGram: [
      [corner.toNumber(), ...sxNumbers.map((v) => -v)],
      ...slopeInverse.map((row, i) => [-sxNumbers[i], ...row]),
    ],
  };
}

function floatSolve(
  moments: Moments,
  names: readonly string[],
  n: number,
): NormalEquationsSolution {
  const gram = moments.gram.map((row) => row.map((v) => v.toNumber()));
  const cross = moments.cross.map((v) => v.toNumber());
  const { solution: b, inverse } = refinedCholesky(gram, cross, names);
  const rss = new CompensatedSum(moments.responseSquares.toNumber());
  b.forEach((bj, j) => rss.addProduct(-bj, cross[j]));
  const base = {
    residualSumOfSquares: Math.max(rss.value(), 0),
    slopeInverse: inverse,
    exact: false,
  };
  if (moments.regressorMeans === null) return { ...base, estimates: b, inverseGram: inverse };
  const means = moments.regressorMeans.map((v) => v.toNumber());
  const intercept = new CompensatedSum(moments.responseMean!.toNumber());
  b.forEach((bj, j) => intercept.addProduct(-bj, means[j]));
  const sx = inverse.map((row) => row.reduce((sum, v, j) => sum + v * means[j], 0));
  const corner = 1 / n + means.reduce((sum, m, j) => sum + m * sx[j], 0);
  return {
    ...base,
    estimates: [intercept.value(), ...b],
    inverseGram: [[corner, ...sx.map((v) => -v)], ...inverse.map((row, i) => [-sx[i], ...row])],
  };
}
