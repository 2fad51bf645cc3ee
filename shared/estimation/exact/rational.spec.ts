import { exactLinearSolve } from './exact-linear-solve';
import { fractionToNumber, Rational } from './rational';
import { refusalOf } from '../../../tests/support/estimation-refusal';

const r = (num: number, den = 1): Rational => Rational.of(BigInt(num), BigInt(den));

describe('Rational', () => {
  it('reads decimal strings exactly, as PostgreSQL numeric prints them', () => {
    expect(Rational.fromDecimal('-12.5e-3')).toEqual(r(-1, 80));
    expect(Rational.fromDecimal('0.1').sub(r(1, 10)).isZero()).toBe(true);
    expect(Rational.fromDecimal('1e3')).toEqual(r(1000));
  });

  it('reads a float64 as the dyadic rational it is (0.1 is not 1/10)', () => {
    const tenth = Rational.fromNumber(0.1);
    expect(tenth.den).toBe(2n ** 55n); // IEEE 754: 0.1 = 3602879701896397 / 2^55
    expect(tenth.num).toBe(3602879701896397n);
    expect(tenth.toNumber()).toBe(0.1);
  });

  it('keeps lowest terms on the power-of-two path as on the general one', () => {
    // The fast path for dyadic denominators must give what Euclid gives.
    expect(Rational.of(12n, 8n)).toEqual({ num: 3n, den: 2n });
    expect(Rational.of(-16n, 64n)).toEqual({ num: -1n, den: 4n });
    expect(Rational.of(5n, 4n)).toEqual({ num: 5n, den: 4n });
    expect(Rational.of(96n, -32n)).toEqual({ num: -3n, den: 1n });
    expect(Rational.of(0n, 1024n)).toEqual({ num: 0n, den: 1n });
    const big = (3n << 700n) + (1n << 200n);
    expect(Rational.of(big, 1n << 300n)).toEqual({ num: (3n << 500n) + 1n, den: 1n << 100n });
    expect(Rational.of(30n, 12n)).toEqual({ num: 5n, den: 2n }); // general path
  });

  it('rounds back to the nearest float64', () => {
    expect(r(1, 3).toNumber()).toBe(1 / 3);
    expect(r(-2, 7).toNumber()).toBe(-2 / 7);
    for (const value of [Math.PI, 1e-300, -6.02e23, 5e-324]) {
      expect(Rational.fromNumber(value).toNumber()).toBe(value);
    }
  });

  it('refuses text that is not a decimal number', () => {
    expect(refusalOf(() => Rational.fromDecimal('12,5'))).toMatchObject({ code: 'invalid-value' });
    expect(refusalOf(() => Rational.fromNumber(NaN))).toMatchObject({ code: 'invalid-value' });
  });
});

describe('fractionToNumber', () => {
  it('rounds unreduced fractions and negative denominators as their lowest terms would', () => {
    // Long equal factors on both sides must not change the rounding.
    const big = 10n ** 400n + 7n;
    expect(fractionToNumber(big, 3n * big)).toBe(1 / 3);
    expect(fractionToNumber(6n, -9n)).toBe(-2 / 3);
    expect(fractionToNumber(-6n, -9n)).toBe(2 / 3);
    expect(fractionToNumber(0n, -5n)).toBe(0);
    expect(fractionToNumber(2n ** 60n * 10n, 2n ** 60n * 4n)).toBe(2.5);
  });
});

describe('exactLinearSolve', () => {
  it('inverts the 4×4 Hilbert matrix to its integer inverse', () => {
    // Source: the closed form of the Hilbert inverse (its entries are integers), from memory;
    // the matrix below is the well-known 4×4 case and is checked here by H·H⁻¹ = I as well.
    const hilbert = [0, 1, 2, 3].map((i) => [0, 1, 2, 3].map((j) => r(1, i + j + 1)));
    const expected = [
      [16, -120, 240, -140],
      [-120, 1200, -2700, 1680],
      [240, -2700, 6480, -4200],
      [-140, 1680, -4200, 2800],
    ];
    const { inverse, solution, denominator } = exactLinearSolve(
      hilbert,
      [r(1), r(0), r(0), r(0)],
      ['a', 'b', 'c', 'd'],
    );
    const exact = (numerator: bigint) => Rational.of(numerator, denominator);
    expect(inverse.map((row) => row.map((v) => exact(v).toNumber()))).toEqual(expected);
    expect(solution.map((v) => fractionToNumber(v, denominator))).toEqual(expected[0]);
    hilbert.forEach((row, i) =>
      [0, 1, 2, 3].forEach((j) => {
        const product = row.reduce(
          (sum, h, m) => sum.add(h.mul(exact(inverse[m][j]))),
          Rational.ZERO,
        );
        expect(product.toNumber()).toBe(i === j ? 1 : 0);
      }),
    );
  });

  it('names the column that depends exactly on the ones before it', () => {
    const matrix = [
      [r(2), r(4)],
      [r(4), r(8)],
    ];
    expect(
      refusalOf(() => exactLinearSolve(matrix, [r(1), r(2)], ['price', 'price_doubled'])),
    ).toMatchObject({ code: 'singular-design', field: 'price_doubled' });
  });
});
