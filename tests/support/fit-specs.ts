import type { FitSpec, FitSpecOf } from '@shared/analysis/fit-spec';
import type { WeightingSpec } from '@shared/analysis/weighting-spec';

/** What every test fit states unless it says otherwise (prices in KES, the demo's currency). */
export const commonSpec = {
  filters: { flagged: 'include' as const },
  weighting: null,
  priceGrid: { from: 900, to: 2500, steps: 9 },
  unitCost: 600,
  confidenceLevel: 0.95,
};

/** A log-log shelf fit, the demo's constant-elasticity truth. */
export const shelfLogLog: FitSpecOf<'observed-prices'> = {
  method: 'observed-prices',
  ...commonSpec,
  source: 'shelf',
  form: 'loglog',
  covariates: [],
  regionEffects: true,
  standardErrors: 'hc1',
  instrument: 'none',
};

/** Raking margins for the lantern households (income band values of the demo questionnaire). */
export const lanternMargins: WeightingSpec = {
  margins: [
    {
      variable: 'income-band',
      targets: {
        'under-10k': 0.3,
        '10k-25k': 0.3,
        '25k-50k': 0.2,
        'over-50k': 0.12,
        'not-stated': 0.08,
      },
    },
    {
      variable: 'region',
      targets: { 'North shore': 0.4, 'South shore': 0.35, 'Hill villages': 0.25 },
    },
  ],
};

/** One spec of every method and several options, for the queue test. */
export const manySpecs: FitSpec[] = [
  shelfLogLog,
  { ...shelfLogLog, form: 'linear', standardErrors: 'classical', regionEffects: false },
  { ...shelfLogLog, form: 'semilog', standardErrors: 'cluster-point' },
  { ...shelfLogLog, instrument: 'peer-price', regionEffects: false },
  { method: 'price-ladder', ...commonSpec },
  { method: 'price-ladder', ...commonSpec, weighting: lanternMargins },
  { method: 'price-thresholds', ...commonSpec },
  { method: 'wtp-open', ...commonSpec, bootstrap: { replicates: 400, seed: 11 } },
  { method: 'payment-card', ...commonSpec, distribution: 'normal' },
  { method: 'payment-card', ...commonSpec, distribution: 'logistic', weighting: lanternMargins },
  { method: 'dichotomous-choice', ...commonSpec },
  { method: 'dichotomous-choice', ...commonSpec, filters: { flagged: 'exclude' } },
];
