import type { BandedCurve } from '../charts/banded-curve';
import { estimateAt } from './comparison-curves';

/**
 * "Well above zero": at least this share of the curve's own highest point on the grid. Indexing
 * where a curve is near zero divides by almost nothing: a 6 % share set to 100 turns 90 % into
 * 1,500, and every other price reads as a huge swing.
 */
const wellAboveZero = 0.25;

/**
 * The default index price: of the grid prices where every compared curve is well above zero,
 * the one nearest the middle of that stretch, so the index reads as an ordinary percentage
 * change on either side of it. When no grid price has all curves well above zero, the lowest
 * grid price, where falling demand is highest. Null with no curves or no grid.
 */
export function defaultIndexPrice(
  curves: readonly BandedCurve[],
  grid: readonly number[],
): number | null {
  const prices = [...new Set(grid)].sort((a, b) => a - b);
  if (curves.length === 0 || prices.length === 0) return null;
  const peaks = curves.map((curve) =>
    Math.max(...prices.map((p) => estimateAt(curve, p) ?? Number.NEGATIVE_INFINITY)),
  );
  const strong = prices.filter((price) =>
    curves.every((curve, i) => {
      const here = estimateAt(curve, price);
      return here !== null && here > 0 && here >= wellAboveZero * peaks[i];
    }),
  );
  if (strong.length === 0) return prices[0];
  const middle = (strong[0] + strong[strong.length - 1]) / 2;
  return strong.reduce((best, price) =>
    Math.abs(price - middle) < Math.abs(best - middle) ? price : best,
  );
}
