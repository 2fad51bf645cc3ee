import { formatMoney, minorToDecimalString } from './format-money';

// Intl output uses narrow/no-break spaces in some locales; compare with plain spaces.
const plain = (text: string) => text.replace(/[\u00a0\u202f]/g, ' ');

describe('formatMoney', () => {
  it('formats cents as dollars in an English locale', () => {
    expect(formatMoney(123456, 'USD', 'en-US')).toBe('$1,234.56');
  });

  it('uses the locale’s separators and symbol position', () => {
    expect(plain(formatMoney(123456, 'EUR', 'de-DE'))).toBe('1.234,56 €');
  });

  it('shows currencies without a minor unit as whole amounts', () => {
    expect(formatMoney(1500, 'JPY', 'en-US')).toBe('¥1,500');
  });

  it('keeps three decimals for a three-digit currency', () => {
    expect(plain(formatMoney(1005, 'KWD', 'en-US'))).toBe('KWD 1.005');
  });

  it('shows the last minor unit of an amount too large for exact division', () => {
    // 2^53 − 1 cents: dividing by 100 in binary floating point would round the last digit.
    expect(formatMoney(Number.MAX_SAFE_INTEGER, 'USD', 'en-US')).toBe('$90,071,992,547,409.91');
  });

  it('refuses a fractional amount rather than formatting it', () => {
    expect(() => formatMoney(12.5, 'USD', 'en-US')).toThrow('must be a whole number, not 12.5');
  });
});

describe('minorToDecimalString', () => {
  it.each([
    [12345, 2, '123.45'],
    [5, 2, '0.05'],
    [-5, 2, '-0.05'],
    [7, 3, '0.007'],
    [12345, 0, '12345'],
  ])('writes %i with %i digits as %s', (minor, digits, expected) => {
    expect(minorToDecimalString(minor, digits)).toBe(expected);
  });
});
