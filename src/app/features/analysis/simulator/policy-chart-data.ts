import type { ChartData } from 'chart.js';
import type { DemandCurve } from '@shared/estimation/welfare/demand-curve';
import type { FittedDemandCurve } from '@shared/estimation/demand-schedule/fitted-demand-curve';
import type { PolicyIncidence } from '@shared/estimation/welfare/policy-incidence';
import type { SupplyCurve } from '@shared/estimation/welfare/supply-curve';
import { chartColours, withAlpha } from '../charts/chart-palette';
import type { LineDataset, XY } from '../charts/demand-chart-data';
import { demandBandDatasets, demandLineLabel } from './demand-band';
import type { PolicyKind } from './policy-simulation';

const wedgeLabels: Record<PolicyKind, string> = {
  'unit-tax': 'Tax revenue',
  'unit-subsidy': 'Subsidy cost',
  'co-payment': 'Co-payment cost',
};

/**
 * Prices the supply-and-demand chart spans: around every price the policy involves, close
 * enough that the wedge and the loss triangle are large enough to see.
 */
export function policyPriceSpan(result: PolicyIncidence): { min: number; max: number } {
  const prices = [result.before.price, result.buyerPrice, result.sellerPrice];
  return { min: 0.6 * Math.min(...prices), max: 1.4 * Math.max(...prices) };
}

/** Points between two prices, `count` of them, both ends included; in price order. */
function pricesBetween(from: number, to: number, count: number): number[] {
  return Array.from({ length: count }, (_, k) => from + ((to - from) * k) / (count - 1));
}

/** A curve drawn the economists' way: quantity across, price up. */
function quantityPricePoints(quantity: (p: number) => number, prices: number[]): XY[] {
  return prices.map((p) => ({ x: quantity(p), y: p })).filter((pt) => Number.isFinite(pt.x));
}

/**
 * The deadweight loss region: along demand from the buyer price to the old price, then along
 * supply from the old price to the seller price, closed. A triangle for straight lines; a curved
 * one otherwise. Works for a tax (quantity falls) and a subsidy (quantity rises) alike.
 */
export function deadweightLossPolygon(
  demand: DemandCurve,
  supply: SupplyCurve,
  result: PolicyIncidence,
): XY[] {
  const p0 = result.before.price;
  const alongDemand = quantityPricePoints(
    (p) => demand.quantity(p),
    pricesBetween(result.buyerPrice, p0, 24),
  );
  const alongSupply = quantityPricePoints(
    (p) => supply.quantity(p),
    pricesBetween(p0, result.sellerPrice, 24),
  );
  return [...alongDemand, ...alongSupply, alongDemand[0]];
}

/** The wedge between buyer and seller prices over the new quantity: revenue or spending. */
export function wedgeRectangle(result: PolicyIncidence): XY[] {
  const { buyerPrice: pb, sellerPrice: ps, quantity: q } = result;
  return [
    { x: 0, y: ps },
    { x: q, y: ps },
    { x: q, y: pb },
    { x: 0, y: pb },
    { x: 0, y: ps },
  ];
}

const area = (label: string, data: XY[], colour: string, alpha: number): LineDataset => ({
  label,
  data,
  fill: 'shape',
  backgroundColor: withAlpha(colour, alpha),
  borderColor: withAlpha(colour, 0.9),
  borderWidth: 1,
  pointRadius: 0,
  tension: 0,
});

const line = (label: string, data: XY[], colour: string, dash?: number[]): LineDataset => ({
  label,
  data,
  fill: false,
  borderColor: colour,
  backgroundColor: colour,
  borderWidth: dash ? 1.5 : 2.5,
  borderDash: dash,
  pointRadius: 0,
  tension: 0,
});

/**
 * The supply-and-demand chart of a policy: both curves (demand with its band where the fit has
 * one), the old market point, the buyer and seller prices, the wedge (revenue or spending) and
 * the deadweight loss shaded.
 */
export function policyChartData(
  demand: FittedDemandCurve,
  supply: SupplyCurve,
  result: PolicyIncidence,
  kind: PolicyKind,
  confidenceLevel: number,
): ChartData<'line', XY[]> {
  const span = policyPriceSpan(result);
  const prices = pricesBetween(span.min, span.max, 80);
  const q1 = result.quantity;
  const band = demandBandDatasets(demand, prices, confidenceLevel);
  const datasets: LineDataset[] = [
    ...band,
    area(
      'Deadweight loss',
      deadweightLossPolygon(demand, supply, result),
      chartColours.brick,
      0.45,
    ),
    area(wedgeLabels[kind], wedgeRectangle(result), chartColours.amber, 0.22),
    line(
      demandLineLabel(band.length > 0),
      quantityPricePoints((p) => demand.quantity(p), prices),
      chartColours.ink,
    ),
    line(
      'Supply (assumed)',
      quantityPricePoints((p) => supply.quantity(p), prices),
      chartColours.moss,
    ),
    line(
      'Buyer price',
      [
        { x: 0, y: result.buyerPrice },
        { x: q1, y: result.buyerPrice },
      ],
      chartColours.plum,
      [6, 4],
    ),
    line(
      'Seller price',
      [
        { x: 0, y: result.sellerPrice },
        { x: q1, y: result.sellerPrice },
      ],
      chartColours.slate,
      [2, 3],
    ),
    {
      ...line(
        'Market today',
        [{ x: result.before.quantity, y: result.before.price }],
        chartColours.text,
      ),
      pointRadius: 5,
      pointStyle: 'circle',
    },
  ];
  return { datasets };
}
