import { EstimationError } from '../estimation-error';
import type { StandardErrorSummary } from './linear-fit';
import { checkLabelColumn, type LabelColumn } from './named-column';

/** Which standard errors to report. */
export type StandardErrorSpec =
  | { readonly type: 'classical' }
  | { readonly type: 'hc1' }
  | { readonly type: 'cluster'; readonly clusters: LabelColumn };

/** What the covariance estimators need from a solved fit. */
export interface CovarianceInput {
  readonly n: number;
  /** Coefficients (columns of the bread: X, or X̂ for 2SLS). */
  readonly k: number;
  readonly inverseGram: readonly (readonly number[])[];
  readonly residualSumOfSquares: number;
  /** The sandwich (XᵀWX)⁻¹·M·(XᵀWX)⁻¹ over clusters (rows when null), without any factor. */
  sandwich(groups: readonly number[] | null): number[][];
}

/** The coefficient covariance and how it was made. */
export interface CoefficientCovariance {
  readonly matrix: number[][];
  readonly summary: StandardErrorSummary;
}

/**
 * Classical: s²·(XᵀX)⁻¹ with s² = RSS/(n − k), t on n − k df.
 * HC1: the White sandwich × n/(n − k), t on n − k df.
 * Cluster: the sandwich over cluster sums × G/(G − 1)·(n − 1)/(n − k), t on G − 1 df
 * (common practice for few clusters).
 */
export function coefficientCovariance(
  input: CovarianceInput,
  spec: StandardErrorSpec,
): CoefficientCovariance {
  const { n, k } = input;
  const dfResidual = n - k;
  if (spec.type === 'classical') {
    const s2 = input.residualSumOfSquares / dfResidual;
    const matrix = input.inverseGram.map((row) => row.map((v) => v * s2));
    return { matrix, summary: { type: 'classical', smallSampleFactor: 1, df: dfResidual } };
  }
  if (spec.type === 'hc1') {
    const factor = n / dfResidual;
    const sandwich = input.sandwich(null);
    const matrix = sandwich.map((row) => row.map((v) => v * factor));
    return { matrix, summary: { type: 'hc1', smallSampleFactor: factor, df: dfResidual } };
  }
  const { indices, count } = clusterIndices(spec.clusters, n);
  const factor = (count / (count - 1)) * ((n - 1) / dfResidual);
  const sandwich = input.sandwich(indices);
  return {
    matrix: sandwich.map((row) => row.map((v) => v * factor)),
    summary: {
      type: 'cluster',
      smallSampleFactor: factor,
      df: count - 1,
      clusterColumn: spec.clusters.name,
      clusters: count,
    },
  };
}

function clusterIndices(column: LabelColumn, n: number): { indices: number[]; count: number } {
  checkLabelColumn(column, n);
  const ids = new Map<string, number>();
  const indices = column.values.map((label) => {
    const key = String(label);
    if (!ids.has(key)) ids.set(key, ids.size);
    return ids.get(key)!;
  });
  if (ids.size < 2) {
    throw new EstimationError(
      'too-few-clusters',
      `cluster-robust standard errors need at least 2 clusters; column ${column.name} has ${ids.size}`,
      column.name,
    );
  }
  return { indices, count: ids.size };
}
