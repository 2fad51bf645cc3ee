import { EstimationError } from '../estimation-error';

/**
 * An exact rational number num/den with BigInt parts (den > 0, lowest terms). Every finite
 * float64 is a dyadic rational and every decimal string a decadic one, so sums of products
 * given either way can be solved with no rounding at all.
 */
export class Rational {
  static readonly ZERO = new Rational(0n, 1n);
  static readonly ONE = new Rational(1n, 1n);

  private constructor(
    readonly num: bigint,
    readonly den: bigint,
  ) {}

  /** num/den reduced to lowest terms. */
  static of(num: bigint, den = 1n): Rational {
    if (den === 0n) throw new EstimationError('division-by-zero', 'exact division by zero');
    if (den < 0n) [num, den] = [-num, -den];
    if (den === 1n) return new Rational(num, 1n);
    const magnitude = num < 0n ? -num : num;
    // Sums and products of float64 values have power-of-two denominators: their common factor
    // with the numerator is the numerator's lowest set bit, with no Euclid over long BigInts
    // (which took most of an in-database fit's solve).
    if ((den & (den - 1n)) === 0n) {
      if (magnitude === 0n) return Rational.ZERO;
      const lowestBit = magnitude & -magnitude;
      const common = lowestBit < den ? lowestBit : den;
      return new Rational(num / common, den / common);
    }
    const g = gcd(magnitude, den);
    return new Rational(num / g, den / g);
  }

  /** The exact value of a finite float64. */
  static fromNumber(value: number): Rational {
    if (!Number.isFinite(value)) {
      throw new EstimationError('invalid-value', `${value} is not a finite number`);
    }
    if (Number.isInteger(value)) return Rational.of(BigInt(value));
    let exponent = 0;
    let mantissa = value;
    // Doubling is exact; at most 1074 steps reach an integer for any finite double.
    while (!Number.isInteger(mantissa)) {
      mantissa *= 2;
      exponent++;
    }
    return Rational.of(BigInt(mantissa), 1n << BigInt(exponent));
  }

  /** The exact value of a decimal string such as "-12.5e-3" (as PostgreSQL numeric prints). */
  static fromDecimal(text: string): Rational {
    const match = /^\s*([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?\s*$/.exec(text);
    if (!match || (match[2] === '' && (match[3] ?? '') === '')) {
      throw new EstimationError('invalid-value', `"${text}" is not a decimal number`);
    }
    const [, sign, whole, fraction = '', exp = '0'] = match;
    const digits = BigInt((whole || '0') + fraction) * (sign === '-' ? -1n : 1n);
    const scale = Number(exp) - fraction.length;
    return scale >= 0
      ? Rational.of(digits * 10n ** BigInt(scale))
      : Rational.of(digits, 10n ** BigInt(-scale));
  }

  add(other: Rational): Rational {
    return Rational.of(this.num * other.den + other.num * this.den, this.den * other.den);
  }

  sub(other: Rational): Rational {
    return Rational.of(this.num * other.den - other.num * this.den, this.den * other.den);
  }

  mul(other: Rational): Rational {
    return Rational.of(this.num * other.num, this.den * other.den);
  }

  div(other: Rational): Rational {
    return Rational.of(this.num * other.den, this.den * other.num);
  }

  isZero(): boolean {
    return this.num === 0n;
  }

  /** The nearest float64 (correct to within one unit in the last place). */
  toNumber(): number {
    return fractionToNumber(this.num, this.den);
  }
}

/**
 * The nearest float64 to num/den (correct to within one unit in the last place), for any
 * fraction, reduced or not: callers that only want a number skip reducing it, which for long
 * numerators and denominators costs far more than the division.
 */
export function fractionToNumber(numerator: bigint, denominator: bigint): number {
  if (denominator === 0n) throw new EstimationError('division-by-zero', 'exact division by zero');
  if (numerator === 0n) return 0;
  const negative = numerator < 0n !== denominator < 0n;
  const num = numerator < 0n ? -numerator : numerator;
  const den = denominator < 0n ? -denominator : denominator;
  // Scale so the integer quotient carries 64+ significant bits, then let Number() round it.
  const shift = bitLength(den) - bitLength(num) + 66;
  const quotient = shift >= 0 ? (num << BigInt(shift)) / den : num / (den << BigInt(-shift));
  // Two steps keep 2^−shift from underflowing before the product is formed.
  const half = Math.trunc(shift / 2);
  const value = Number(quotient) * 2 ** -half * 2 ** -(shift - half);
  return negative ? -value : value;
}

/** Greatest common divisor of two non-negative BigInts (1 when both are 0). */
export function gcd(a: bigint, b: bigint): bigint {
  while (b !== 0n) [a, b] = [b, a % b];
  return a === 0n ? 1n : a;
}

function bitLength(value: bigint): number {
  return value.toString(2).length;
}
