import { EstimationError } from '../estimation-error';
import { CompensatedSum } from './compensated-dot';

/** Solution of a symmetric positive definite system S·b = s with S⁻¹. */
export interface CholeskySolution {
  readonly solution: number[];
  readonly inverse: number[][];
}

/**
 * Solves S·b = s in float64 for a symmetric positive definite S: scales to unit diagonal by
 * powers of two (exact), factorises by Cholesky and refines b with double-double residuals.
 * Throws 'singular-design' naming the first column whose pivot vanishes.
 */
export function refinedCholesky(
  matrix: readonly (readonly number[])[],
  rhs: readonly number[],
  names: readonly string[],
): CholeskySolution {
  const scales = matrix.map((row, j) => {
    if (!(row[j] > 0)) {
      throw new EstimationError('singular-design', `column ${names[j]} does not vary`, names[j]);
    }
    return 2 ** Math.round(Math.log2(Math.sqrt(row[j])));
  });
  const a = matrix.map((row, i) => row.map((v, j) => v / (scales[i] * scales[j])));
  const c = rhs.map((v, i) => v / scales[i]);
  const lower = cholesky(a, names);
  const solution = solveWith(lower, c);
  for (let step = 0; step < 4; step++) {
    const residual = c.map((ci, i) => {
      const sum = new CompensatedSum(ci);
      a[i].forEach((aij, j) => sum.addProduct(-aij, solution[j]));
      return sum.value();
    });
    solveWith(lower, residual).forEach((d, j) => (solution[j] += d));
  }
  const unit = (j: number): number[] => a.map((_, i) => (i === j ? 1 : 0));
  const columns = a.map((_, j) => solveWith(lower, unit(j)));
  return {
    solution: solution.map((b, j) => b / scales[j]),
    inverse: a.map((_, i) => a.map((__, j) => columns[j][i] / (scales[i] * scales[j]))),
  };
}

function cholesky(a: readonly (readonly number[])[], names: readonly string[]): number[][] {
  const k = a.length;
  const lower = Array.from({ length: k }, () => new Array<number>(k).fill(0));
  for (let j = 0; j < k; j++) {
    let pivot = a[j][j];
    for (let m = 0; m < j; m++) pivot -= lower[j][m] ** 2;
    if (!(pivot > k * 2 ** -52 * a[j][j])) {
      throw new EstimationError(
        'singular-design',
        `column ${names[j]} is a linear combination of the columns before it ` +
          `(${names.slice(0, j).join(', ') || 'nothing'})`,
        names[j],
      );
    }
    lower[j][j] = Math.sqrt(pivot);
    for (let i = j + 1; i < k; i++) {
      let sum = a[i][j];
      for (let m = 0; m < j; m++) sum -= lower[i][m] * lower[j][m];
      lower[i][j] = sum / lower[j][j];
    }
  }
  return lower;
}

function solveWith(lower: readonly (readonly number[])[], rhs: readonly number[]): number[] {
  const k = rhs.length;
  const y = [...rhs];
  for (let i = 0; i < k; i++) {
    for (let m = 0; m < i; m++) y[i] -= lower[i][m] * y[m];
    y[i] /= lower[i][i];
  }
  for (let i = k - 1; i >= 0; i--) {
    for (let m = i + 1; m < k; m++) y[i] -= lower[m][i] * y[m];
    y[i] /= lower[i][i];
  }
  return y;
}
