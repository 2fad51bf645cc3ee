import { arcElasticity } from '../welfare/arc-elasticity';
import type { ResampledInterval } from '../resampling/respondent-bootstrap';
import {
  GRID_MAXIMUM_RESAMPLES,
  ladderTotalsByRespondent,
  resampledFigures,
  sumTotals,
  type LadderSample,
} from './grid-maximum-interval';

/** Intervals for the ladder's own table: each price's share and each step's arc elasticity. */
export interface LadderStepIntervals {
  /** By ladder price, ascending. */
  readonly shares: ResampledInterval[];
  /** By pair of neighbouring ladder prices, ascending. */
  readonly arcElasticities: ResampledInterval[];
}

/**
 * Percentile intervals for the weighted purchase share at each ladder price and the arc
 * elasticity between neighbouring prices, from the same respondent resamples (and seed) as the
 * grid maxima: the figures of the ladder table are estimates too. A resample where a price has
 * no respondent, or a step has no buyer at either end, gives that figure no value.
 */
export function ladderStepIntervals(
  sample: LadderSample,
  level: number,
  resamples = GRID_MAXIMUM_RESAMPLES,
  seed = 20_240_611,
): LadderStepIntervals {
  const { levels, people } = ladderTotalsByRespondent(sample);
  const shareKeys = levels.map((_, j) => `share${j}`);
  const arcKeys = levels.slice(1).map((_, j) => `arc${j}`);
  const weight = new Float64Array(levels.length);
  const bought = new Float64Array(levels.length);
  const figures = (drawn: readonly (typeof people)[number][]) => {
    sumTotals(drawn, weight, bought);
    const shares = levels.map((_, j) => (weight[j] > 0 ? bought[j] / weight[j] : null));
    const result: Record<string, number | null> = {};
    shares.forEach((share, j) => (result[shareKeys[j]] = share));
    arcKeys.forEach((key, j) => {
      const [q1, q2] = [shares[j], shares[j + 1]];
      result[key] =
        q1 === null || q2 === null || q1 + q2 === 0
          ? null
          : arcElasticity(levels[j], q1, levels[j + 1], q2);
    });
    return result;
  };
  const intervals = resampledFigures(
    people,
    [...shareKeys, ...arcKeys],
    figures,
    level,
    resamples,
    seed,
  );
  return {
    shares: shareKeys.map((key) => intervals[key]),
    arcElasticities: arcKeys.map((key) => intervals[key]),
  };
}
