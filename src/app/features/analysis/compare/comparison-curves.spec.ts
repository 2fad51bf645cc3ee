import type { BandedCurve } from '../charts/banded-curve';
import { comparisonCurves, estimateAt, mixedKinds } from './comparison-curves';

const base = {
  confidenceLevel: 0.95,
  observedPriceRange: { min: 0, max: 10 },
};
const quantities: BandedCurve = {
  ...base,
  label: 'Shelf',
  quantityKind: 'quantity',
  points: [
    { price: 0, estimate: 200, low: 180, high: 220 },
    { price: 10, estimate: 100, low: 90, high: 110 },
  ],
};
const shares: BandedCurve = {
  ...base,
  label: 'Ladder',
  quantityKind: 'share',
  points: [
    { price: 0, estimate: 0.8, low: null, high: null },
    { price: 10, estimate: 0.2, low: null, high: null },
  ],
};

describe('comparison curves', () => {
  it('interpolates a curve between its points', () => {
    expect(estimateAt(quantities, 5)).toBe(150);
    expect(estimateAt(quantities, 12)).toBeNull();
  });

  it('sees when quantities and shares are mixed', () => {
    expect(mixedKinds([quantities, shares])).toBe(true);
    expect(mixedKinds([quantities, quantities])).toBe(false);
  });

  it('indexes each curve to 100 at the reference price, band by the same factor', () => {
    const [q, s] = comparisonCurves([quantities, shares], 'indexed', 5);
    // 150 at P = 5 → factor 2/3; 0.5 at P = 5 → factor 200 (linear interpolation, by hand).
    const expected = [
      [200, 180, 220],
      [100, 90, 110],
    ].map((row) => row.map((v) => (v * 2) / 3));
    q.points.forEach((p, i) =>
      [p.estimate, p.low!, p.high!].forEach((v, j) => expect(v).toBeCloseTo(expected[i][j], 10)),
    );
    expect(s.points[0].estimate).toBeCloseTo(160, 10);
    expect(s.points[1].estimate).toBeCloseTo(40, 10);
    expect(s.points[0].low).toBeNull();
  });

  it('leaves curves as estimated when asked, and drops one that is 0 at the index price', () => {
    expect(comparisonCurves([quantities], 'as-estimated', 5)).toEqual([quantities]);
    const zero: BandedCurve = {
      ...shares,
      points: shares.points.map((p) => ({ ...p, estimate: 0 })),
    };
    expect(comparisonCurves([zero, quantities], 'indexed', 5).map((c) => c.label)).toEqual([
      'Shelf',
    ]);
  });
});
