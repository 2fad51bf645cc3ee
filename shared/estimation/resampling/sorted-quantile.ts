/**
 * Empirical q-quantile of values sorted ascending, by linear interpolation between order
 * statistics (position (n − 1)·q; common practice, the default of most statistics packages).
 * Used for intervals over draws and resamples of continuous figures.
 */
export function sortedQuantile(sorted: readonly number[], q: number): number {
  const position = (sorted.length - 1) * q;
  const below = Math.floor(position);
  const above = Math.min(below + 1, sorted.length - 1);
  return sorted[below] + (sorted[above] - sorted[below]) * (position - below);
}
