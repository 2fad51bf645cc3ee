/**
 * Weighted median: the value where the cumulative weight first reaches half the total; when it
 * reaches exactly half at a value, the midpoint of that value and the next (so with equal weights
 * it is the usual median, the mean of the two middle values for an even count).
 */
export function weightedMedian(values: readonly number[], weights: readonly number[]): number {
  const order = values.map((_, i) => i).sort((i, j) => values[i] - values[j]);
  const total = weights.reduce((s, w) => s + w, 0);
  const half = total / 2;
  let cumulative = 0;
  for (let k = 0; k < order.length; k++) {
    cumulative += weights[order[k]];
    if (Math.abs(cumulative - half) <= 1e-12 * total && k + 1 < order.length) {
      return (values[order[k]] + values[order[k + 1]]) / 2;
    }
    if (cumulative > half) return values[order[k]];
  }
  return values[order[order.length - 1]];
}

/** Weighted mean Σw·x / Σw. */
export function weightedMean(values: readonly number[], weights: readonly number[]): number {
  return values.reduce((s, v, i) => s + weights[i] * v, 0) / weights.reduce((s, w) => s + w, 0);
}
