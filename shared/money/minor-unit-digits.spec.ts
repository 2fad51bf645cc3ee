import { minorUnitDigits } from './minor-unit-digits';

describe('minorUnitDigits', () => {
  it.each([
    // ISO 4217 list one (published minor units), which CLDR follows for these codes
    ['USD', 2],
    ['EUR', 2],
    ['JPY', 0],
    ['KWD', 3],
    ['CLP', 0],
  ])('gives %s %i decimal digits', (currency, digits) => {
    expect(minorUnitDigits(currency)).toBe(digits);
  });

  it('refuses a code that is not three capital letters, naming it', () => {
    expect(() => minorUnitDigits('usd')).toThrow('"usd" is not an ISO 4217 currency code');
  });
});
