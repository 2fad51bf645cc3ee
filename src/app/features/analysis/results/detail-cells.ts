import type { DetailTable } from '@shared/analysis/fit-result';
import type { FigureFormat } from '../figures/figure-format';

type DetailCell = DetailTable['rows'][number][number];

/**
 * One cell of a method's detail table as the screen writes it: a number in its column's unit
 * (plainly, to four significant digits, when the fit named none), text as it is, a dash for a
 * missing value.
 */
export function detailCellText(
  table: DetailTable,
  column: number,
  cell: DetailCell,
  format: FigureFormat,
): string {
  if (cell === null) return '–';
  if (typeof cell === 'string') return cell;
  return format.value(cell, table.columnUnits?.[column] ?? 'index');
}
