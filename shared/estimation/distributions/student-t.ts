import stdlibTCdf from '@stdlib/stats-base-dists-t-cdf';
import stdlibTQuantile from '@stdlib/stats-base-dists-t-quantile';

/** Student t quantile with `df` degrees of freedom: the t with P(T ≤ t) = p. */
export function tQuantile(p: number, df: number): number {
  return stdlibTQuantile(p, df);
}

/** Student t distribution function P(T ≤ x) with `df` degrees of freedom. */
export function tCdf(x: number, df: number): number {
  return stdlibTCdf(x, df);
}
