import type { BandedCurve } from '../charts/banded-curve';
import { seriesColour } from '../charts/chart-palette';
import { demandChartData } from '../charts/demand-chart-data';
import { comparisonLegend } from './comparison-chart';

const base = { quantityKind: 'share' as const, observedPriceRange: { min: 0, max: 10 } };
const banded: BandedCurve = {
  ...base,
  label: 'Price ladder, n = 231',
  confidenceLevel: 0.9,
  points: [
    { price: 0, estimate: 0.8, low: 0.7, high: 0.9 },
    { price: 10, estimate: 0.2, low: 0.1, high: 0.3 },
  ],
};
const plain: BandedCurve = {
  ...base,
  label: 'Price thresholds, n = 231',
  confidenceLevel: 0.95,
  points: banded.points.map((p) => ({ ...p, low: null, high: null })),
};

describe('the comparison legend', () => {
  it('has one entry per curve, not one for the estimate and one for the band', () => {
    const legend = comparisonLegend([banded, plain]);
    expect(legend.map((item) => item.label)).toEqual([
      'Price ladder, n = 231',
      'Price thresholds, n = 231',
    ]);
    expect(legend.map((item) => item.band)).toEqual(['90 % band', null]);
  });

  it('gives each entry the colour its curve is drawn in', () => {
    const legend = comparisonLegend([banded, plain]);
    const lines = demandChartData([banded, plain]).datasets.filter((d) =>
      d.label?.endsWith('(estimate)'),
    );
    expect(legend.map((item) => item.colour)).toEqual(lines.map((d) => d.borderColor));
    expect(legend[1].colour).toBe(seriesColour(1));
  });
});
