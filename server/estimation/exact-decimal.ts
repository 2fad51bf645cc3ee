import type { Rational } from '@shared/estimation/exact/rational';

/**
 * The exact decimal digits of a rational whose denominator is 2^a·5^b — as every sum, product
 * and shift of float64 values is (a dyadic rational) — so the sums cross into
 * solveFromCrossProducts without a single rounding.
 */
export function exactDecimal(value: Rational): string {
  let rest = value.den;
  let twos = 0n;
  let fives = 0n;
  for (; rest % 2n === 0n; rest /= 2n) twos++;
  for (; rest % 5n === 0n; rest /= 5n) fives++;
  if (rest !== 1n) throw new RangeError('the value has no finite decimal expansion');
  const digits = twos > fives ? twos : fives;
  // den divides 10^digits, so the scaling is exact.
  const scaled = value.num * (10n ** digits / value.den);
  const sign = scaled < 0n ? '-' : '';
  const text = (scaled < 0n ? -scaled : scaled).toString().padStart(Number(digits) + 1, '0');
  const cut = text.length - Number(digits);
  return digits === 0n ? `${sign}${text}` : `${sign}${text.slice(0, cut)}.${text.slice(cut)}`;
}
