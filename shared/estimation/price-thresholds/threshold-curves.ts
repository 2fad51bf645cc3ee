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
  const share = (hit: (a: ThresholdAnswer) => boolean) =>
    answers.reduce((s, a) => s + (hit(a) ? (a.weight ?? 1) : 0), 0) / total;
  const cheap = prices.map((p) => share((a) => a.cheap >= p));
  const expensive = prices.map((p) => share((a) => a.expensive <= p));
  return {
    prices,
    tooCheap: prices.map((p) => share((a) => a.tooCheap >= p)),
    cheap,
    expensive,
    tooExpensive: prices.map((p) => share((a) => a.tooExpensive <= p)),
    notCheap: cheap.map((c) => 1 - c),
    notExpensive: expensive.map((e) => 1 - e),
  };
}
