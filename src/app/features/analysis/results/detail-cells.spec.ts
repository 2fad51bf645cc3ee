import type { DetailTable } from '@shared/analysis/fit-result';
import { FigureFormat } from '../figures/figure-format';
import { detailCellText } from './detail-cells';

describe('detailCellText', () => {
  const format = new FigureFormat('KES', 'en-KE');
  const table: DetailTable = {
    title: 'Ladder steps',
    columns: ['Price', 'Respondents', 'Purchase share', 'Note'],
    columnUnits: ['price', 'count', 'share', 'index'],
    rows: [[1100, 231, 0.757, 'lowest step']],
  };

  it('writes each number in its column’s unit', () => {
    const [row] = table.rows;
    expect(detailCellText(table, 0, row[0], format)).toBe(format.value(1100, 'price'));
    expect(detailCellText(table, 0, row[0], format)).toContain('1,100');
    expect(detailCellText(table, 1, row[1], format)).toBe('231');
    expect(detailCellText(table, 2, row[2], format)).toBe('75.7%');
  });

  it('keeps text, dashes a missing value, and writes plain numbers for fits without units', () => {
    expect(detailCellText(table, 3, 'lowest step', format)).toBe('lowest step');
    expect(detailCellText(table, 2, null, format)).toBe('–');
    const older = { ...table, columnUnits: undefined };
    expect(detailCellText(older, 2, 0.757123, format)).toBe('0.7571');
  });
});
