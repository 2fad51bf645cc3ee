/**
 * Where a tie of the two curves over a run of grid prices is placed: 'midpoint' of the run (the
 * default) or its 'first' price.
 */
export type TieRule = 'midpoint' | 'first';

/** A crossing of two curves: its price and the share both curves take there. */
export interface Crossing {
  readonly price: number;
  readonly share: number;
}

/** Differences this small are ties (weighted shares carry rounding noise). */
const TIE = 1e-12;

/**
 * The first point where the falling curve f crosses the rising curve g on the price grid: the
 * first pair of grid prices with f − g > 0 and then f − g < 0, interpolating linearly between
 * neighbours; a run of exact ties between them is placed by the tie rule. Null if they never
 * cross.
 */
export function findCrossing(
  prices: readonly number[],
  f: readonly number[],
  g: readonly number[],
  tieRule: TieRule,
): Crossing | null {
  const d = f.map((v, i) => v - g[i]);
  const sign = (i: number) => (Math.abs(d[i]) <= TIE ? 0 : Math.sign(d[i]));
  let lastPositive = -1;
  for (let i = 0; i < d.length; i++) {
    if (sign(i) > 0) lastPositive = i;
    if (sign(i) >= 0 || lastPositive < 0) continue;
    if (lastPositive < i - 1) {
      // Between them, f − g = 0 over the grid prices lastPositive+1 … i−1.
      const first = prices[lastPositive + 1];
      const price = tieRule === 'first' ? first : (first + prices[i - 1]) / 2;
      return { price, share: interpolate(prices, f, price) };
    }
    const t = d[lastPositive] / (d[lastPositive] - d[i]);
    const price = prices[lastPositive] + t * (prices[i] - prices[lastPositive]);
    return { price, share: f[lastPositive] + t * (f[i] - f[lastPositive]) };
  }
  return null;
}

/** Linear interpolation of values on the (ascending) price grid. */
export function interpolate(
  prices: readonly number[],
  values: readonly number[],
  price: number,
): number {
  const k = prices.findIndex((p) => p >= price);
  if (k < 0) return values[values.length - 1];
  if (k === 0) return values[0];
  const t = (price - prices[k - 1]) / (prices[k] - prices[k - 1]);
  return values[k - 1] + t * (values[k] - values[k - 1]);
}
