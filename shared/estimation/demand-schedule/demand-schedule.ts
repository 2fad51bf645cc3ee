import { EstimationError } from '../estimation-error';
import { pointElasticity } from '../welfare/point-elasticity';
import {
  demandScheduleSchema,
  type DemandSchedule,
  type DemandScheduleRow,
} from './demand-schedule-schema';
import type { FittedDemandCurve } from './fitted-demand-curve';

/** Prices of the schedule: listed, or `steps` equally spaced prices from `from` to `to`. */
export type PriceGrid =
  | { readonly prices: readonly number[] }
  | { readonly from: number; readonly to: number; readonly steps: number };

/**
 * Tabulates a fitted demand curve over a price grid: predicted quantity or share with its band,
 * revenue and point elasticity at each price, flagging prices outside the fitted range as
 * extrapolation. The result is checked against `demandScheduleSchema`.
 */
export function buildDemandSchedule(
  curve: FittedDemandCurve,
  grid: PriceGrid,
  confidenceLevel = 0.95,
): DemandSchedule {
  if (!(confidenceLevel > 0 && confidenceLevel < 1)) {
    throw new EstimationError(
      'invalid-value',
      'confidence level must lie in (0, 1)',
      'confidenceLevel',
    );
  }
  const prices = gridPrices(grid);
  const { min, max } = curve.observedPriceRange;
  const rows = prices.map((price): DemandScheduleRow => {
    const quantity = curve.quantity(price);
    const band = curve.quantityInterval?.(price, confidenceLevel);
    return {
      price,
      quantity,
      ciLow: band ? band.low : null,
      ciHigh: band ? band.high : null,
      revenue: price * quantity,
      elasticity:
        curve.discrete || !(quantity > 0) || price === 0 ? null : pointElasticity(curve, price),
      extrapolated: price < min || price > max,
    };
  });
  return demandScheduleSchema.parse({
    method: curve.method,
    quantityKind: curve.quantityKind,
    n: curve.n,
    confidenceLevel,
    observedPriceRange: { min, max },
    rows,
    assumptions: [
      `predictions from ${curve.description}`,
      curve.quantityInterval
        ? `${Math.round(confidenceLevel * 100)} % band for the mean prediction`
        : 'no confidence band for this model',
      curve.quantityKind === 'share'
        ? 'revenue per potential buyer (price × share)'
        : 'revenue = price × quantity',
      `prices outside ${min}–${max} are extrapolation`,
    ],
  });
}

function gridPrices(grid: PriceGrid): number[] {
  const prices =
    'prices' in grid
      ? [...grid.prices]
      : (() => {
          if (!(Number.isInteger(grid.steps) && grid.steps >= 2) || !(grid.to > grid.from)) {
            throw new EstimationError(
              'invalid-value',
              'a price grid needs to > from and at least 2 steps',
              'grid',
            );
          }
          return Array.from(
            { length: grid.steps },
            (_, k) => grid.from + ((grid.to - grid.from) * k) / (grid.steps - 1),
          );
        })();
  if (prices.length === 0)
    throw new EstimationError('too-few-observations', 'the price grid is empty', 'grid');
  prices.forEach((p, i) => {
    if (!(Number.isFinite(p) && p >= 0))
      throw new EstimationError(
        'invalid-value',
        `grid price ${i + 1} must be a number ≥ 0`,
        'grid',
      );
    if (i > 0 && !(p > prices[i - 1]))
      throw new EstimationError('invalid-value', 'grid prices must strictly increase', 'grid');
  });
  return prices;
}
