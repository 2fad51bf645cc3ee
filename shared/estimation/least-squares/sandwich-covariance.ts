import { largest } from '../numerics/extent';
/**
 * The sandwich B·M·B with B = (XᵀX)⁻¹ and the meat M = Σ_g s_g·s_gᵀ, where s_g sums the scores
 * xᵢ·eᵢ over the rows of group g (each row its own group when `groups` is null, i.e. HC0).
 * Rows and residuals are the weighted ones (already multiplied by √wᵢ).
 */
export function sandwichCovariance(
  columns: readonly Float64Array[],
  residuals: Float64Array,
  inverseGram: readonly (readonly number[])[],
  groups: readonly number[] | null,
): number[][] {
  const k = columns.length;
  const scores = groups ? groupScores(columns, residuals, groups) : rowScores(columns, residuals);
  const meat = Array.from({ length: k }, () => new Array<number>(k).fill(0));
  for (const score of scores) {
    for (let a = 0; a < k; a++) {
      for (let b = 0; b < k; b++) meat[a][b] += score[a] * score[b];
    }
  }
  return multiply(multiply(inverseGram, meat), inverseGram);
}

function rowScores(columns: readonly Float64Array[], residuals: Float64Array): Float64Array[] {
  return Array.from(residuals, (e, i) => Float64Array.from(columns, (column) => column[i] * e));
}

function groupScores(
  columns: readonly Float64Array[],
  residuals: Float64Array,
  groups: readonly number[],
): Float64Array[] {
  const count = largest(groups) + 1;
  const scores = Array.from({ length: count }, () => new Float64Array(columns.length));
  residuals.forEach((e, i) => {
    const score = scores[groups[i]];
    columns.forEach((column, j) => (score[j] += column[i] * e));
  });
  return scores;
}

function multiply(
  a: readonly (readonly number[])[],
  b: readonly (readonly number[])[],
): number[][] {
  return a.map((row) =>
    b[0].map((_, j) => row.reduce((sum, value, m) => sum + value * b[m][j], 0)),
  );
}
