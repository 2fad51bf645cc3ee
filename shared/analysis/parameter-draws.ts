import { gaussian } from '../estimation/random/gaussian';
import { mulberry32 } from '../estimation/random/mulberry32';

/**
 * Lower-triangular L with L·Lᵀ = covariance. A zero pivot (a parameter held fixed) gives a zero
 * column instead of a failure, so semi-definite covariances still draw.
 */
export function choleskyFactor(covariance: readonly (readonly number[])[]): number[][] {
  const k = covariance.length;
  const lower = Array.from({ length: k }, () => new Array<number>(k).fill(0));
  for (let i = 0; i < k; i++) {
    for (let j = 0; j <= i; j++) {
      let s = covariance[i][j];
      for (let m = 0; m < j; m++) s -= lower[i][m] * lower[j][m];
      if (i === j) lower[i][i] = s > 0 ? Math.sqrt(s) : 0;
      else lower[i][j] = lower[j][j] > 0 ? s / lower[j][j] : 0;
    }
  }
  return lower;
}

/**
 * `count` parameter vectors from the normal approximation N(mean, covariance) of an estimator
 * (the Krinsky–Robb simulation), from a seeded generator: the same inputs always give the same
 * draws, so a figure's interval does not flicker between renders.
 */
export function normalParameterDraws(
  mean: readonly number[],
  covariance: readonly (readonly number[])[],
  count: number,
  seed = 20261201,
): number[][] {
  const lower = choleskyFactor(covariance);
  const z = gaussian(mulberry32(seed));
  return Array.from({ length: count }, () => {
    const e = mean.map(() => z());
    return mean.map((m, i) => m + lower[i].reduce((s, l, j) => s + l * e[j], 0));
  });
}
