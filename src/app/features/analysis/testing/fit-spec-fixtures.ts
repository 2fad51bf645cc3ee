import type { FitSpecOf } from '@shared/analysis/fit-spec';

/** What every method's spec carries, at the demo study's prices. */
export const commonSpecFields = {
  filters: { flagged: 'include' as const },
  weighting: null,
  priceGrid: { from: 500, to: 4000, steps: 8 },
  unitCost: null,
  confidenceLevel: 0.95,
};

/** A log-log least-squares fit on shelf observations with HC1 errors. */
export const shelfFitSpec: FitSpecOf<'observed-prices'> = {
  method: 'observed-prices',
  ...commonSpecFields,
  source: 'shelf',
  form: 'loglog',
  covariates: [],
  regionEffects: false,
  standardErrors: 'hc1',
  instrument: 'none',
};
