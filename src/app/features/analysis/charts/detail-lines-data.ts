import type { ChartData } from 'chart.js';
import type { DetailTable } from '@shared/analysis/fit-result';
import { seriesColour } from './chart-palette';
import type { LineDataset, XY } from './demand-chart-data';

/**
 * A detail table's columns after the first as lines against the first (the four threshold
 * curves against price). Rows without a number in a column leave a gap in that line only.
 */
export function detailLinesData(table: DetailTable): ChartData<'line', XY[]> {
  const datasets: LineDataset[] = table.columns.slice(1).map((label, k) => {
    const column = k + 1;
    const data = table.rows.flatMap((row) => {
      const [x, y] = [row[0], row[column]];
      return typeof x === 'number' && typeof y === 'number' ? [{ x, y }] : [];
    });
    const colour = seriesColour(k);
    return {
      label,
      data,
      borderColor: colour,
      backgroundColor: colour,
      borderWidth: 2,
      // Dashes tell the curves apart without colour: the "too" curves dashed.
      borderDash: label.toLowerCase().startsWith('too') ? [6, 4] : [],
      pointRadius: 0,
      tension: 0,
    };
  });
  return { datasets };
}
