import { tCdf, tQuantile } from '../distributions/student-t';
import type { CoefficientRow } from './linear-fit';

/**
 * Coefficient rows with t-based intervals: estimate ± t(1 − α/2, df)·SE, two-sided p-values.
 */
export function coefficientTable(
  names: readonly string[],
  estimates: ArrayLike<number>,
  covariance: readonly (readonly number[])[],
  df: number,
  confidenceLevel: number,
): CoefficientRow[] {
  const critical = tQuantile(1 - (1 - confidenceLevel) / 2, df);
  return names.map((term, j) => {
    const estimate = estimates[j];
    const stdError = Math.sqrt(Math.max(covariance[j][j], 0));
    const tStatistic = stdError > 0 ? estimate / stdError : null;
    // The lower tail at −|t| keeps small p-values accurate (1 − cdf would round to 0).
    const pValue = tStatistic === null ? null : 2 * tCdf(-Math.abs(tStatistic), df);
    return {
      term,
      estimate,
      stdError,
      tStatistic,
      pValue,
      ciLow: estimate - critical * stdError,
      ciHigh: estimate + critical * stdError,
    };
  });
}
