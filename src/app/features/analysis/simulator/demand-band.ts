import type { FittedDemandCurve } from '@shared/estimation/demand-schedule/fitted-demand-curve';
import { chartColours, withAlpha } from '../charts/chart-palette';
import type { LineDataset, XY } from '../charts/demand-chart-data';
import { levelLabel } from '../figures/figure-format';

/**
 * The demand curve's confidence band drawn the economists' way (quantity across, price up), as
 * one closed shape: the high edge up the prices, the low edge back down. The band is the same
 * one the results chart and the schedule show. Null when the fit gives no band at these prices.
 */
export function demandBandPolygon(
  demand: FittedDemandCurve,
  prices: readonly number[],
  confidenceLevel: number,
): XY[] | null {
  const banded = prices.flatMap((price) => {
    const band = demand.quantityInterval?.(price, confidenceLevel);
    return band && Number.isFinite(band.low) && Number.isFinite(band.high)
      ? [{ price, low: band.low, high: band.high }]
      : [];
  });
  if (banded.length < 2) return null;
  const highEdge = banded.map((b) => ({ x: b.high, y: b.price }));
  const lowEdge = [...banded].reverse().map((b) => ({ x: b.low, y: b.price }));
  return [...highEdge, ...lowEdge, highEdge[0]];
}

/** The demand curve's band as a shaded shape without an outline; nothing without a band. */
export function demandBandDatasets(
  demand: FittedDemandCurve,
  prices: number[],
  confidenceLevel: number,
): LineDataset[] {
  const polygon = demandBandPolygon(demand, prices, confidenceLevel);
  if (!polygon) return [];
  return [
    {
      label: `Demand: ${levelLabel(confidenceLevel)} band`,
      data: polygon,
      fill: 'shape',
      backgroundColor: withAlpha(chartColours.ink, 0.14),
      borderColor: 'transparent',
      borderWidth: 0,
      pointRadius: 0,
      tension: 0,
    },
  ];
}

/** What the demand line is called: an estimate inside its band, or alone as the centre. */
export function demandLineLabel(banded: boolean): string {
  return banded ? 'Demand (estimate)' : 'Demand: central estimate (this fit gives no band)';
}
