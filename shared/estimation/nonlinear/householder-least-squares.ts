import { EstimationError } from '../estimation-error';
import { HouseholderQr } from '../least-squares/householder-qr';
import { largest } from '../numerics/extent';

/** Result of a small dense least-squares solve by Householder QR. */
export interface HouseholderSolution {
  /** The x minimising ‖A·x − b‖. */
  readonly solution: number[];
  /** R⁻¹ (p×p, upper triangular), so (AᵀA)⁻¹ = R⁻¹·R⁻ᵀ without forming AᵀA. */
  readonly rInverse: number[][];
}

/**
 * Solves min ‖A·x − b‖ for a tall matrix A given by rows (p columns, p small) with the engine's
 * Householder QR, which keeps the condition number of A rather than squaring it as the normal
 * equations would. Throws 'singular-design' when a column is (numerically) dependent on the others.
 */
export function householderLeastSquares(
  a: readonly (readonly number[])[],
  b: readonly number[],
  columnNames: readonly string[] = [],
): HouseholderSolution {
  const rows = a.length;
  const p = a[0]?.length ?? 0;
  if (rows < p || p === 0) {
    throw new EstimationError('too-few-observations', `need at least ${p} rows, got ${rows}`);
  }
  const columns = Array.from({ length: p }, (_, j) => Float64Array.from(a, (row) => row[j]));
  const scale = largest(columns.map((c) => Math.sqrt(c.reduce((s, v) => s + v * v, 0))));
  const qr = new HouseholderQr(columns);
  for (let j = 0; j < p; j++) {
    if (!(Math.abs(qr.rEntry(j, j)) > scale * 1e-14 * rows)) {
      throw new EstimationError(
        'singular-design',
        `column ${columnNames[j] ?? j + 1} is linearly dependent on the others`,
        columnNames[j],
      );
    }
  }
  const rhs = Float64Array.from(b);
  qr.applyQTranspose(rhs);
  const solution = Array.from(qr.solveR(rhs.subarray(0, p)));
  const inverseColumns = columns.map((_, j) =>
    qr.solveR(columns.map((__, i) => (i === j ? 1 : 0))),
  );
  const rInverse = columns.map((_, i) => inverseColumns.map((column) => column[i]));
  return { solution, rInverse };
}
