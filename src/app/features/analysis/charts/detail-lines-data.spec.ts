import type { DetailTable } from '@shared/analysis/fit-result';
import { detailLinesData } from './detail-lines-data';

describe('detailLinesData', () => {
  const table: DetailTable = {
    title: 'Price threshold curves',
    columns: ['Price', 'Too cheap', 'Cheap', 'Expensive', 'Too expensive'],
    columnUnits: ['price', 'share', 'share', 'share', 'share'],
    plot: 'lines',
    rows: [
      [100, 0.9, 1, 0, 0],
      [200, 0.4, 0.7, 0.2, null],
      [300, 0, 0.1, 0.8, 0.5],
    ],
  };

  it('draws each column after the first as a line against the first', () => {
    const { datasets } = detailLinesData(table);
    expect(datasets.map((d) => d.label)).toEqual([
      'Too cheap',
      'Cheap',
      'Expensive',
      'Too expensive',
    ]);
    expect(datasets[1].data).toEqual([
      { x: 100, y: 1 },
      { x: 200, y: 0.7 },
      { x: 300, y: 0.1 },
    ]);
  });

  it('leaves out a missing value from its own line only, and dashes the "too" curves', () => {
    const { datasets } = detailLinesData(table);
    expect(datasets[3].data.map((p) => p.x)).toEqual([100, 300]);
    expect(datasets[2].data).toHaveLength(3);
    expect(datasets.map((d) => (d.borderDash as number[]).length > 0)).toEqual([
      true,
      false,
      false,
      true,
    ]);
  });
});
