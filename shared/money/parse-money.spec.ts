import { parseMoney } from './parse-money';

describe('parseMoney', () => {
  it.each([
    ['12.50', 'USD', 'en-US', 1250],
    ['12', 'USD', 'en-US', 1200],
    ['0.05', 'USD', 'en-US', 5],
    ['.5', 'USD', 'en-US', 50],
    ['1,250.5', 'USD', 'en-US', 125050],
    [' 1 250 ', 'USD', 'en-US', 125000],
    ['1.250,75', 'EUR', 'de-DE', 125075],
    ['12,5', 'EUR', 'de-DE', 1250],
    ['1\u202f250,75', 'EUR', 'fr-FR', 125075],
    ['12.5', 'EUR', 'fr-FR', 1250],
    ['12,34,567.50', 'INR', 'en-IN', 123456750],
    ['1500', 'JPY', 'ja-JP', 1500],
    ['1.005', 'KWD', 'en', 1005],
  ])('reads "%s" %s in %s as %i minor units', (text, currency, locale, minor) => {
    expect(parseMoney(text, currency, locale)).toEqual({ ok: true, minor });
  });

  it('refuses more decimals than the currency has', () => {
    expect(parseMoney('1.255', 'USD', 'en-US')).toEqual({
      ok: false,
      message: 'USD amounts have at most 2 decimal places',
    });
    expect(parseMoney('15.5', 'JPY', 'en-US')).toEqual({
      ok: false,
      message: 'JPY amounts have no decimals',
    });
  });

  it('refuses a misplaced group separator rather than reading 12,50 as 1250', () => {
    expect(parseMoney('12,50', 'USD', 'en-US')).toMatchObject({ ok: false });
  });

  it.each(['', '   ', '-5', 'abc', '12.5.0', '$12', '1e3'])('refuses "%s"', (text) => {
    const result = parseMoney(text, 'USD', 'en-US');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message.length).toBeGreaterThan(5);
  });

  it('refuses an amount too large to hold exactly', () => {
    expect(parseMoney('999999999999999999', 'USD', 'en-US')).toEqual({
      ok: false,
      message: '"999999999999999999" is too large',
    });
  });
});
