import { FigureFormat, levelLabel } from './figure-format';

const minus = '\u2212';
// Intl puts a no-break space between a currency code and the amount.
const kes = 'KES\u00a0';

describe('FigureFormat', () => {
  const format = new FigureFormat('KES', 'en');

  it('writes a negative number of every kind with a true minus sign, never a hyphen', () => {
    expect(format.value(-4.01, 'price')).toBe(`${minus}${kes}4.01`);
    expect(format.value(-0.003344, 'index')).toBe(`${minus}0.003344`);
    expect(format.value(-1.4, 'elasticity')).toBe(`${minus}1.40`);
    expect(format.value(-12.345, 'quantity')).toBe(`${minus}12.35`);
    expect(format.value(-0.125, 'share')).toBe(`${minus}12.5%`);
    expect(format.value(-3, 'count')).toBe(`${minus}3`);
  });

  it('keeps the minus sign in intervals and in figures read aloud', () => {
    expect(format.interval(-1.8, -0.6, 'elasticity')).toBe(`${minus}1.80 to ${minus}0.60`);
    expect(
      format.figure({ estimate: -1.2, low: -1.8, high: -0.6, note: null }, 'elasticity', 0.95),
    ).toBe(`${minus}1.20 (95 % interval ${minus}1.80 to ${minus}0.60)`);
  });

  it('writes a negative value that rounds to zero without a sign', () => {
    expect(format.value(-0.001, 'elasticity')).toBe('0.00');
    expect(format.value(-0.2, 'count')).toBe('0');
  });

  it('leaves positive numbers and missing ones as they were', () => {
    expect(format.value(1234.5, 'price')).toBe(`${kes}1,234.50`);
    expect(format.value(20, 'price')).toBe(`${kes}20`);
    expect(format.value(null, 'index')).toBe('–');
    expect(format.value(Number.NaN, 'index')).toBe('–');
    expect(format.interval(null, 2, 'index')).toBeNull();
  });

  it('uses the true minus sign in a locale that writes a hyphen-minus', () => {
    expect(new FigureFormat('USD', 'en-US').value(-25, 'price')).toBe(`${minus}$25`);
  });
});

describe('levelLabel', () => {
  it('writes a confidence level as a percentage', () => {
    expect(levelLabel(0.95)).toBe('95 %');
    expect(levelLabel(0.9)).toBe('90 %');
  });
});
