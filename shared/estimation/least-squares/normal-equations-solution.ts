import { fractionToNumber, Rational } from '../exact/rational';
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
  const { solution, inverse, denominator } = exactLinearSolve(moments.gram, moments.cross, names);
  // Every exact figure below is kept as a numerator over the solve's common denominator D: the
  // numerators are rationals with the short denominators of the sums, so no long D ever enters
  // a reduction, and each figure is rounded to float64 once at the end.
  const over = (numerator: Rational) =>
    fractionToNumber(numerator.num, numerator.den * denominator);
  const times = (value: Rational, integer: bigint) => value.mul(Rational.of(integer));
  // RSS = syy − bᵀs = (syy·D − Σ Bⱼsⱼ) / D
  const rss = solution.reduce(
    (sum, bj, j) => sum.sub(times(moments.cross[j], bj)),
    times(moments.responseSquares, denominator),
  );
  const slopeInverse = inverse.map((row) => row.map((v) => fractionToNumber(v, denominator)));
  const slopes = solution.map((v) => fractionToNumber(v, denominator));
  const base = { residualSumOfSquares: Math.max(over(rss), 0), slopeInverse, exact: true };
  const means = moments.regressorMeans;
  if (means === null) return { ...base, estimates: slopes, inverseGram: slopeInverse };
  // ȳ − x̄ᵀb, S⁻¹x̄ and 1/n + x̄ᵀS⁻¹x̄, each over D.
  const intercept = solution.reduce(
    (sum, bj, j) => sum.sub(times(means[j], bj)),
    times(moments.responseMean!, denominator),
  );
  const sx = inverse.map((row) =>
    row.reduce((sum, v, j) => sum.add(times(means[j], v)), Rational.ZERO),
  );
  const corner = means.reduce(
    (sum, m, j) => sum.add(m.mul(sx[j])),
    Rational.of(denominator, BigInt(n)),
  );
  const sxNumbers = sx.map(over);
  return {
    ...base,
    estimates: [over(intercept), ...slopes],
    inverseGram: [
      [over(corner), ...sxNumbers.map((v) => -v)],
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
