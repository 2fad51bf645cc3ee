import { defaultDrawCount } from './curve-ensemble';

/** Values a fit keeps for its resampled curves at most (about 200 kB as JSON). */
const valueBudget = 30_000;

/** Below this many resampled curves the 2.5 % and 97.5 % points are too unsteady to show. */
const minimumCurves = 100;

/**
 * How many respondent-resampled curves a tabulated curve with `knots` knots keeps: as many as
 * the screen draws for a parametric curve, fewer when the knots are many, none when fewer than
 * the minimum would fit (the curve is then shown without a band, as it says).
 */
export function resampledCurveCount(knots: number): number {
  const count = Math.min(defaultDrawCount, Math.floor(valueBudget / Math.max(knots, 1)));
  return count >= minimumCurves ? count : 0;
}

/** A share to a hundredth of a percentage point: far finer than any band, and half the JSON. */
export const compactShare = (share: number) => Math.round(share * 1e4) / 1e4;

/** The assumption a fit with resampled curves states. */
export const resampledBandNote = (count: number) =>
  `curve band and intervals of figures read off it: percentiles over ${count} respondent resamples (seeded)`;
