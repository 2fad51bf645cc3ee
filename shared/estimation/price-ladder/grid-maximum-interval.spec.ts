import { mulberry32 } from '../random/mulberry32';
import { gridMaximumInterval, type LadderSample } from './grid-maximum-interval';
import { priceOfMaximum, summariseSteps } from './ladder-steps';
import { analysePriceLadder } from './price-ladder';

const prices = [100, 150, 200, 250, 300];
const revenue = (price: number, share: number) => price * share;

/** Respondents who buy up to their own highest price (yes below it, no above), weight 1. */
function ladder(limits: readonly number[]): LadderSample {
  const sample = {
    respondents: [] as string[],
    prices: [] as number[],
    probabilities: [] as number[],
  };
  limits.forEach((limit, r) => {
    for (const price of prices) {
      sample.respondents.push(`r${r}`);
      sample.prices.push(price);
      sample.probabilities.push(price <= limit ? 1 : 0);
    }
  });
  return { ...sample, weights: sample.prices.map(() => 1) };
}

describe('gridMaximumInterval (percentile bootstrap over respondents, common practice)', () => {
  it('collapses onto the price every resample must choose', () => {
    // Everyone buys at 200 and no one above: 200 has revenue 200 × 1, every other price less.
    const interval = gridMaximumInterval(ladder(Array(40).fill(200)), revenue, 0.95);
    expect(interval).toEqual({ ciLow: 200, ciHigh: 200, resamples: 1000 });
  });

  it('spans both prices of a near tie', () => {
    // Half stop at 150, half at 300: revenue 150 × 1 = 150 at 150 against 300 × ½ = 150 at 300.
    const limits = [...Array(30).fill(150), ...Array(30).fill(300)];
    const interval = gridMaximumInterval(ladder(limits), revenue, 0.95);
    expect(interval.ciLow).toBe(150);
    expect(interval.ciHigh).toBe(300);
  });

  it('gives the same interval for the same answers, and a narrower one at a lower level', () => {
    const random = mulberry32(5);
    const limits = Array.from({ length: 80 }, () => prices[Math.floor(random() * prices.length)]);
    const sample = ladder(limits);
    const wide = gridMaximumInterval(sample, revenue, 0.95);
    expect(gridMaximumInterval(sample, revenue, 0.95)).toEqual(wide);
    const narrow = gridMaximumInterval(sample, revenue, 0.5);
    expect(narrow.ciLow).toBeGreaterThanOrEqual(wide.ciLow!);
    expect(narrow.ciHigh).toBeLessThanOrEqual(wide.ciHigh!);
  });

  it('agrees with resampling done the plain way, through the ladder-step summary', () => {
    // A second implementation: the same seeded draws, each resample summarised by
    // summariseSteps and priceOfMaximum (the functions the estimate itself uses).
    const random = mulberry32(11);
    const limits = Array.from({ length: 50 }, () => prices[Math.floor(random() * prices.length)]);
    const sample = ladder(limits);
    const resamples = 200;
    const fast = gridMaximumInterval(sample, revenue, 0.9, resamples, 77);
    const uniform = mulberry32(77);
    const people = limits.map((_, r) => `r${r}`);
    const chosen: number[] = [];
    for (let draw = 0; draw < resamples; draw++) {
      const drawn = people.map(() => people[Math.floor(uniform() * people.length)]);
      const rows = drawn.flatMap((who) =>
        sample.respondents.flatMap((r, i) => (r === who ? [i] : [])),
      );
      const steps = summariseSteps(
        rows.map((i) => sample.prices[i]),
        rows.map((i) => sample.probabilities[i]),
        rows.map((i) => sample.weights[i]),
      );
      chosen.push(priceOfMaximum(steps, (s) => s.revenueIndex));
    }
    chosen.sort((a, b) => a - b);
    expect(fast).toEqual({
      ciLow: chosen[Math.floor(0.05 * resamples)],
      ciHigh: chosen[Math.floor(0.95 * resamples)],
      resamples,
    });
  });

  it('brackets the grid estimate of the ladder analysis, for revenue and for profit', () => {
    const random = mulberry32(3);
    const answers = Array.from({ length: 60 }, (_, r) => {
      const limit = prices[Math.floor(random() * prices.length)];
      return prices.map((price) => ({ respondent: `r${r}`, price, buy: price <= limit ? 1 : 0 }));
    }).flat();
    const result = analysePriceLadder({ answers, unitCost: 60 });
    const { revenueMaxPrice, revenueMaxPriceInterval, profitMaxPrice } = result;
    expect(revenueMaxPriceInterval.ciLow).toBeLessThanOrEqual(revenueMaxPrice);
    expect(revenueMaxPriceInterval.ciHigh).toBeGreaterThanOrEqual(revenueMaxPrice);
    expect(result.profitMaxPriceInterval!.ciLow).toBeLessThanOrEqual(profitMaxPrice!);
    expect(result.profitMaxPriceInterval!.ciHigh).toBeGreaterThanOrEqual(profitMaxPrice!);
    expect(analysePriceLadder({ answers }).profitMaxPriceInterval).toBeNull();
  });
});
