import { EstimationError } from '../estimation-error';
import { CompensatedSum } from './compensated-dot';
import { exactInstrumental } from './exact-instrumental';
import { exactLeastSquares, exactPathFits, type RawDesign } from './exact-least-squares';
import { HouseholderQr } from './householder-qr';
import { refineLeastSquares } from './refine-least-squares';
import { orthogonalSandwich } from './sandwich-covariance';

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
  /** Solved in exact rational arithmetic (see exactLeastSquares) rather than float64 QR. */
  readonly exact: boolean;
  /**
   * The robust sandwich (XᵀWX)⁻¹·M·(XᵀWX)⁻¹ over `groups` (rows when null). The float64 path
   * sums M from the given weighted residuals in the orthogonal basis of its QR; the exact path
   * sums it exactly from its own exact residuals (the structural ones under 2SLS) and ignores
   * them.
   */
  sandwich(groups: readonly number[] | null, weightedResiduals: Float64Array): number[][];
}

/**
 * Default refusal threshold for designs too large for the exact path: beyond it a float64 QR
 * keeps fewer than about 8 significant digits.
 */
export const DEFAULT_MAX_CONDITION_NUMBER = 1e8;

/**
 * Above this scaled condition number a float64 QR would lose more than about 4 of its 16
 * digits (and its robust errors as many), so designs small enough are solved exactly instead.
 */
export const EXACT_ABOVE_CONDITION_NUMBER = 1e4;

/**
 * Least squares on float64 columns (weighted: each row times √wᵢ; under 2SLS the fitted X̂):
 * columns are scaled by powers of two (exact, so the scaled problem is the same problem),
 * factorised by Householder QR and checked for rank and conditioning. Up to a scaled condition
 * number of 1e4, or when the design is too large for exact arithmetic, the QR solution is
 * refined with double-double residuals; above it, designs small enough (`exactPathFits`) are
 * solved exactly from `raw` — the data unweighted, the weights and instruments apart (default:
 * the columns as given) — so no digit depends on the conditioning.
 * Throws 'singular-design' naming the first column that depends on the ones before it, and
 * 'ill-conditioned' when a design too large for the exact path has a scaled condition number
 * above `maxConditionNumber` — float64 QR then pins too few digits of the coefficients down.
 */
export function solveLeastSquares(
  columns: readonly Float64Array[],
  y: Float64Array,
  names: readonly string[],
  maxConditionNumber = DEFAULT_MAX_CONDITION_NUMBER,
  raw: RawDesign = { columns, response: y, weights: null },
): LeastSquaresSolution {
  const scales = columns.map((column, j) => powerOfTwoNorm(column, names[j]));
  const scaled = columns.map((column, j) => column.map((value) => value / scales[j]));
  const qr = new HouseholderQr(scaled);
  checkRank(qr, names);
  const rInverse = invertR(qr);
  const conditionNumber = frobenius(qr) * frobeniusOfRows(rInverse);
  const width = columns.length + (raw.instruments?.length ?? 0);
  if (conditionNumber > EXACT_ABOVE_CONDITION_NUMBER && exactPathFits(y.length, width)) {
    return exactSolution(raw, names, conditionNumber);
  }
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
  // C = D⁻¹R⁻¹, the factor of the sandwich in the orthogonal basis of X.
  const factor = rInverse.map((row, i) => Array.from(row, (value) => value / scales[i]));
  let q: Float64Array[] | null = null;
  return {
    coefficients,
    residuals: refined.residuals,
    residualSumOfSquares: rss.value(),
    inverseGram: inverseGram(rInverse, scales),
    conditionNumber,
    exact: false,
    sandwich: (groups, weightedResiduals) =>
      orthogonalSandwich((q ??= qr.thinQ()), factor, weightedResiduals, groups),
  };
}

/** The exact fit, its residuals weighted like the float path's (√wᵢ·eᵢ). */
function exactSolution(
  raw: RawDesign,
  names: readonly string[],
  conditionNumber: number,
): LeastSquaresSolution {
  const solved = raw.instruments ? exactInstrumental(raw, names) : exactLeastSquares(raw, names);
  const rootWeights = raw.weights?.map(Math.sqrt);
  return {
    coefficients: solved.coefficients,
    residuals: rootWeights
      ? solved.rawResiduals.map((r, i) => r * rootWeights[i])
      : solved.rawResiduals,
    residualSumOfSquares: solved.residualSumOfSquares,
    inverseGram: solved.inverseGram,
    conditionNumber,
    exact: true,
    sandwich: (groups) => solved.sandwich(groups),
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
