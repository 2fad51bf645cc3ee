/**
 * One respondent (or a cell of alike respondents) as the trial curve sees it: four ordered
 * knots on the price grid, given by their grid positions, and the two calibrated likelihoods.
 */
export interface TrialKnots {
  readonly weight: number;
  /** Grid positions of too cheap ≤ cheap ≤ expensive ≤ too expensive. */
  readonly at: readonly [number, number, number, number];
  readonly likelihoodCheap: number;
  readonly likelihoodExpensive: number;
}

/**
 * The weighted sum of every respondent's trial curve at each grid price, in one sweep.
 *
 * A respondent's curve is linear on the half-open spans [too cheap, cheap), [cheap, expensive)
 * and [expensive, too expensive) and 0 elsewhere (0 at too expensive itself; an empty span
 * leaves the value to the next one). Going up the grid, the sum of the active spans grows by
 * their summed slope times the step; a span ending at a price takes off its end value and a span
 * starting there adds its start value. So the cost grows with respondents plus prices, not their
 * product. Running sums are compensated (Neumaier), so the result differs from summing each
 * respondent's value price by price only in the last bits.
 */
export function sweepTrialSums(grid: readonly number[], answers: readonly TrialKnots[]): number[] {
  const size = grid.length;
  // Per grid position: value added by spans starting, value taken by spans ending, slope change.
  const starts = new Float64Array(size);
  const ends = new Float64Array(size);
  const slopes = new Float64Array(size);
  for (const a of answers) {
    const values = [0, a.likelihoodCheap, a.likelihoodExpensive, 0];
    for (let k = 0; k < 3; k++) {
      const from = a.at[k];
      const to = a.at[k + 1];
      if (from === to) continue;
      const slope = (a.weight * (values[k + 1] - values[k])) / (grid[to] - grid[from]);
      starts[from] += a.weight * values[k];
      ends[to] += a.weight * values[k + 1];
      slopes[from] += slope;
      slopes[to] -= slope;
    }
  }
  const sums: number[] = new Array<number>(size);
  const value = new CompensatedSum();
  const slope = new CompensatedSum();
  for (let j = 0; j < size; j++) {
    if (j > 0) value.add(slope.total() * (grid[j] - grid[j - 1]));
    value.add(-ends[j]);
    value.add(starts[j]);
    slope.add(slopes[j]);
    sums[j] = value.total();
  }
  return sums;
}

/** Neumaier's compensated running sum: the rounding lost at each addition is carried apart. */
class CompensatedSum {
  private sum = 0;
  private lost = 0;

  add(x: number): void {
    const next = this.sum + x;
    this.lost += Math.abs(this.sum) >= Math.abs(x) ? this.sum - next + x : x - next + this.sum;
    this.sum = next;
  }

  total(): number {
    return this.sum + this.lost;
  }
}
