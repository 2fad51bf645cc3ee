import jStat from 'jstat';
import { mulberry32 } from '../random/mulberry32';
import { sortedQuantile } from './sorted-quantile';

describe('sortedQuantile', () => {
  it('interpolates between order statistics at position (n − 1)·q (worked by hand)', () => {
    expect(sortedQuantile([1, 2, 3, 4, 5], 0.5)).toBe(3);
    expect(sortedQuantile([0, 10], 0.25)).toBe(2.5);
    // n = 4: q = 0.9 sits at position 2.7, 70% of the way from 30 to 40.
    expect(sortedQuantile([10, 20, 30, 40], 0.9)).toBeCloseTo(37, 12);
    expect(sortedQuantile([10, 20, 30, 40], 0)).toBe(10);
    expect(sortedQuantile([10, 20, 30, 40], 1)).toBe(40);
    expect(sortedQuantile([7], 0.975)).toBe(7);
  });

  // jStat 1.9.6 returns the second-largest value, without interpolating, once the position
  // falls in the top interval (read from its source), so the comparison stays below it.
  it('agrees with jStat.percentile (inclusive) on seeded random samples', () => {
    const uniform = mulberry32(11);
    for (let trial = 0; trial < 50; trial++) {
      const values = Array.from({ length: 2 + Math.floor(uniform() * 300) }, () => uniform() * 100);
      const sorted = [...values].sort((a, b) => a - b);
      for (const q of [0.025, 0.1, 0.5, 0.9].filter(
        (k) => (values.length - 1) * k < values.length - 2,
      )) {
        expect(sortedQuantile(sorted, q)).toBeCloseTo(jStat.percentile(values, q), 10);
      }
    }
  });
});
