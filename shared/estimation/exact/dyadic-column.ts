import { smallest } from '../numerics/extent';
/**
 * A float64 column as integers over one power of two: value[i] = integers[i]·2^exponent,
 * exactly. Every finite double is m·2^e with an integer m of at most 53 bits, so sums of
 * products of such columns are BigInt sums with no rounding at all.
 */
export interface DyadicColumn {
  readonly integers: bigint[];
  readonly exponent: number;
}

const view = new DataView(new ArrayBuffer(8));

/** The mantissa m and exponent e with x = m·2^e (m = 0 for x = 0). */
function decompose(x: number): [bigint, number] {
  if (x === 0) return [0n, 0];
  view.setFloat64(0, x);
  const high = view.getUint32(0);
  const low = view.getUint32(4);
  const biased = (high >>> 20) & 0x7ff;
  let mantissa = (BigInt(high & 0xfffff) << 32n) | BigInt(low);
  let exponent = -1074;
  if (biased !== 0) {
    mantissa |= 1n << 52n;
    exponent = biased - 1075;
  }
  return [x < 0 ? -mantissa : mantissa, exponent];
}

/** The exact integer form of finite float64 values (the caller has checked finiteness). */
export function dyadicColumn(values: ArrayLike<number>): DyadicColumn {
  const parts = Array.from({ length: values.length }, (_, i) => decompose(values[i]));
  let exponent = Infinity;
  for (const [mantissa, e] of parts) if (mantissa !== 0n && e < exponent) exponent = e;
  if (exponent === Infinity) exponent = 0;
  const integers = parts.map(([mantissa, e]) => mantissa << BigInt(e - exponent));
  return { integers, exponent };
}

/** x·2^shift exactly for an integer x (shift may be negative only when x is divisible). */
export function shiftLeft(x: bigint, shift: number): bigint {
  return shift >= 0 ? x << BigInt(shift) : x >> BigInt(-shift);
}

/** Several columns over one common power of two (the smallest of their exponents). */
export function commonDyadic(columns: readonly ArrayLike<number>[]): {
  integers: bigint[][];
  exponent: number;
} {
  const each = columns.map(dyadicColumn);
  const exponent = smallest(each.map((c) => c.exponent));
  return {
    integers: each.map((c) => c.integers.map((v) => shiftLeft(v, c.exponent - exponent))),
    exponent,
  };
}
