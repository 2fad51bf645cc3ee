import { frequencyBootstrap } from '../resampling/frequency-resamples';
import { respondentBootstrap, type ResampledInterval } from '../resampling/respondent-bootstrap';

/** The ladder's answers after the monotone rule, one entry per answer. */
export interface LadderSample {
  readonly respondents: readonly (string | number)[];
  readonly prices: readonly number[];
  readonly probabilities: readonly number[];
  readonly weights: readonly number[];
  /** Respondents each answer's respondent stands for (a frequency table's cells); default 1. */
  readonly counts?: readonly number[];
}

/** The central range of the ladder prices that resampled surveys chose. */
export interface GridMaximumInterval extends ResampledInterval {
  readonly resamples: number;
}

/** Resamples: enough for the 2.5% and 97.5% points of a handful of ladder prices. */
export const GRID_MAXIMUM_RESAMPLES = 1000;

/**
 * How firmly the grid picks its best price: respondents are drawn with replacement (all of a
 * respondent's answers together, by `respondentBootstrap`), the weighted share at each ladder
 * price and the price with the largest `value(price, share)` are found again (ties to the lowest
 * price, as for the estimate), and the interval is the central `level` share of those prices.
 * The draws are seeded, so a fit repeated on the same answers gives the same interval.
 */
export function gridMaximumInterval(
  sample: LadderSample,
  value: (price: number, share: number) => number,
  level: number,
  resamples = GRID_MAXIMUM_RESAMPLES,
  seed = 20_240_611,
): GridMaximumInterval {
  const { levels, people } = ladderTotalsByRespondent(sample);
  const weight = new Float64Array(levels.length);
  const bought = new Float64Array(levels.length);
  const bestPrice = (drawn: readonly RespondentLadderTotals[]) => {
    sumTotals(drawn, weight, bought);
    let best: number | null = null;
    let bestValue = -Infinity;
    for (let j = 0; j < levels.length; j++) {
      // A price no drawn respondent answered at cannot be chosen.
      if (weight[j] === 0) continue;
      const v = value(levels[j], bought[j] / weight[j]);
      if (v > bestValue) [best, bestValue] = [levels[j], v];
    }
    return { price: best };
  };
  const { price } = resampledFigures(people, ['price'], bestPrice, level, resamples, seed);
  return { ...price, resamples };
}

/** One respondent's weight and weighted purchases at each ladder price (by `levels`). */
export interface RespondentLadderTotals {
  readonly weight: Float64Array;
  readonly bought: Float64Array;
  /** Respondents these totals stand for (a frequency table's cell), each with 1/count of them. */
  readonly count: number;
}

/**
 * The respondent bootstrap of ladder figures: respondents drawn one by one, or, when the
 * sample is a frequency table, each cell's draw count from a seeded multinomial draw (the same
 * distribution, at a cost that grows with the cells).
 */
export function resampledFigures<K extends string>(
  people: readonly RespondentLadderTotals[],
  keys: readonly K[],
  compute: (drawn: readonly RespondentLadderTotals[]) => Partial<Record<K, number | null>>,
  level: number,
  resamples: number,
  seed: number,
): Record<K, ResampledInterval> {
  if (people.every((person) => person.count === 1)) {
    return respondentBootstrap(people, keys, compute, level, resamples, seed);
  }
  const counts = people.map((person) => person.count);
  return frequencyBootstrap(
    counts,
    keys,
    (drawn) => {
      const sample: RespondentLadderTotals[] = [];
      drawn.forEach((times, k) => {
        if (times === 0) return;
        const person = people[k];
        const share = times / person.count;
        sample.push({
          weight: person.weight.map((w) => w * share),
          bought: person.bought.map((b) => b * share),
          count: times,
        });
      });
      return compute(sample);
    },
    level,
    resamples,
    seed,
  );
}

/**
 * The ladder prices (ascending) and each respondent's totals at them: what a resample of
 * respondents adds up, all of a respondent's answers together.
 */
export function ladderTotalsByRespondent(sample: LadderSample): {
  levels: number[];
  people: RespondentLadderTotals[];
} {
  const levels = [...new Set(sample.prices)].sort((a, b) => a - b);
  const column = new Map(levels.map((price, j) => [price, j]));
  const byRespondent = new Map<string | number, RespondentLadderTotals>();
  sample.respondents.forEach((respondent, i) => {
    let own = byRespondent.get(respondent);
    if (!own) {
      own = {
        weight: new Float64Array(levels.length),
        bought: new Float64Array(levels.length),
        count: sample.counts?.[i] ?? 1,
      };
      byRespondent.set(respondent, own);
    }
    const j = column.get(sample.prices[i])!;
    own.weight[j] += sample.weights[i];
    own.bought[j] += sample.weights[i] * sample.probabilities[i];
  });
  return { levels, people: [...byRespondent.values()] };
}

/** Adds drawn respondents' totals into `weight` and `bought` (cleared first). */
export function sumTotals(
  drawn: readonly RespondentLadderTotals[],
  weight: Float64Array,
  bought: Float64Array,
): void {
  weight.fill(0);
  bought.fill(0);
  for (const person of drawn) {
    for (let j = 0; j < weight.length; j++) {
      weight[j] += person.weight[j];
      bought[j] += person.bought[j];
    }
  }
}
