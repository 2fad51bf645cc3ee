import type { StandardErrorSummary } from '@shared/estimation/least-squares/linear-fit';
import type { Meat } from './meat-pass';

/** The pieces of the sandwich, all in the shifted coordinates z = [1, x − c]. */
export interface SandwichInput {
  /** (ZᵀWZ)⁻¹ from the exact solve of the (weight-rescaled) moments. */
  readonly inverseGram: readonly (readonly number[])[];
  readonly meat: Meat;
  /** n/Σw (1 unweighted): the meat is rescaled by its square to match the inverse. */
  readonly weightScale: number;
  /** Shifts of the regressors (the intercept's row of the back-transformation). */
  readonly regressorShifts: readonly number[] | null;
  readonly n: number;
  readonly clusterColumn?: string;
}

/**
 * HC1: B·M·B × n/(n − k), t on n − k df; cluster-robust: × G/(G − 1)·(n − 1)/(n − k), t on
 * G − 1 df (the in-memory fit's conventions). Formed in the shifted coordinates, where B is
 * well conditioned, then carried back to the model's own intercept: with b₀ = a − cᵀb the
 * covariance is A·V·Aᵀ, A = [[1, −cᵀ], [0, I]].
 */
export function robustCovariance(input: SandwichInput): {
  matrix: number[][];
  summary: StandardErrorSummary;
} {
  const k = input.inverseGram.length;
  const n = input.n;
  const meat = input.meat.matrix.map((row) => row.map((v) => v * input.weightScale ** 2));
  const sandwich = multiply(multiply(input.inverseGram, meat), input.inverseGram);
  const clusters = input.meat.clusters;
  const factor =
    clusters === null ? n / (n - k) : (clusters / (clusters - 1)) * ((n - 1) / (n - k));
  const scaled = sandwich.map((row) => row.map((v) => v * factor));
  const matrix = input.regressorShifts ? backToModel(scaled, input.regressorShifts) : scaled;
  const summary: StandardErrorSummary =
    clusters === null
      ? { type: 'hc1', smallSampleFactor: factor, df: n - k }
      : {
          type: 'cluster',
          smallSampleFactor: factor,
          df: clusters - 1,
          clusterColumn: input.clusterColumn,
          clusters,
        };
  return { matrix, summary };
}

/** A·V·Aᵀ for A = [[1, −cᵀ], [0, I]]. */
function backToModel(v: number[][], shifts: readonly number[]): number[][] {
  const a = v.map((_, i) =>
    v.map((_, j) => (i === 0 ? (j === 0 ? 1 : -shifts[j - 1]) : i === j ? 1 : 0)),
  );
  const transposed = a[0].map((_, j) => a.map((row) => row[j]));
  return multiply(multiply(a, v), transposed);
}

function multiply(
  a: readonly (readonly number[])[],
  b: readonly (readonly number[])[],
): number[][] {
  return a.map((row) =>
    b[0].map((_, j) => row.reduce((sum, value, m) => sum + value * b[m][j], 0)),
  );
}
