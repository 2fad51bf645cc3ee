import { fittedCurveFrom } from '@shared/analysis/fitted-curve';
import type { ScriptableLineSegmentContext } from 'chart.js';
import { linearDescription } from '../testing/linear-description';
import { sampleFittedCurve, curvePointsFromRows, type BandedCurve } from './banded-curve';
import {
  bandDatasets,
  demandChartData,
  estimateDataset,
  revenueDataset,
} from './demand-chart-data';
import { legendKeeps } from './demand-chart-options';

const curve: BandedCurve = {
  label: 'Shelf prices',
  quantityKind: 'quantity',
  confidenceLevel: 0.95,
  observedPriceRange: { min: 10, max: 30 },
  points: [
    { price: 5, estimate: 90, low: null, high: null },
    { price: 10, estimate: 80, low: 75, high: 85 },
    { price: 20, estimate: 60, low: 57, high: 63 },
    { price: 40, estimate: 20, low: 10, high: 30 },
  ],
};

/** The context chart.js hands a segment callback, reduced to the parsed x values. */
const segment = (from: number, to: number) =>
  ({ p0: { parsed: { x: from } }, p1: { parsed: { x: to } } }) as ScriptableLineSegmentContext;

describe('demand chart data', () => {
  it('draws a band as an upper edge filled down to the lower edge, skipping unbanded prices', () => {
    const [upper, lower] = bandDatasets(curve, '#13525a');
    expect(upper.fill).toBe('+1');
    expect(upper.label).toBe('Shelf prices: 95 % band');
    expect(upper.data).toEqual([
      { x: 10, y: 85 },
      { x: 20, y: 63 },
      { x: 40, y: 30 },
    ]);
    expect(lower.data.map((p) => p.y)).toEqual([75, 57, 10]);
    expect(lower.label).toBe('');
    expect(lower.fill).toBe(false);
  });

  it('gives a curve with no band no band datasets', () => {
    const bare = { ...curve, points: curve.points.map((p) => ({ ...p, low: null, high: null })) };
    expect(bandDatasets(bare, '#13525a')).toEqual([]);
  });

  it('draws the estimate solid inside the observed prices and dashed outside', () => {
    const line = estimateDataset(curve, '#13525a');
    expect(line.data).toHaveLength(4);
    const dash = (line.segment as { borderDash: (ctx: ScriptableLineSegmentContext) => unknown })
      .borderDash;
    expect(dash(segment(10, 20))).toBeUndefined();
    expect(dash(segment(20, 40))).toEqual([6, 5]);
    expect(dash(segment(5, 10))).toEqual([6, 5]);
  });

  it('computes revenue as price × estimate on its own axis', () => {
    const revenue = revenueDataset(curve);
    expect(revenue.yAxisID).toBe('revenue');
    expect(revenue.data.map((p) => p.y)).toEqual([450, 800, 1200, 800]);
    expect(revenueDataset({ ...curve, quantityKind: 'share' }).label).toBe(
      'Revenue per potential buyer',
    );
  });

  it('gives each curve its own colour and adds revenue for the first only', () => {
    const second: BandedCurve = { ...curve, label: 'Price ladder' };
    const data = demandChartData([curve, second], { revenue: true });
    expect(data.datasets.map((d) => d.label)).toEqual([
      'Shelf prices: 95 % band',
      '',
      'Shelf prices (estimate)',
      'Price ladder: 95 % band',
      '',
      'Price ladder (estimate)',
      'Revenue',
    ]);
    expect(data.datasets[2].borderColor).not.toEqual(data.datasets[5].borderColor);
    expect(demandChartData([curve]).datasets).toHaveLength(3);
  });

  it('keeps the band halves out of the legend', () => {
    expect(legendKeeps({ text: '' } as never)).toBe(false);
    expect(legendKeeps({ text: 'Shelf prices (estimate)' } as never)).toBe(true);
  });
});

describe('curve sampling', () => {
  it('takes the band from the engine’s fitted curve, point by point', () => {
    const fitted = fittedCurveFrom(linearDescription());
    const sampled = sampleFittedCurve('Linear', fitted, [10, 20, 30], 0.95);
    sampled.points.forEach((point) => {
      const band = fitted.quantityInterval!(point.price, 0.95);
      expect(point.estimate).toBe(100 - 2 * point.price); // Q = 100 − 2P, CHECKS.md §8
      expect(point.low).toBe(band.low);
      expect(point.high).toBe(band.high);
    });
  });

  it('leaves out prices where the curve has no finite value (log-log at 0)', () => {
    const loglog = fittedCurveFrom({
      ...linearDescription(),
      kind: 'loglog',
      priceCoefficient: -1.4,
    });
    const sampled = sampleFittedCurve('Log-log', loglog, [0, 1, 2], 0.95);
    expect(sampled.points.map((p) => p.price)).toEqual([1, 2]);
  });

  it('reads a published schedule’s rows as points', () => {
    expect(curvePointsFromRows([{ price: 2, quantity: 0.4, ciLow: 0.3, ciHigh: 0.5 }])).toEqual([
      { price: 2, estimate: 0.4, low: 0.3, high: 0.5 },
    ]);
  });
});
