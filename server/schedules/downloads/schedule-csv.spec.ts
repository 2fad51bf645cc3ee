import type { ScheduleVersion } from '@shared/analysis/schedule-version';
import { scheduleCsv } from './schedule-csv';

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
      price: 10,
      quantity: 0.75,
      ciLow: 0.6,
      ciHigh: 0.85,
      revenue: 7.5,
      elasticity: -0.5,
      extrapolated: false,
      respondents: 40,
    },
    {
      price: 20,
      quantity: 0.25,
      ciLow: null,
      ciHigh: null,
      revenue: 5,
      elasticity: null,
      extrapolated: true,
      respondents: 12,
    },
  ],
} as unknown as ScheduleVersion;

describe('scheduleCsv', () => {
  const lines = scheduleCsv(version).split('\r\n');

  it('starts with one comment line saying the figures are estimates', () => {
    expect(lines[0]).toMatch(/^# Estimate: demand schedule "Lamps, "north"", version 2/);
    expect(lines[0]).toContain('90 % intervals');
  });

  it('writes the share column, full-precision numbers and empty cells for missing values', () => {
    expect(lines[1]).toBe(
      'price,purchase_share,ci_low,ci_high,revenue,elasticity,extrapolated,respondents',
    );
    expect(lines[2]).toBe('10,0.75,0.6,0.85,7.5,-0.5,false,40');
    expect(lines[3]).toBe('20,0.25,,,5,,true,12');
    expect(lines[4]).toBe('');
  });
});
