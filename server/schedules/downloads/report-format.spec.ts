import { niceTicks } from './pdf-chart';
import { reportMoney } from './report-money';
import { reportNumber } from './report-number';

describe('reportNumber', () => {
  it.each([
    [1234.5678, '1235'],
    [0.012345, '0.01235'],
    [-1.42900348, '-1.429'],
    [25000.4, '25000'],
    [0, '0'],
    [null, ''],
  ])('writes %p as %p', (value, text) => {
    expect(reportNumber(value)).toBe(text);
  });
});

describe('niceTicks', () => {
  it('spaces ticks 1, 2 or 5 × 10ᵏ apart over the range (common practice for chart axes)', () => {
    expect(niceTicks(800, 2600)).toEqual([1000, 1500, 2000, 2500]);
    expect(niceTicks(0, 0.9)).toEqual([0, 0.2, 0.4, 0.6, 0.8]);
  });
});

describe('reportMoney', () => {
  it('writes amounts with the currency code, grouping and the minor unit', () => {
    const kes = reportMoney('KES');
    expect(kes(1100)).toBe('KES 1,100');
    expect(kes(478.50000000000006)).toBe('KES 478.50');
    expect(kes(null)).toBe('');
    expect(reportMoney('JPY')(1234.4)).toBe('JPY 1,234');
  });
});
