import type { FitSpec } from '@shared/analysis/fit-spec';
import type { AnalysisDataset, RowsByMethod } from './analysis-dataset';

type Cell = string | number | boolean | null;

/** Exactly the columns and rows a fit uses, in a fixed order: what the data hash covers. */
export interface DatasetTable {
  readonly columns: readonly string[];
  readonly rows: readonly (readonly Cell[])[];
}

/**
 * The dataset as the table the estimator reads for this spec: the method's columns, the
 * covariates, clusters, instrument and raking variables it uses, and nothing else.
 */
export function datasetTable(dataset: AnalysisDataset, spec: FitSpec): DatasetTable {
  const base = methodColumns(dataset, spec);
  const variables = spec.weighting?.margins.map((m) => m.variable) ?? [];
  const rows = base.rows.map((row) => {
    const profile = dataset.profiles.get(String(row[0]));
    return [...row, ...variables.map((v) => profile?.levels[v] ?? null)];
  });
  return { columns: [...base.columns, ...variables.map((v) => `level:${v}`)], rows };
}

function methodColumns(dataset: AnalysisDataset, spec: FitSpec): DatasetTable {
  const rows = <M extends keyof RowsByMethod>(_m: M) => dataset.rows as readonly RowsByMethod[M][];
  switch (spec.method) {
    case 'observed-prices': {
      const optional: [string, boolean, (r: RowsByMethod['observed-prices']) => Cell][] = [
        ['point', spec.standardErrors === 'cluster-point', (r) => r.pointId],
        ['region', spec.regionEffects, (r) => r.region],
        ['income', spec.covariates.includes('income'), (r) => r.income],
        ['household_size', spec.covariates.includes('household-size'), (r) => r.householdSize],
        ['peer_price', spec.instrument === 'peer-price', (r) => r.peerPrice],
      ];
      const used = optional.filter(([, on]) => on);
      return {
        columns: ['interview', 'price', 'quantity', ...used.map(([name]) => name)],
        rows: rows('observed-prices').map((r) => [
          r.interviewId,
          r.price,
          r.quantity,
          ...used.map(([, , read]) => read(r)),
        ]),
      };
    }
    case 'price-ladder':
      return {
        columns: ['interview', 'scale', 'price', 'buy'],
        rows: rows('price-ladder').flatMap((r) =>
          r.steps.map((s) => [r.interviewId, r.scale, s.price, s.buy]),
        ),
      };
    case 'price-thresholds':
      return {
        columns: [
          'interview',
          'too_cheap',
          'cheap',
          'expensive',
          'too_expensive',
          'likelihood_cheap',
          'likelihood_expensive',
        ],
        rows: rows('price-thresholds').map((r) => [
          r.interviewId,
          r.tooCheap,
          r.cheap,
          r.expensive,
          r.tooExpensive,
          r.likelihoodCheap,
          r.likelihoodExpensive,
        ]),
      };
    case 'wtp-open':
      return {
        columns: ['interview', 'amount'],
        rows: rows('wtp-open').map((r) => [r.interviewId, r.amount]),
      };
    case 'payment-card':
      return {
        columns: ['interview', 'lower', 'upper'],
        rows: rows('payment-card').map((r) => [r.interviewId, r.lower, r.upper]),
      };
    case 'dichotomous-choice':
      return {
        columns: ['interview', 'bid', 'yes', 'bid2', 'yes2'],
        rows: rows('dichotomous-choice').map((r) => [r.interviewId, r.bid, r.yes, r.bid2, r.yes2]),
      };
  }
}
