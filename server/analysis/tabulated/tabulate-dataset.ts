import type { FitSpec } from '@shared/analysis/fit-spec';
import type { AnalysisDataset } from '../analysis-dataset';
import { frequencyTable, type StatedMethod, type StatedPattern } from './stated-cell';

/**
 * The frequency table of an in-memory dataset (one row per respondent), exactly as the
 * database builds it: what the tests compare the database's table with, and a way to run the
 * in-memory path on the product's estimator inputs.
 */
export function tabulateDataset<M extends StatedMethod>(
  dataset: AnalysisDataset<M>,
  spec: FitSpec,
): AnalysisDataset<M> {
  const rakes = spec.weighting !== null;
  const { rows, profiles } = frequencyTable<M>(
    dataset.rows.map((row) => {
      const { interviewId, count, ...pattern } = row as typeof row & { count?: number };
      // A ladder's steps in price order, as the database reads them (the analysis sorts anyway).
      if ('steps' in pattern) {
        const steps = pattern.steps as readonly { price: number; buy: number }[];
        Object.assign(pattern, { steps: [...steps].sort((a, b) => a.price - b.price) });
      }
      return {
        pattern: pattern as unknown as StatedPattern<M>,
        levels: rakes ? (dataset.profiles.get(interviewId)?.levels ?? null) : null,
        count: count ?? 1,
      };
    }),
  );
  return { ...dataset, rows, profiles };
}
