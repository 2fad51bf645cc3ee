import type { FitSpec } from '@shared/analysis/fit-spec';
import { rakingVariableLabels } from '@shared/analysis/weighting-spec';
import type { FigureFormat } from '../figures/figure-format';
import { levelLabel } from '../figures/figure-format';

const forms = { linear: 'linear', loglog: 'log-log', semilog: 'semi-log' } as const;
const errors = {
  classical: 'classical errors',
  hc1: 'HC1 errors',
  'cluster-point': 'errors clustered by point',
} as const;
const covariates = { income: '+ income', 'household-size': '+ household size' } as const;

/** The options only some methods have: how the model itself was set. */
function modelDetails(spec: FitSpec): string[] {
  switch (spec.method) {
    case 'observed-prices':
      return [
        spec.source === 'shelf' ? 'shelf observations' : 'purchase recall',
        forms[spec.form],
        ...spec.covariates.map((c) => covariates[c]),
        ...(spec.regionEffects ? ['region effects'] : []),
        spec.instrument === 'peer-price' ? 'instrumented by peer price (2SLS)' : 'no instrument',
        errors[spec.standardErrors],
      ];
    case 'wtp-open':
      return [`${spec.bootstrap.replicates} resamples, seed ${spec.bootstrap.seed}`];
    case 'payment-card':
      return [`${spec.distribution} WTP`];
    default:
      return [];
  }
}

/** Which interviews the fit read, and how they were weighted. */
function dataDetails(spec: FitSpec, format: FigureFormat | null): string[] {
  const f = spec.filters;
  const day = (iso: string) =>
    new Intl.DateTimeFormat(format?.locale ?? 'en', {
      day: 'numeric',
      month: 'short',
      timeZone: 'UTC',
    }).format(new Date(`${iso}T00:00:00Z`));
  const filters = [
    ...(f.from || f.to ? [`${f.from ? day(f.from) : 'first'}–${f.to ? day(f.to) : 'latest'}`] : []),
    ...(f.routeIds?.length
      ? [`${f.routeIds.length} route${f.routeIds.length > 1 ? 's' : ''}`]
      : []),
    ...(f.regions?.length
      ? [f.regions.length <= 2 ? f.regions.join(', ') : `${f.regions.length} regions`]
      : []),
    ...(f.flagged === 'exclude' ? ['flagged left out'] : []),
  ];
  const weighting = spec.weighting
    ? `raked to ${spec.weighting.margins.map((m) => rakingVariableLabels[m.variable].toLowerCase()).join(', ')}`
    : 'unweighted';
  return [...(filters.length ? filters : ['all interviews']), weighting];
}

/** Settings that rarely differ between fits: shown only where they tell fits apart. */
function settingDetails(spec: FitSpec, format: FigureFormat | null): Record<string, string> {
  const money = (v: number) => format?.value(v, 'price') ?? String(v);
  const grid = spec.priceGrid;
  return {
    block: spec.blockId ? `block ${spec.blockId}` : 'first block',
    level: `${levelLabel(spec.confidenceLevel)} band`,
    unitCost: spec.unitCost === null ? 'no unit cost' : `unit cost ${money(spec.unitCost)}`,
    grid: `grid ${money(grid.from)}–${money(grid.to)}, ${grid.steps} prices`,
  };
}

/**
 * A short line telling each fit apart from the others listed: its model options, the interviews
 * it read and its weighting, plus any setting (block, band level, unit cost, price grid) on which
 * fits of the same method differ. Keyed by fit id.
 */
export function fitDistinctions(
  fits: readonly { readonly id: string; readonly spec: FitSpec }[],
  format: FigureFormat | null = null,
): Map<string, string> {
  const settings = new Map(fits.map((fit) => [fit.id, settingDetails(fit.spec, format)]));
  const lines = new Map<string, string>();
  for (const fit of fits) {
    const mine = settings.get(fit.id)!;
    const peers = fits.filter((other) => other.spec.method === fit.spec.method);
    const differing = Object.keys(mine).filter((key) =>
      peers.some((peer) => settings.get(peer.id)![key] !== mine[key]),
    );
    const parts = [
      ...modelDetails(fit.spec),
      ...dataDetails(fit.spec, format),
      ...differing.map((key) => mine[key]),
    ];
    lines.set(fit.id, parts.join(' · '));
  }
  return lines;
}
