import { mulberry32 } from '../random/mulberry32';
import { frequencyResamples } from '../resampling/frequency-resamples';
import { sortedQuantile } from '../resampling/sorted-quantile';

export interface BootstrapOptions {
  /** Number of resamples; default 2000. */
  readonly replicates?: number;
  /** Seed of the mulberry32 generator; default 20240917. The same seed gives the same interval. */
  readonly seed?: number;
}

export interface BootstrapInterval {
  readonly stdError: number;
  readonly ciLow: number;
  readonly ciHigh: number;
  readonly replicates: number;
  readonly seed: number;
}

/**
 * Percentile bootstrap of a statistic of weighted observations: respondents are resampled with
 * replacement (each with its weight), the statistic recomputed, and the interval read from the
 * replicates' quantiles; the standard error is the replicates' standard deviation.
 */
export function percentileBootstrap(
  values: readonly number[],
  weights: readonly number[],
  statistic: (values: number[], weights: number[]) => number,
  confidenceLevel: number,
  options: BootstrapOptions = {},
): BootstrapInterval {
  const replicates = options.replicates ?? 2000;
  const seed = options.seed ?? 20240917;
  const uniform = mulberry32(seed);
  const n = values.length;
  const draws: number[] = [];
  for (let r = 0; r < replicates; r++) {
    const v: number[] = [];
    const w: number[] = [];
    for (let i = 0; i < n; i++) {
      const k = Math.floor(uniform() * n);
      v.push(values[k]);
      w.push(weights[k]);
    }
    draws.push(statistic(v, w));
  }
  return summarise(draws, confidenceLevel, replicates, seed);
}

/**
 * The same bootstrap on a frequency table — distinct values, the total weight of each and the
 * respondents behind it — with each resample a seeded multinomial draw of how many respondents
 * each value gives (see frequencyResamples): the distribution of drawing respondents one by
 * one, at a cost that grows with the distinct values, not the respondents.
 */
export function frequencyPercentileBootstrap(
  values: readonly number[],
  weights: readonly number[],
  counts: readonly number[],
  statistic: (values: number[], weights: number[]) => number,
  confidenceLevel: number,
  options: BootstrapOptions = {},
): BootstrapInterval {
  const replicates = options.replicates ?? 2000;
  const seed = options.seed ?? 20240917;
  const order = values.map((_, i) => i).sort((i, j) => values[i] - values[j]);
  const draws = frequencyResamples(
    order.map((i) => counts[i]),
    (drawn) => {
      const v: number[] = [];
      const w: number[] = [];
      drawn.forEach((times, k) => {
        if (times === 0) return;
        const i = order[k];
        v.push(values[i]);
        w.push((weights[i] * times) / counts[i]);
      });
      return statistic(v, w);
    },
    replicates,
    seed,
  ).map((draw) => draw ?? NaN);
  return summarise(draws, confidenceLevel, replicates, seed);
}

function summarise(
  draws: number[],
  confidenceLevel: number,
  replicates: number,
  seed: number,
): BootstrapInterval {
  draws.sort((a, b) => a - b);
  const mean = draws.reduce((s, d) => s + d, 0) / replicates;
  const stdError = Math.sqrt(draws.reduce((s, d) => s + (d - mean) ** 2, 0) / (replicates - 1));
  const tail = (1 - confidenceLevel) / 2;
  return {
    stdError,
    ciLow: sortedQuantile(draws, tail),
    ciHigh: sortedQuantile(draws, 1 - tail),
    replicates,
    seed,
  };
}
