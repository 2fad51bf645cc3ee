import { EstimationError } from '../estimation-error';
import { gcd, Rational } from './rational';

/**
 * The exact solution of S·b = s and the exact inverse S⁻¹, as integer numerators over one
 * common denominator: b = solution / denominator, S⁻¹ = inverse / denominator. Left unreduced
 * on purpose: the denominator is a determinant hundreds of digits long, and reducing each entry
 * by Euclid took most of an in-database fit's solve, while callers mostly want float64s (see
 * fractionToNumber) or a few exact combinations that can stay over the same denominator.
 */
export interface ExactSolution {
  readonly solution: bigint[];
  readonly inverse: bigint[][];
  readonly denominator: bigint;
}

/**
 * Solves S·b = s and inverts S exactly. The system is brought to integers by the least common
 * denominator, then reduced by fraction-free Gauss–Jordan elimination (Bareiss: every division
 * is exact, and intermediate entries stay minors of the matrix instead of growing without
 * bound, which keeps 30×30 systems of float64-derived sums fast). A column with no non-zero
 * pivot left is exactly dependent on the columns before it: 'singular-design' names it.
 */
export function exactLinearSolve(
  matrix: readonly (readonly Rational[])[],
  rhs: readonly Rational[],
  names: readonly string[],
): ExactSolution {
  const k = rhs.length;
  const scale = [...matrix.flat(), ...rhs].reduce((l, v) => (l / gcd(l, v.den)) * v.den, 1n);
  const toInteger = (v: Rational): bigint => v.num * (scale / v.den);
  const rows = matrix.map((row, i) => [
    ...row.map(toInteger),
    toInteger(rhs[i]),
    ...Array.from({ length: k }, (_, j) => (i === j ? 1n : 0n)),
  ]);
  let previous = 1n;
  for (let c = 0; c < k; c++) {
    const pivotRow = rows.findIndex((row, r) => r >= c && row[c] !== 0n);
    if (pivotRow < 0) {
      throw new EstimationError(
        'singular-design',
        `column ${names[c]} is a linear combination of the columns before it ` +
          `(${names.slice(0, c).join(', ') || 'nothing'})`,
        names[c],
      );
    }
    [rows[c], rows[pivotRow]] = [rows[pivotRow], rows[c]];
    const pivot = rows[c][c];
    for (let r = 0; r < k; r++) {
      if (r === c) continue;
      const factor = rows[r][c];
      rows[r] = rows[r].map((value, m) => (pivot * value - factor * rows[c][m]) / previous);
    }
    previous = pivot;
  }
  // Every diagonal entry now equals the determinant of the scaled matrix, `previous`.
  const determinant = previous;
  return {
    solution: rows.map((row) => row[k]),
    inverse: rows.map((row) => row.slice(k + 1).map((v) => v * scale)),
    denominator: determinant,
  };
}
