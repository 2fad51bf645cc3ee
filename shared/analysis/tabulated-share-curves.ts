import type { FittedDemandCurve } from '../estimation/demand-schedule/fitted-demand-curve';
import { EstimationError } from '../estimation/estimation-error';

interface Range {
  readonly min: number;
  readonly max: number;
}

/**
 * The empirical WTP curve from its distinct amounts: the share at a price is the share recorded
 * at the first amount at or above it (everyone with WTP ≥ that amount), and 0 above the last.
 */
export function stepShareCurve(curve: {
  points: readonly { price: number; share: number }[];
  observedPriceRange: Range;
  n: number;
}): FittedDemandCurve {
  const points = [...curve.points].sort((a, b) => a.price - b.price);
  const last = points[points.length - 1].price;
  return {
    description: 'share with stated WTP at or above the price',
    method: 'open-ended willingness to pay',
    quantityKind: 'share',
    quantity: (p) => points.find((point) => point.price >= p)?.share ?? 0,
    priceRange: { min: 0, max: last },
    observedPriceRange: curve.observedPriceRange,
    n: curve.n,
    discrete: true,
  };
}

/** A share given at knots, linear between them and 0 outside (the trial curve of thresholds). */
export function piecewiseShareCurve(curve: {
  prices: readonly number[];
  shares: readonly number[];
  observedPriceRange: Range;
  n: number;
}): FittedDemandCurve {
  const { prices, shares } = curve;
  if (prices.length !== shares.length) {
    throw new EstimationError(
      'length-mismatch',
      'a tabulated curve needs one share per price',
      'shares',
    );
  }
  const quantity = (p: number) => {
    if (p < prices[0] || p > prices[prices.length - 1]) return 0;
    const k = prices.findIndex((x) => x >= p);
    if (prices[k] === p || k === 0) return shares[k];
    const t = (p - prices[k - 1]) / (prices[k] - prices[k - 1]);
    return shares[k - 1] + t * (shares[k] - shares[k - 1]);
  };
  return {
    description: 'mean calibrated purchase likelihood (Newton–Miller–Smith trial curve)',
    method: 'price-thresholds trial curve',
    quantityKind: 'share',
    quantity,
    priceRange: { min: 0, max: prices[prices.length - 1] },
    observedPriceRange: curve.observedPriceRange,
    n: curve.n,
  };
}
