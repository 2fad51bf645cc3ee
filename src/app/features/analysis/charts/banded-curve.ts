import type { FittedDemandCurve } from '@shared/estimation/demand-schedule/fitted-demand-curve';
import type { PriceRange } from '@shared/estimation/welfare/demand-curve';

/** One point of a curve to draw: the estimate and, where the model gives one, its band. */
export interface CurvePoint {
  readonly price: number;
  readonly estimate: number;
  readonly low: number | null;
  readonly high: number | null;
}

/** A demand curve ready to draw: its points, what it measures, and where it rests on data. */
export interface BandedCurve {
  readonly label: string;
  readonly quantityKind: 'quantity' | 'share';
  readonly confidenceLevel: number;
  readonly observedPriceRange: PriceRange;
  readonly points: readonly CurvePoint[];
}

/** A schedule row as published or as a fit tabulates it. */
export interface ScheduleRowLike {
  readonly price: number;
  readonly quantity: number;
  readonly ciLow: number | null;
  readonly ciHigh: number | null;
}

/** The points of a tabulated schedule (a published version or a fit's own grid). */
export function curvePointsFromRows(rows: readonly ScheduleRowLike[]): CurvePoint[] {
  return rows.map((row) => ({
    price: row.price,
    estimate: row.quantity,
    low: row.ciLow,
    high: row.ciHigh,
  }));
}

/** `count` equally spaced prices from `min` to `max`, both included. */
export function evenPrices(min: number, max: number, count: number): number[] {
  if (!(max > min) || count < 2) return [min];
  return Array.from({ length: count }, (_, k) => min + ((max - min) * k) / (count - 1));
}

/**
 * Samples a fitted curve for drawing. Points where the model gives no finite value (a log form
 * at price 0) are left out rather than drawn as a spike.
 */
export function sampleFittedCurve(
  label: string,
  curve: FittedDemandCurve,
  prices: readonly number[],
  confidenceLevel: number,
): BandedCurve {
  const points: CurvePoint[] = [];
  for (const price of prices) {
    const estimate = curve.quantity(price);
    if (!Number.isFinite(estimate)) continue;
    const band = curve.quantityInterval?.(price, confidenceLevel);
    const banded = band && Number.isFinite(band.low) && Number.isFinite(band.high);
    points.push({
      price,
      estimate,
      low: banded ? band.low : null,
      high: banded ? band.high : null,
    });
  }
  return {
    label,
    quantityKind: curve.quantityKind,
    confidenceLevel,
    observedPriceRange: curve.observedPriceRange,
    points,
  };
}
