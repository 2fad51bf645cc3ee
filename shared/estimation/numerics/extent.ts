/**
 * The smallest and largest of many numbers by a loop. Spreading an array into `Math.min` /
 * `Math.max` passes every element as an argument and overflows the call stack somewhere past
 * about 10⁵ elements, which a study of a million interviews reaches easily.
 */
export function extent(values: Iterable<number>): { min: number; max: number } {
  let min = Infinity;
  let max = -Infinity;
  for (const value of values) {
    // NaN wins, as it does in Math.min / Math.max.
    if (Number.isNaN(value)) return { min: NaN, max: NaN };
    if (value < min) min = value;
    if (value > max) max = value;
  }
  return { min, max };
}

/** The smallest value (Infinity for none), as `Math.min(...values)` without the spread. */
export const smallest = (values: Iterable<number>): number => extent(values).min;

/** The largest value (−Infinity for none), as `Math.max(...values)` without the spread. */
export const largest = (values: Iterable<number>): number => extent(values).max;
