import { Rational } from '@shared/estimation/exact/rational';
import { mulberry32 } from '@shared/estimation/random/mulberry32';
import { exactDecimal } from './exact-decimal';

describe('exactDecimal', () => {
  it('writes small dyadic and decadic values digit for digit', () => {
    // Exact by hand: 3/8 = 0.375, −5/4 = −1.25, 12 = 12, 1/20 = 0.05.
    expect(exactDecimal(Rational.of(3n, 8n))).toBe('0.375');
    expect(exactDecimal(Rational.of(-5n, 4n))).toBe('-1.25');
    expect(exactDecimal(Rational.of(12n))).toBe('12');
    expect(exactDecimal(Rational.of(1n, 20n))).toBe('0.05');
  });

  it('round-trips sums of products of doubles exactly through Rational.fromDecimal', () => {
    const uniform = mulberry32(11);
    for (let trial = 0; trial < 200; trial++) {
      const a = Rational.fromNumber((uniform() - 0.5) * 10 ** Math.floor(uniform() * 12 - 6));
      const b = Rational.fromNumber(uniform() * 1e-3);
      const value = a.mul(b).add(a);
      const back = Rational.fromDecimal(exactDecimal(value));
      expect(back.sub(value).isZero()).toBe(true);
    }
  });

  it('refuses a value with no finite decimal expansion', () => {
    expect(() => exactDecimal(Rational.of(1n, 3n))).toThrow(RangeError);
  });
});
