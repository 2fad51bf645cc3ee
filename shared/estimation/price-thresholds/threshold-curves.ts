import type { ThresholdAnswer } from './threshold-answers';

/** The cumulative threshold curves on the union of all stated prices. */
export interface ThresholdCurves {
  readonly prices: number[];
  /** Share saying too cheap at or above each price (falling). */
  readonly tooCheap: number[];
  /** Share saying cheap at or above each price (falling). */
  readonly cheap: number[];
  /** Share saying expensive at or below each price (rising). */
  readonly expensive: number[];
  /** Share saying too expensive at or below each price (rising). */
  readonly tooExpensive: number[];
  /** 1 − cheap. */
  readonly notCheap: number[];
  /** 1 − expensive. */
  readonly notExpensive: number[];
}

/**
 * Builds the four curves (common practice): too cheap and cheap are inverted, counting answers
 * at or above the price; expensive and too expensive count answers at or below it. Weighted.
 */
export function buildThresholdCurves(answers: readonly ThresholdAnswer[]): ThresholdCurves {
  const prices = [
    ...new Set(answers.flatMap((a) => [a.tooCheap, a.cheap, a.expensive, a.tooExpensive])),
  ].sort((a, b) => a - b);
  const total = answers.reduce((s, a) => s + (a.weight ?? 1), 0);
  // One sweep per curve over the answers sorted by that threshold: the weight at or below
  // each price, in time that grows with answers plus prices (not their product).
  const atOrBelow = (
    field: keyof Pick<ThresholdAnswer, 'tooCheap' | 'cheap' | 'expensive' | 'tooExpensive'>,
  ) => {
    const sorted = answers
      .map((a) => ({ value: a[field], weight: a.weight ?? 1 }))
      .sort((a, b) => a.value - b.value);
    let next = 0;
    let below = 0;
    return prices.map((p) => {
      while (next < sorted.length && sorted[next].value <= p) below += sorted[next++].weight;
      return below;
    });
  };
  // Weight strictly below p = weight at or below the previous price.
  const atOrAbove = (field: 'tooCheap' | 'cheap') => {
    const cumulative = atOrBelow(field);
    // Never below 0 where every weight is below the price (rounding of total − weight).
    return prices.map((_, i) => Math.max(0, total - (i === 0 ? 0 : cumulative[i - 1])) / total);
  };
  const cheap = atOrAbove('cheap');
  const expensive = atOrBelow('expensive').map((w) => w / total);
  return {
    prices,
    tooCheap: atOrAbove('tooCheap'),
    cheap,
    expensive,
    tooExpensive: atOrBelow('tooExpensive').map((w) => w / total),
    notCheap: cheap.map((c) => 1 - c),
    notExpensive: expensive.map((e) => 1 - e),
  };
}
