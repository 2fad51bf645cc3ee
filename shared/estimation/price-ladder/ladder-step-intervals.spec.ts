import { arcElasticity } from '../welfare/arc-elasticity';
import type { LadderSample } from './grid-maximum-interval';
import { ladderStepIntervals } from './ladder-step-intervals';

/** `people` respondents at prices 100 and 150: the first `buyLow` buy at 100, `buyHigh` at 150. */
function ladder(people: number, buyLow: number, buyHigh: number): LadderSample {
  const respondents: number[] = [];
  const prices: number[] = [];
  const probabilities: number[] = [];
  for (let r = 0; r < people; r++) {
    respondents.push(r, r);
    prices.push(100, 150);
    probabilities.push(r < buyLow ? 1 : 0, r < buyHigh ? 1 : 0);
  }
  return { respondents, prices, probabilities, weights: probabilities.map(() => 1) };
}

describe('ladderStepIntervals', () => {
  it('gives a step’s share the binomial interval of a proportion', () => {
    // 400 respondents, 30 % buy at 150: 0.3 ± 1.96·√(0.3·0.7/400) = 0.3 ± 0.045 (normal
    // approximation to a binomial proportion, common practice).
    const { shares } = ladderStepIntervals(ladder(400, 200, 120), 0.95);
    const half = 1.959964 * Math.sqrt((0.3 * 0.7) / 400);
    expect(shares[1].ciLow!).toBeCloseTo(0.3 - half, 1);
    expect(shares[1].ciHigh!).toBeCloseTo(0.3 + half, 1);
    expect(Math.abs(shares[1].ciHigh! - shares[1].ciLow! - 2 * half)).toBeLessThan(0.015);
  });

  it('brackets the arc elasticity and narrows it about as 1/√n with four times the sample', () => {
    const estimate = arcElasticity(100, 0.5, 150, 0.3); // −1.25 by the midpoint formula
    const small = ladderStepIntervals(ladder(200, 100, 60), 0.95).arcElasticities[0];
    const large = ladderStepIntervals(ladder(800, 400, 240), 0.95).arcElasticities[0];
    for (const interval of [small, large]) {
      expect(interval.ciLow!).toBeLessThan(estimate);
      expect(interval.ciHigh!).toBeGreaterThan(estimate);
    }
    const ratio = (large.ciHigh! - large.ciLow!) / (small.ciHigh! - small.ciLow!);
    expect(ratio).toBeGreaterThan(0.4);
    expect(ratio).toBeLessThan(0.6);
  });

  it('withholds the interval of a step no resample can compute (nobody buys at either end)', () => {
    const { arcElasticities } = ladderStepIntervals(ladder(50, 0, 0), 0.95);
    expect(arcElasticities[0]).toEqual({ ciLow: null, ciHigh: null });
  });
});
