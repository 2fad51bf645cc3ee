/** The record fields a sampling-point file fills. */
export type SamplingPointField =
  | 'code'
  | 'name'
  | 'kind'
  | 'latitude'
  | 'longitude'
  | 'stratum'
  | 'notes';

/** One column of the sampling-point file. */
export interface SamplingCsvColumn {
  readonly header: string;
  readonly field: SamplingPointField;
  readonly required: boolean;
  readonly description: string;
}

/**
 * Fieldcurve's sampling-point file ("point sheet"): UTF-8 text, one header row, then one point per
 * row. Cells are separated by commas (a semicolon or tab is accepted when the header uses it);
 * a cell containing the separator, a quote or a line break is quoted with `"`. A byte-order mark
 * and Windows line ends are fine. Headers may come in any order and are matched ignoring case,
 * surrounding spaces, and spaces versus underscores (`Point code` = `point_code`). Blank rows are
 * skipped. Re-uploading a file updates the points whose `point_code` already exists.
 */
export const samplingCsvColumns: readonly SamplingCsvColumn[] = [
  {
    header: 'point_code',
    field: 'code',
    required: true,
    description:
      'Stable code of the point, unique in the study (letters, digits, . _ - /; up to 40).',
  },
  {
    header: 'point_name',
    field: 'name',
    required: true,
    description: 'Name shown to enumerators.',
  },
  {
    header: 'point_kind',
    field: 'kind',
    required: true,
    description: 'household, shop, market_stall, kiosk or other.',
  },
  {
    header: 'latitude',
    field: 'latitude',
    required: true,
    description: 'Decimal degrees, −90 to 90.',
  },
  {
    header: 'longitude',
    field: 'longitude',
    required: true,
    description: 'Decimal degrees, −180 to 180.',
  },
  { header: 'stratum', field: 'stratum', required: true, description: 'Stratum or region name.' },
  { header: 'notes', field: 'notes', required: false, description: 'Directions, opening hours…' },
];

/** Where each known column sits in a particular file (its index in the header row). */
export type ColumnLayout = ReadonlyMap<SamplingCsvColumn, number>;

/** Most points one file may hold; a study's whole frame fits well below it. */
export const maxPointsPerFile = 5000;

/** The header a file should start with, in the documented order. */
export const samplingCsvHeaderLine = samplingCsvColumns.map((column) => column.header).join(',');

/** The column a header cell names, or undefined; see {@link samplingCsvColumns} for matching. */
export function columnForHeader(cell: string): SamplingCsvColumn | undefined {
  const key = cell
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, '_');
  return samplingCsvColumns.find((column) => column.header === key);
}
