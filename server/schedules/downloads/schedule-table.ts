import type { ScheduleVersion } from '@shared/analysis/schedule-version';

export type TableCell = number | string | boolean | null;

/** The columns every download and the read API's CSV share, in this order. */
export function scheduleColumns(version: Pick<ScheduleVersion, 'quantityKind'>): string[] {
  const quantity = version.quantityKind === 'share' ? 'purchase_share' : 'quantity';
  return [
    'price',
    quantity,
    'ci_low',
    'ci_high',
    'revenue',
    'elasticity',
    'extrapolated',
    'respondents',
  ];
}

/** The schedule's rows as table cells, in `scheduleColumns` order. */
export function scheduleCells(version: Pick<ScheduleVersion, 'rows'>): TableCell[][] {
  return version.rows.map((r) => [
    r.price,
    r.quantity,
    r.ciLow,
    r.ciHigh,
    r.revenue,
    r.elasticity,
    r.extrapolated,
    r.respondents,
  ]);
}

/** One line saying what the numbers are: estimates, from which method and sample. */
export function estimateNote(version: ScheduleVersion): string {
  return (
    `Estimate: demand schedule "${version.title}", version ${version.version}, study "${version.studyName}"; ` +
    `${version.methodLabel}; n = ${version.n}; ${Math.round(version.confidenceLevel * 100)} % intervals; ` +
    `prices in ${version.currency}; data hash ${version.dataHash}. Every figure is an estimate with ` +
    'uncertainty, not advice.'
  );
}

/** A file name for downloads: the study, the version and the extension. */
export function downloadName(version: ScheduleVersion, extension: string): string {
  const slug = version.studyName
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 60);
  return `${slug || 'schedule'}-v${version.version}.${extension}`;
}
