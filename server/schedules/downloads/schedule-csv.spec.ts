import type { ScheduleVersion } from '@shared/analysis/schedule-version';
import { scheduleCsv } from './schedule-csv';
import { downloadName } from './schedule-table';

const version = {
  title: 'Lamps, "north"',
  version: 2,
  studyName: 'Lamp study',
  methodLabel: 'Price ladder (Gabor–Granger)',
  n: 40,
  confidenceLevel: 0.9,
  currency: 'KES',
  dataHash: 'ab'.repeat(32),
  quantityKind: 'share',
  rows: [
    {
      price: 500,
      quantity: 0.95700000000000007,
      ciLow: 0.9312345678901234,
      ciHigh: 0.97,
      revenue: 478.50000000000006,
      elasticity: -0.12345678,
      extrapolated: false,
      respondents: 40,
    },
    {
      price: 1000,
      quantity: 0.25,
      ciLow: null,
      ciHigh: null,
      revenue: 250,
      elasticity: null,
      extrapolated: true,
      respondents: 12,
    },
  ],
} as unknown as ScheduleVersion;

/** A CSV parser as a data tool applies it (RFC 4180): quoted cells may hold commas and quotes. */
function parse(text: string): string[][] {
  const rows: string[][] = [[]];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') [cell, i] = [cell + '"', i + 1];
      else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"') quoted = true;
    else if (c === ',') [rows[rows.length - 1], cell] = [[...rows[rows.length - 1], cell], ''];
    else if (c === '\r' && text[i + 1] === '\n') {
      rows[rows.length - 1].push(cell);
      [cell, i] = ['', i + 1];
      rows.push([]);
    } else cell += c;
  }
  return rows.filter((row) => row.length > 0);
}

describe('scheduleCsv', () => {
  const text = scheduleCsv(version);
  const [header, first, second] = parse(text);

  it('starts with its header row, in words, with the currency and interval level', () => {
    expect(text.startsWith('Price (KES),')).toBe(true);
    expect(header).toEqual([
      'Price (KES)',
      'Purchase share (estimate)',
      '90 % interval low',
      '90 % interval high',
      'Revenue per potential buyer (KES)',
      'Elasticity',
      'Extrapolated',
      'Respondents',
      'Note',
    ]);
  });

  it('rounds shares to 4 decimals, money to cents and elasticities to 3 decimals', () => {
    expect(first.slice(0, 8)).toEqual([
      '500',
      '0.957',
      '0.9312',
      '0.97',
      '478.5',
      '-0.123',
      'no',
      '40',
    ]);
    expect(second.slice(0, 8)).toEqual(['1000', '0.25', '', '', '250', '', 'yes', '12']);
  });

  it('carries the estimate note in the last column of the first row, quoted safely', () => {
    expect(first).toHaveLength(9);
    expect(first[8]).toMatch(/^Estimate: demand schedule “Lamps, "north"”, version 2/);
    expect(first[8]).toContain('90 % intervals');
    expect(second[8]).toBe('');
    expect(text.endsWith('\r\n')).toBe(true);
  });

  it('names the file with the study, the version and the word estimate', () => {
    expect(downloadName(version, 'csv')).toBe('lamp-study-v2-estimate.csv');
  });
});
