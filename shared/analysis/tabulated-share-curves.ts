import type {
  FittedDemandCurve,
  QuantityInterval,
} from '../estimation/demand-schedule/fitted-demand-curve';
import { EstimationError } from '../estimation/estimation-error';
import { sortedQuantile } from '../estimation/resampling/sorted-quantile';

interface Range {
  readonly min: number;
  readonly max: number;
}

/** Shares at a curve's knots in respondent resamples, one row per resample. */
type ResampledShares = readonly (readonly number[])[] | undefined;

/**
 * The empirical WTP curve from its distinct amounts: the share at a price is the share recorded
 * at the first amount at or above it (everyone with WTP ≥ that amount), and 0 above the last.
 * With resampled shares it has a band: their percentiles at the price.
 */
export function stepShareCurve(curve: {
  points: readonly { price: number; share: number }[];
  resampledShares?: ResampledShares;
  observedPriceRange: Range;
  n: number;
}): FittedDemandCurve {
  const order = curve.points
    .map((_, i) => i)
    .sort((a, b) => curve.points[a].price - curve.points[b].price);
  const prices = order.map((i) => curve.points[i].price);
  const shares = order.map((i) => curve.points[i].share);
  const resampled = curve.resampledShares?.map((row) => order.map((i) => row[i]));
  checkResampled(resampled, prices.length);
  const shareAt = (values: readonly number[], p: number) => {
    const k = prices.findIndex((price) => price >= p);
    return k < 0 ? 0 : values[k];
  };
  return {
    description: 'share with stated WTP at or above the price',
    method: 'open-ended willingness to pay',
    quantityKind: 'share',
    quantity: (p) => shareAt(shares, p),
    ...bandOf(resampled, shareAt),
    priceRange: { min: 0, max: prices[prices.length - 1] },
    observedPriceRange: curve.observedPriceRange,
    n: curve.n,
    discrete: true,
    steps: prices,
  };
}

/**
 * A share given at knots, linear between them and 0 outside (the trial curve of thresholds).
 * With resampled shares it has a band: their percentiles at the price.
 */
export function piecewiseShareCurve(curve: {
  prices: readonly number[];
  shares: readonly number[];
  resampledShares?: ResampledShares;
  observedPriceRange: Range;
  n: number;
}): FittedDemandCurve {
  const { prices, shares, resampledShares } = curve;
  if (prices.length !== shares.length) {
    throw new EstimationError(
      'length-mismatch',
      'a tabulated curve needs one share per price',
      'shares',
    );
  }
  checkResampled(resampledShares, prices.length);
  const shareAt = (values: readonly number[], p: number) => piecewiseShare(prices, values, p);
  return {
    description: 'mean calibrated purchase likelihood (Newton–Miller–Smith trial curve)',
    method: 'price-thresholds trial curve',
    quantityKind: 'share',
    quantity: (p) => shareAt(shares, p),
    ...bandOf(resampledShares, shareAt),
    priceRange: { min: 0, max: prices[prices.length - 1] },
    observedPriceRange: curve.observedPriceRange,
    n: curve.n,
  };
}

/** The share at `price` of shares given at knots: linear between them, 0 outside. */
export function piecewiseShare(
  prices: readonly number[],
  shares: readonly number[],
  price: number,
): number {
  if (price < prices[0] || price > prices[prices.length - 1]) return 0;
  const k = prices.findIndex((x) => x >= price);
  if (prices[k] === price || k === 0) return shares[k];
  const t = (price - prices[k - 1]) / (prices[k] - prices[k - 1]);
  return shares[k - 1] + t * (shares[k] - shares[k - 1]);
}

function checkResampled(resampled: ResampledShares, knots: number): void {
  if (resampled?.some((row) => row.length !== knots)) {
    throw new EstimationError(
      'length-mismatch',
      'each resampled curve needs one share per knot',
      'resampledShares',
    );
  }
}

/** The percentile band of the resampled curves, when there are any. */
function bandOf(
  resampled: ResampledShares,
  shareAt: (values: readonly number[], price: number) => number,
): { quantityInterval?: (price: number, level: number) => QuantityInterval } {
  if (!resampled || resampled.length === 0) return {};
  return {
    quantityInterval: (price, level) => {
      const values = resampled.map((row) => shareAt(row, price)).sort((a, b) => a - b);
      const tail = (1 - level) / 2;
      return { low: sortedQuantile(values, tail), high: sortedQuantile(values, 1 - tail) };
    },
  };
}
