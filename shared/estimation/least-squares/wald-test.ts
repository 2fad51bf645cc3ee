import { EstimationError } from '../estimation-error';

/**
 * Wald statistic divided by q for H0: β_j = 0 for every j in `indices`:
 * F = βₛᵀ·Vₛₛ⁻¹·βₛ / q, with Vₛₛ the covariance block of those coefficients.
 */
export function waldF(
  estimates: ArrayLike<number>,
  covariance: readonly (readonly number[])[],
  indices: readonly number[],
): number {
  const q = indices.length;
  const block = indices.map((a) => indices.map((b) => covariance[a][b]));
  const beta = indices.map((a) => estimates[a]);
  const solved = solveSymmetric(block, beta);
  return beta.reduce((sum, value, i) => sum + value * solved[i], 0) / q;
}

/** Gaussian elimination with partial pivoting on a small q×q system. */
function solveSymmetric(matrix: number[][], rhs: number[]): number[] {
  const q = rhs.length;
  const a = matrix.map((row, i) => [...row, rhs[i]]);
  for (let c = 0; c < q; c++) {
    let pivot = c;
    for (let r = c + 1; r < q; r++) if (Math.abs(a[r][c]) > Math.abs(a[pivot][c])) pivot = r;
    if (a[pivot][c] === 0) {
      throw new EstimationError('singular-covariance', 'the Wald test covariance is singular');
    }
    [a[c], a[pivot]] = [a[pivot], a[c]];
    for (let r = c + 1; r < q; r++) {
      const f = a[r][c] / a[c][c];
      for (let m = c; m <= q; m++) a[r][m] -= f * a[c][m];
    }
  }
  const x = new Array<number>(q).fill(0);
  for (let i = q - 1; i >= 0; i--) {
    let s = a[i][q];
    for (let j = i + 1; j < q; j++) s -= a[i][j] * x[j];
    x[i] = s / a[i][i];
  }
  return x;
}
