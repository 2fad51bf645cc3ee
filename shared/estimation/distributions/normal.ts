import stdlibNormalCdf from '@stdlib/stats-base-dists-normal-cdf';
import stdlibNormalQuantile from '@stdlib/stats-base-dists-normal-quantile';

/** Standard normal quantile: the z with Φ(z) = p. */
export function normalQuantile(p: number): number {
  return stdlibNormalQuantile(p, 0, 1);
}

/** Standard normal distribution function Φ(x). */
export function normalCdf(x: number): number {
  return stdlibNormalCdf(x, 0, 1);
}
