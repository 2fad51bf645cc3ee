import { CompensatedSum } from './compensated-dot';
import { HouseholderQr } from './householder-qr';
import { largest } from '../numerics/extent';

/** A least-squares solution z with its residual r = b − A·z, after refinement. */
export interface RefinedSolution {
  readonly solution: Float64Array;
  readonly residuals: Float64Array;
  /** Refinement steps taken after the plain QR solve. */
  readonly steps: number;
}

const MAX_STEPS = 12;

/**
 * Solves min ‖b − A·z‖ by QR, then refines z and r together on the augmented system
 * [I A; Aᵀ 0]·[r; z] = [b; 0] (Björck's method), with the system residuals accumulated in
 * double-double. A plain float64 QR loses digits in proportion to κ(A)²·‖r‖ on large-residual
 * problems; the refinement restores close to full float64 accuracy whenever κ(A)·ε ≪ 1.
 */
export function refineLeastSquares(
  columns: readonly Float64Array[],
  qr: HouseholderQr,
  b: Float64Array,
): RefinedSolution {
  const qtb = Float64Array.from(b);
  qr.applyQTranspose(qtb);
  const solution = qr.solveR(qtb.subarray(0, qr.cols));
  const residuals = new Float64Array(b.length);
  for (let i = 0; i < b.length; i++) residuals[i] = rowResidual(columns, b, residuals, solution, i);
  let previous = Infinity;
  let steps = 0;
  while (steps < MAX_STEPS) {
    const size = correctOnce(columns, qr, b, solution, residuals);
    steps++;
    const scale = Math.max(largest(solution.map(Math.abs)), Number.MIN_VALUE);
    // Stop once corrections are at rounding level, or stop shrinking (no further gain possible).
    if (size <= 2 ** -52 * scale || size >= previous / 2) break;
    previous = size;
  }
  return { solution, residuals, steps };
}

/** One refinement step; returns the largest change applied to z. */
function correctOnce(
  columns: readonly Float64Array[],
  qr: HouseholderQr,
  b: Float64Array,
  z: Float64Array,
  r: Float64Array,
): number {
  const n = b.length;
  const k = columns.length;
  const f = new Float64Array(n);
  for (let i = 0; i < n; i++) f[i] = rowResidual(columns, b, r, z, i);
  const g = new Float64Array(k);
  for (let j = 0; j < k; j++) {
    const sum = new CompensatedSum();
    const column = columns[j];
    for (let i = 0; i < n; i++) sum.addProduct(-column[i], r[i]);
    g[j] = sum.value();
  }
  // [I A; Aᵀ 0]·[dr; dz] = [f; g] with A = Q₁R: h = R⁻ᵀg, d = Qᵀf, dz = R⁻¹(d₁ − h), dr = Q·[h; d₂].
  const h = qr.solveRTranspose(g);
  qr.applyQTranspose(f);
  const dz = qr.solveR(f.subarray(0, k).map((value, j) => value - h[j]));
  f.set(h, 0);
  qr.applyQ(f);
  let size = 0;
  for (let j = 0; j < k; j++) {
    z[j] += dz[j];
    size = Math.max(size, Math.abs(dz[j]));
  }
  for (let i = 0; i < n; i++) r[i] += f[i];
  return size;
}

/** b[i] − r[i] − Σⱼ A[i][j]·z[j], accumulated in double-double. */
function rowResidual(
  columns: readonly Float64Array[],
  b: Float64Array,
  r: Float64Array,
  z: Float64Array,
  i: number,
): number {
  const sum = new CompensatedSum(b[i]);
  sum.add(-r[i]);
  for (let j = 0; j < columns.length; j++) sum.addProduct(-columns[j][i], z[j]);
  return sum.value();
}
