import { mulberry32 } from '../random/mulberry32';

/** A percentile interval, or nulls when too few resamples gave the figure a value. */
export interface ResampledInterval {
  readonly ciLow: number | null;
  readonly ciHigh: number | null;
}

/** Resamples by default: stable 2.5% and 97.5% points without slowing a fit down. */
export const DEFAULT_RESAMPLES = 500;

// Below this share of resamples with a value the percentiles would describe a selected subset.
const minimumUsableShare = 0.9;

/**
 * Percentile bootstrap over respondents (common practice for statistics with no delta-method
 * form, such as curve crossings): `resamples` times, as many respondents as there are are drawn
 * with replacement, `compute` runs on the resample, and each named figure's interval is the
 * central `level` share of its values. A resample where `compute` throws or leaves a figure out
 * gives that figure no value; a figure with values in fewer than 90% of resamples gets no
 * interval. Seeded, so the same answers always give the same intervals.
 */
export function respondentBootstrap<T, K extends string>(
  respondents: readonly T[],
  keys: readonly K[],
  compute: (sample: readonly T[]) => Partial<Record<K, number | null>>,
  level: number,
  resamples = DEFAULT_RESAMPLES,
  seed = 20_261_202,
): Record<K, ResampledInterval> {
  const uniform = mulberry32(seed);
  const values = new Map<K, number[]>(keys.map((key) => [key, []]));
  const sample = new Array<T>(respondents.length);
  for (let draw = 0; draw < resamples; draw++) {
    for (let i = 0; i < respondents.length; i++) {
      sample[i] = respondents[Math.floor(uniform() * respondents.length)];
    }
    let figures: Partial<Record<K, number | null>>;
    try {
      figures = compute(sample);
    } catch {
      continue; // a resample the analysis refuses gives no figure a value
    }
    for (const key of keys) {
      const value = figures[key];
      if (typeof value === 'number' && Number.isFinite(value)) values.get(key)!.push(value);
    }
  }
  const tail = (1 - level) / 2;
  const result = {} as Record<K, ResampledInterval>;
  for (const key of keys) {
    const sorted = values.get(key)!.sort((a, b) => a - b);
    if (sorted.length === 0 || sorted.length < minimumUsableShare * resamples) {
      result[key] = { ciLow: null, ciHigh: null };
      continue;
    }
    const at = (q: number) =>
      sorted[Math.min(sorted.length - 1, Math.max(0, Math.floor(q * sorted.length)))];
    result[key] = { ciLow: at(tail), ciHigh: at(1 - tail) };
  }
  return result;
}
