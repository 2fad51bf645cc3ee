import { analysisMethodLabels } from '@shared/analysis/analysis-method';
import type { FitSpec } from '@shared/analysis/fit-spec';
import { rakingVariableLabels } from '@shared/analysis/weighting-spec';
import { countOf, priceWriter } from '../../analysis/price-text';

export type SpecLine = readonly [label: string, text: string];

const forms = {
  loglog: 'Log-log (constant elasticity)',
  linear: 'Linear',
  semilog: 'Semi-log (log quantity on price)',
} as const;
const standardErrors = {
  hc1: 'Robust to unequal variance (HC1)',
  'cluster-point': 'Clustered by sampling point',
  classical: 'Classical',
} as const;
const covariates = { income: 'income (band midpoint)', 'household-size': 'household size' };

/**
 * How a fit was specified, as lines a client reads (method, interviews, weighting, price grid,
 * the model's options) rather than the stored JSON.
 */
export function specLines(spec: FitSpec, currency: string): SpecLine[] {
  const money = priceWriter(currency);
  const { from, to, steps } = spec.priceGrid;
  return [
    ['Method', analysisMethodLabels[spec.method]],
    ['Interviews', interviewsText(spec.filters)],
    ['Weighting', weightingText(spec.weighting)],
    ['Price grid', `${countOf(steps, 'price')} from ${money(from)} to ${money(to)}`],
    ['Unit cost', spec.unitCost === null ? 'none given' : money(spec.unitCost)],
    ['Confidence level', `${Math.round(spec.confidenceLevel * 1000) / 10} %`],
    ...methodLines(spec),
  ];
}

function interviewsText(filters: FitSpec['filters']): string {
  const parts = ['accepted interviews'];
  if (filters.from || filters.to)
    parts.push(`finished ${filters.from ?? '…'} to ${filters.to ?? '…'}`);
  if (filters.routeIds?.length) parts.push(`on ${countOf(filters.routeIds.length, 'route')}`);
  if (filters.regions?.length) parts.push(`in ${filters.regions.join(', ')}`);
  parts.push(filters.flagged === 'exclude' ? 'without quality flags' : 'flagged ones included');
  return parts.join(', ');
}

function weightingText(weighting: FitSpec['weighting']): string {
  if (!weighting) return 'none: every respondent counts once';
  const margins = weighting.margins.map((m) => rakingVariableLabels[m.variable].toLowerCase());
  return `raked to population margins of ${margins.join(', ')}`;
}

function methodLines(spec: FitSpec): SpecLine[] {
  switch (spec.method) {
    case 'observed-prices':
      return [
        ['Data', spec.source === 'shelf' ? 'Shelf observations' : 'Purchase recall'],
        ['Demand form', forms[spec.form]],
        [
          'Covariates',
          spec.covariates.length ? spec.covariates.map((c) => covariates[c]).join(', ') : 'none',
        ],
        ['Region effects', spec.regionEffects ? 'yes' : 'no'],
        ['Standard errors', standardErrors[spec.standardErrors]],
        [
          'Instrument',
          spec.instrument === 'peer-price'
            ? 'Mean price at other points of the region (two-stage least squares)'
            : 'none (ordinary least squares)',
        ],
      ];
    case 'wtp-open':
      return [
        [
          'Resampling',
          `${spec.bootstrap.replicates} respondent resamples, starting number ${spec.bootstrap.seed}`,
        ],
      ];
    case 'payment-card':
      return [['Distribution of willingness to pay', spec.distribution]];
    default:
      return [];
  }
}
