import { EstimationError } from '../estimation-error';
import { CompensatedSum } from './compensated-dot';
import { HouseholderQr } from './householder-qr';
import { refineLeastSquares } from './refine-least-squares';

/** The numerical core of a least-squares fit. */
export interface LeastSquaresSolution {
  /** β minimising ‖y − X·β‖. */
  readonly coefficients: Float64Array;
  /** y − X·β, refined together with β. */
  readonly residuals: Float64Array;
  /** Σ residual², accumulated in double-double. */
  readonly residualSumOfSquares: number;
  /** (XᵀX)⁻¹, k×k. */
  readonly inverseGram: number[][];
  /** Frobenius condition number of X after scaling every column to unit length (≈ power of 2). */
  readonly conditionNumber: number;
}

/** Default refusal threshold: beyond it fewer than about 8 significant digits are trustworthy. */
export const DEFAULT_MAX_CONDITION_NUMBER = 1e8;

/**
 * Least squares on float64 columns: columns are scaled by powers of two (exact, so the scaled
 * problem is the same problem), factorised by Householder QR, checked for rank and
 * conditioning, and the solution refined with double-double residuals.
 * Throws 'singular-design' naming the first column that depends on the ones before it, and
 * 'ill-conditioned' when the scaled condition number exceeds `maxConditionNumber` — data stored
 * as float64 then carry too little information to pin the coefficients down.
 */
export function solveLeastSquares(
  columns: readonly Float64Array[],
  y: Float64Array,
  names: readonly string[],
  maxConditionNumber = DEFAULT_MAX_CONDITION_NUMBER,
): LeastSquaresSolution {
  const scales = columns.map((column, j) => powerOfTwoNorm(column, names[j]));
  const scaled = columns.map((column, j) => column.map((value) => value / scales[j]));
  const qr = new HouseholderQr(scaled);
  checkRank(qr, names);
  const rInverse = invertR(qr);
  const conditionNumber = frobenius(qr) * frobeniusOfRows(rInverse);
  if (!(conditionNumber <= maxConditionNumber)) {
    throw new EstimationError(
      'ill-conditioned',
      `the design is too ill-conditioned to estimate reliably (scaled condition number ` +
        `${conditionNumber.toExponential(2)} > ${maxConditionNumber.toExponential(0)}); centre or ` +
        `rescale the columns, or drop nearly collinear ones (${names.join(', ')})`,
    );
  }
  const refined = refineLeastSquares(scaled, qr, y);
  const coefficients = refined.solution.map((z, j) => z / scales[j]);
  const rss = new CompensatedSum();
  for (const r of refined.residuals) rss.addProduct(r, r);
  return {
    coefficients,
    residuals: refined.residuals,
    residualSumOfSquares: rss.value(),
    inverseGram: inverseGram(rInverse, scales),
    conditionNumber,
  };
}

function powerOfTwoNorm(column: Float64Array, name: string): number {
  let norm = 0;
  for (const value of column) norm = Math.hypot(norm, value);
  if (norm === 0) {
    throw new EstimationError('singular-design', `column ${name} is zero in every row`, name);
  }
  return 2 ** Math.round(Math.log2(norm));
}

function checkRank(qr: HouseholderQr, names: readonly string[]): void {
  let largest = 0;
  for (let j = 0; j < qr.cols; j++) largest = Math.max(largest, Math.abs(qr.rEntry(j, j)));
  const tolerance = Math.max(qr.rows, qr.cols) * 2 ** -52 * largest;
  for (let j = 0; j < qr.cols; j++) {
    if (Math.abs(qr.rEntry(j, j)) <= tolerance) {
      const earlier = names.slice(0, j).join(', ') || 'nothing';
      throw new EstimationError(
        'singular-design',
        `column ${names[j]} is a linear combination of the columns before it (${earlier}); ` +
          `drop it or the column it duplicates`,
        names[j],
      );
    }
  }
}

/** R⁻¹ by rows (upper triangular), one back substitution per unit vector. */
function invertR(qr: HouseholderQr): Float64Array[] {
  const k = qr.cols;
  const inverse = Array.from({ length: k }, () => new Float64Array(k));
  for (let j = 0; j < k; j++) {
    const column = qr.solveR(Float64Array.from({ length: k }, (_, i) => (i === j ? 1 : 0)));
    for (let i = 0; i < k; i++) inverse[i][j] = column[i];
  }
  return inverse;
}

function frobenius(qr: HouseholderQr): number {
  let sum = 0;
  for (let i = 0; i < qr.cols; i++) {
    for (let j = i; j < qr.cols; j++) sum += qr.rEntry(i, j) ** 2;
  }
  return Math.sqrt(sum);
}

function frobeniusOfRows(rows: readonly Float64Array[]): number {
  return Math.sqrt(rows.reduce((sum, row) => sum + row.reduce((s, v) => s + v * v, 0), 0));
}

/** (XᵀX)⁻¹ = D⁻¹·R⁻¹·R⁻ᵀ·D⁻¹ for the column scales D. */
function inverseGram(rInverse: readonly Float64Array[], scales: readonly number[]): number[][] {
  const k = scales.length;
  return Array.from({ length: k }, (_, i) =>
    Array.from({ length: k }, (_, j) => {
      const sum = new CompensatedSum();
      for (let m = Math.max(i, j); m < k; m++) sum.addProduct(rInverse[i][m], rInverse[j][m]);
      return sum.value() / (scales[i] * scales[j]);
    }),
  );
}
