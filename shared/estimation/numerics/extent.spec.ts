import { extent, largest, smallest } from './extent';

describe('extent', () => {
  it('agrees with Math.min / Math.max on small arrays, including the empty one', () => {
    const values = [3, -1.5, 7, 0, 7, -1.5];
    // Math.min / Math.max of the same arguments (the language's own definition).
    expect(extent(values)).toEqual({ min: Math.min(...values), max: Math.max(...values) });
    expect(smallest([])).toBe(Math.min());
    expect(largest([])).toBe(Math.max());
    expect(largest([1, NaN, 2])).toBeNaN();
  });

  it('takes a million values without overflowing the stack', () => {
    const values = Float64Array.from({ length: 1_000_000 }, (_, i) => (i * 7919) % 1_000_003);
    // exact arithmetic: i·7919 mod 1,000,003 over i < 10⁶ includes 0 (i = 0); the largest is
    // found by the plain loop below, an independent reading of the same array.
    let top = -Infinity;
    for (const v of values) if (v > top) top = v;
    expect(extent(values)).toEqual({ min: 0, max: top });
  });
});
