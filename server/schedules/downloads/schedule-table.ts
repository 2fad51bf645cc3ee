import type { ScheduleVersion } from '@shared/analysis/schedule-version';

export type TableCell = number | string | boolean | null;

type Columns = Pick<ScheduleVersion, 'quantityKind' | 'currency' | 'confidenceLevel'>;

/** "95 %" for 0.95. */
export const levelText = (confidenceLevel: number) =>
  `${Math.round(confidenceLevel * 1000) / 10} %`;

/** The schedule's column headers in words, with the currency and interval level they are in. */
export function scheduleColumns(version: Columns): string[] {
  const level = levelText(version.confidenceLevel);
  const share = version.quantityKind === 'share';
  return [
    `Price (${version.currency})`,
    share ? 'Purchase share (estimate)' : 'Quantity (estimate)',
    `${level} interval low`,
    `${level} interval high`,
    share ? `Revenue per potential buyer (${version.currency})` : `Revenue (${version.currency})`,
    'Elasticity',
    'Extrapolated',
    'Respondents',
  ];
}

/** Digits after the point of the currency's minor unit (2 for KES, 0 for JPY). */
export function minorDigits(currency: string): number {
  return (
    new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions()
      .maximumFractionDigits ?? 2
  );
}

const roundTo = (digits: number) => (value: number | null) =>
  value === null ? null : Number(value.toFixed(digits));

// Quantities span units to millions: four significant digits, never below whole units' worth.
const roundQuantity = (value: number | null) =>
  value === null
    ? null
    : Math.abs(value) >= 1000
      ? Math.round(value)
      : Number(value.toPrecision(4));

/**
 * The schedule's rows as table cells, in `scheduleColumns` order, rounded as a reader uses them:
 * shares to 4 decimals, money to the currency's minor unit, elasticities to 3 decimals.
 */
export function scheduleCells(
  version: Pick<ScheduleVersion, 'rows' | 'quantityKind' | 'currency'>,
): TableCell[][] {
  const money = roundTo(minorDigits(version.currency));
  const amount = version.quantityKind === 'share' ? roundTo(4) : roundQuantity;
  const elasticity = roundTo(3);
  return version.rows.map((r) => [
    money(r.price),
    amount(r.quantity),
    amount(r.ciLow),
    amount(r.ciHigh),
    money(r.revenue),
    elasticity(r.elasticity),
    r.extrapolated ? 'yes' : 'no',
    r.respondents,
  ]);
}

/** One line saying what the numbers are: estimates, from which method and sample. */
export function estimateNote(version: ScheduleVersion): string {
  return (
    `Estimate: demand schedule “${version.title}”, version ${version.version}, study “${version.studyName}”; ` +
    `${version.methodLabel}; n = ${version.n}; ${levelText(version.confidenceLevel)} intervals; ` +
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
  return `${slug || 'schedule'}-v${version.version}-estimate.${extension}`;
}
