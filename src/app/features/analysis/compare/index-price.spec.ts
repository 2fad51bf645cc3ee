import type { BandedCurve } from '../charts/banded-curve';
import { defaultIndexPrice } from './index-price';

/** A curve through the given (price, estimate) points, without a band. */
function curve(label: string, points: [number, number][]): BandedCurve {
  return {
    label,
    quantityKind: 'share',
    confidenceLevel: 0.95,
    observedPriceRange: { min: 0, max: 4000 },
    points: points.map(([price, estimate]) => ({ price, estimate, low: null, high: null })),
  };
}

const grid = [500, 1000, 1500, 2000, 2500, 3000, 3500, 4000];
// A purchase share falling from 0.9 to almost nothing, like a price ladder's.
const ladder = curve('Ladder', [
  [500, 0.9],
  [1000, 0.8],
  [1500, 0.6],
  [2000, 0.3],
  [2500, 0.06],
  [3000, 0.02],
  [4000, 0.01],
]);
// A threshold-style share that rises before it falls.
const thresholds = curve('Thresholds', [
  [500, 0.1],
  [1000, 0.5],
  [1500, 0.45],
  [2000, 0.3],
  [2500, 0.05],
  [4000, 0.01],
]);

describe('the default index price', () => {
  it('sits in the middle of the prices where every curve is well above zero', () => {
    // Ladder ≥ 0.225 (a quarter of 0.9) at 500–2000; thresholds ≥ 0.125 at 1000–2000:
    // together 1000–2000, whose middle is 1500 (worked out by hand).
    expect(defaultIndexPrice([ladder, thresholds], grid)).toBe(1500);
  });

  it('never picks a price where a curve has all but vanished', () => {
    const price = defaultIndexPrice([ladder], grid)!;
    // 2250, the middle of the range, is where the ladder share is about 18 % of its peak.
    expect(price).toBeLessThanOrEqual(2000);
    expect(price).toBeGreaterThanOrEqual(500);
  });

  it('picks a grid price, the one nearest the middle', () => {
    // Ladder alone: well above zero at 500–2000, middle 1250; 1000 and 1500 tie, the first wins.
    expect(grid).toContain(defaultIndexPrice([ladder], grid));
    expect(defaultIndexPrice([ladder], grid)).toBe(1000);
  });

  it('falls back to the lowest grid price when no price has every curve well above zero', () => {
    const early = curve('Early', [
      [500, 1],
      [1000, 0.1],
      [4000, 0],
    ]);
    const late = curve('Late', [
      [500, 0],
      [3500, 0.1],
      [4000, 1],
    ]);
    expect(defaultIndexPrice([early, late], grid)).toBe(500);
  });

  it('has no default without curves or without a grid', () => {
    expect(defaultIndexPrice([], grid)).toBeNull();
    expect(defaultIndexPrice([ladder], [])).toBeNull();
  });
});
