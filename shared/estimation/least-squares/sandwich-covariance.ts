import { largest } from '../numerics/extent';
import { CompensatedSum } from './compensated-dot';

/**
 * The sandwich (XᵀX)⁻¹·M·(XᵀX)⁻¹, M = Σ_g s_g·s_gᵀ with s_g = Σ_{i∈g} xᵢ·eᵢ (each row its own
 * group when `groups` is null, i.e. HC0), computed in the orthogonal basis of X = Q₁·R·D (D the
 * column scales): the meat is summed from the rows of Q₁ scaled by the residuals, M_Q, and the
 * sandwich is C·M_Q·Cᵀ with C = D⁻¹R⁻¹. Formed from XᵀX instead, every rounding in M is
 * multiplied by the square of the condition number; here the rows are orthonormal, and only
 * the triangular factor carries the conditioning — the same loss as the classical errors.
 * Rows and residuals are the weighted ones (already multiplied by √wᵢ).
 */
export function orthogonalSandwich(
  q: readonly Float64Array[],
  rInverse: readonly (readonly number[])[],
  residuals: Float64Array,
  groups: readonly number[] | null,
): number[][] {
  const k = q.length;
  const scores = groups ? groupScores(q, residuals, groups) : rowScores(q, residuals);
  const meat = Array.from({ length: k }, (_, a) =>
    Array.from({ length: k }, (_, b) => {
      const sum = new CompensatedSum();
      for (const score of scores) sum.addProduct(score[a], score[b]);
      return sum.value();
    }),
  );
  const left = rInverse.map((row) =>
    meat[0].map((_, b) => {
      const sum = new CompensatedSum();
      row.forEach((value, c) => sum.addProduct(value, meat[c][b]));
      return sum.value();
    }),
  );
  return left.map((row) =>
    rInverse.map((other) => {
      const sum = new CompensatedSum();
      row.forEach((value, c) => sum.addProduct(value, other[c]));
      return sum.value();
    }),
  );
}

function rowScores(q: readonly Float64Array[], residuals: Float64Array): Float64Array[] {
  return Array.from(residuals, (e, i) => Float64Array.from(q, (column) => column[i] * e));
}

function groupScores(
  q: readonly Float64Array[],
  residuals: Float64Array,
  groups: readonly number[],
): number[][] {
  const count = largest(groups) + 1;
  const sums = Array.from({ length: count }, () => q.map(() => new CompensatedSum()));
  residuals.forEach((e, i) => {
    const sum = sums[groups[i]];
    q.forEach((column, j) => sum[j].addProduct(column[i], e));
  });
  return sums.map((row) => row.map((s) => s.value()));
}
