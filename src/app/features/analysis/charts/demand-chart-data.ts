import type { ChartData, ChartDataset, ScriptableLineSegmentContext } from 'chart.js';
import type { BandedCurve } from './banded-curve';
import { chartColours, seriesColour, withAlpha } from './chart-palette';

/** A point of a chart.js line drawn on a linear x axis. */
export interface XY {
  readonly x: number;
  readonly y: number;
}

export type LineDataset = ChartDataset<'line', XY[]>;

/** Shown in the legend and read by screen-reader summaries; band halves carry no label. */
export const bandLabel = (curve: BandedCurve) =>
  `${curve.label}: ${Math.round(curve.confidenceLevel * 100)} % band`;

/**
 * The band of one curve as two datasets, the upper filled down to the lower ('+1'), so the
 * shaded area is exactly the interval. Points without a band are left out of both.
 */
export function bandDatasets(curve: BandedCurve, colour: string): LineDataset[] {
  const banded = curve.points.filter((p) => p.low !== null && p.high !== null);
  if (banded.length === 0) return [];
  const edge = { borderWidth: 0, pointRadius: 0, pointHitRadius: 0, tension: 0 };
  return [
    {
      ...edge,
      label: bandLabel(curve),
      data: banded.map((p) => ({ x: p.price, y: p.high! })),
      backgroundColor: withAlpha(colour, 0.16),
      borderColor: withAlpha(colour, 0.16),
      fill: '+1',
    },
    {
      ...edge,
      label: '',
      data: banded.map((p) => ({ x: p.price, y: p.low! })),
      borderColor: 'transparent',
      fill: false,
    },
  ];
}

/** True where a segment leaves the prices the curve was fitted on: it is drawn dashed. */
export function isExtrapolatedSegment(curve: BandedCurve, from: number, to: number): boolean {
  const { min, max } = curve.observedPriceRange;
  return from < min || to > max;
}

/** The estimate of one curve as a solid line, dashed where it is extrapolation. */
export function estimateDataset(curve: BandedCurve, colour: string): LineDataset {
  return {
    label: `${curve.label} (estimate)`,
    data: curve.points.map((p) => ({ x: p.price, y: p.estimate })),
    borderColor: colour,
    backgroundColor: colour,
    borderWidth: 2.5,
    pointRadius: 0,
    pointHoverRadius: 4,
    tension: 0,
    fill: false,
    segment: {
      borderDash: (ctx: ScriptableLineSegmentContext) =>
        isExtrapolatedSegment(curve, ctx.p0.parsed.x ?? NaN, ctx.p1.parsed.x ?? NaN)
          ? [6, 5]
          : undefined,
    },
  };
}

/** Revenue (price × quantity, or per potential buyer for a share) on the right-hand axis. */
export function revenueDataset(curve: BandedCurve): LineDataset {
  return {
    label: curve.quantityKind === 'share' ? 'Revenue per potential buyer' : 'Revenue',
    data: curve.points.map((p) => ({ x: p.price, y: p.price * p.estimate })),
    borderColor: chartColours.amber,
    backgroundColor: chartColours.amber,
    borderDash: [3, 3],
    borderWidth: 2,
    pointRadius: 0,
    tension: 0,
    fill: false,
    yAxisID: 'revenue',
  };
}

/**
 * Datasets for one or more demand curves with their bands, each in its own colour; with
 * `revenue`, the first curve's revenue is added on a second axis.
 */
export function demandChartData(
  curves: readonly BandedCurve[],
  options: { readonly revenue?: boolean } = {},
): ChartData<'line', XY[]> {
  const datasets = curves.flatMap((curve, i) => [
    ...bandDatasets(curve, seriesColour(i)),
    estimateDataset(curve, seriesColour(i)),
  ]);
  if (options.revenue && curves.length > 0) datasets.push(revenueDataset(curves[0]));
  return { datasets };
}
