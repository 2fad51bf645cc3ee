import type {
  demandForms,
  instrumentChoices,
  regressionCovariates,
  standardErrorTypes,
} from '@shared/analysis/fit-spec';

/** Words for the model options, in the order the set-up offers them. */
export const formChoices: readonly { value: (typeof demandForms)[number]; label: string }[] = [
  { value: 'loglog', label: 'Log-log (constant elasticity)' },
  { value: 'linear', label: 'Linear' },
  { value: 'semilog', label: 'Semi-log (log quantity on price)' },
];

export const covariateChoices: readonly {
  value: (typeof regressionCovariates)[number];
  label: string;
}[] = [
  { value: 'income', label: 'Income (band midpoint)' },
  { value: 'household-size', label: 'Household size' },
];

export const standardErrorChoices: readonly {
  value: (typeof standardErrorTypes)[number];
  label: string;
}[] = [
  { value: 'hc1', label: 'Robust to unequal variance (HC1)' },
  { value: 'cluster-point', label: 'Clustered by sampling point' },
  { value: 'classical', label: 'Classical' },
];

export const instrumentChoiceLabels: readonly {
  value: (typeof instrumentChoices)[number];
  label: string;
}[] = [
  { value: 'none', label: 'None (ordinary least squares)' },
  { value: 'peer-price', label: 'Mean price at other points of the region (2SLS)' },
];

export const sourceChoices: readonly { value: 'shelf' | 'recall'; label: string }[] = [
  { value: 'shelf', label: 'Shelf observations (price, units sold)' },
  { value: 'recall', label: 'Purchase recall (price paid, units bought)' },
];
