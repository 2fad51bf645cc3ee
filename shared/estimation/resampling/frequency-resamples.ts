import { binomialDraw } from '../random/binomial-draw';
import { percentileIntervals, type ResampledInterval } from './respondent-bootstrap';

/**
 * Resamples of a frequency table: each resample draws as many respondents as the table holds,
 * with replacement, and says how many were drawn from each cell — a multinomial draw with the
 * cells' shares, made as a chain of binomials (cell k takes Binomial(left, c_k / mass left)).
 * This is the same distribution as drawing respondents one by one, at a cost that grows with
 * the number of cells, not of respondents. Seeded, so the same table and seed give the same
 * resamples.
 */
export function frequencyResamples<R>(
  counts: readonly number[],
  compute: (drawn: Float64Array) => R,
  resamples: number,
  seed: number,
): (R | null)[] {
  const draw = binomialDraw(seed);
  const total = counts.reduce((s, c) => s + c, 0);
  const drawn = new Float64Array(counts.length);
  return Array.from({ length: resamples }, () => {
    let left = total;
    let mass = total;
    for (let k = 0; k < counts.length; k++) {
      const c = counts[k];
      if (left === 0 || c === 0) drawn[k] = 0;
      else if (c >= mass) drawn[k] = left;
      else drawn[k] = draw(left, c / mass);
      left -= drawn[k];
      mass -= c;
    }
    try {
      return compute(drawn);
    } catch {
      return null;
    }
  });
}

/**
 * Percentile intervals of named figures over frequency-table resamples (see frequencyResamples
 * and percentileIntervals): the respondent bootstrap of a study summarised as a table.
 */
export function frequencyBootstrap<K extends string>(
  counts: readonly number[],
  keys: readonly K[],
  compute: (drawn: Float64Array) => Partial<Record<K, number | null>>,
  level: number,
  resamples: number,
  seed: number,
): Record<K, ResampledInterval> {
  return percentileIntervals(frequencyResamples(counts, compute, resamples, seed), keys, level);
}
