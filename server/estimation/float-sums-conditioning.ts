import { EstimationError } from '@shared/estimation/estimation-error';

/**
 * Frobenius condition number of the unit-diagonal D⁻¹SD⁻¹ (D = √diag S), from S and its
 * inverse: how much the relative rounding of float8 sums can grow in the coefficients.
 */
export function scaledCondition(
  gram: readonly (readonly number[])[],
  inverse: readonly (readonly number[])[],
): number {
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

/**
 * The sums are float8, so the exact solve is only as good as they are: refuse
 * ('ill-conditioned') when their rounding could be amplified past `limit`.
 */
export function checkFloatSumsConditioning(
  condition: number,
  limit: number,
  names: readonly string[],
): void {
  if (condition <= limit) return;
  throw new EstimationError(
    'ill-conditioned',
    `the float8 sums cannot pin these coefficients down (scaled condition number of XᵀX ` +
      `${condition.toExponential(2)} > ${limit.toExponential(0)}); drop or combine nearly ` +
      `collinear columns (${names.join(', ')})`,
  );
}
