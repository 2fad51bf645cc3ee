import { EstimationError } from '../estimation-error';
import { arcElasticity } from '../welfare/arc-elasticity';

/** The ladder summarised at one price. */
export interface LadderStep {
  readonly price: number;
  /** Respondents who answered at this price. */
  readonly respondents: number;
  /** Weighted mean purchase probability (the purchase share). */
  readonly share: number;
  /** price × share. */
  readonly revenueIndex: number;
  /** (price − unit cost) × share, when a unit cost is given. */
  readonly profitIndex?: number;
}

/** Midpoint elasticity of the share between two neighbouring prices; null when both shares are 0. */
export interface ArcStep {
  readonly fromPrice: number;
  readonly toPrice: number;
  readonly elasticity: number | null;
}

/** Weighted purchase share, revenue index and profit index at each price, ascending. */
export function summariseSteps(
  prices: readonly number[],
  probabilities: readonly number[],
  weights: readonly number[],
  unitCost?: number,
  /** Respondents each answer stands for (default 1). */
  counts?: readonly number[],
): LadderStep[] {
  const levels = [...new Set(prices)].sort((a, b) => a - b);
  if (levels.length < 2) {
    throw new EstimationError(
      'too-few-levels',
      'a price ladder needs at least two different prices',
      'price',
    );
  }
  return levels.map((price) => {
    let count = 0;
    let weightSum = 0;
    let weighted = 0;
    prices.forEach((p, i) => {
      if (p !== price) return;
      count += counts?.[i] ?? 1;
      weightSum += weights[i];
      weighted += weights[i] * probabilities[i];
    });
    const share = weighted / weightSum;
    const step = { price, respondents: count, share, revenueIndex: price * share };
    return unitCost === undefined ? step : { ...step, profitIndex: (price - unitCost) * share };
  });
}

/** Price of the largest value; ties go to the lowest price (a pinned rule). */
export function priceOfMaximum(
  steps: readonly LadderStep[],
  value: (s: LadderStep) => number,
): number {
  let best = steps[0];
  for (const step of steps) if (value(step) > value(best)) best = step;
  return best.price;
}

/** Arc elasticities between neighbouring prices. */
export function arcSteps(steps: readonly LadderStep[]): ArcStep[] {
  return steps.slice(1).map((step, k) => {
    const prev = steps[k];
    const elasticity =
      prev.share + step.share === 0
        ? null
        : arcElasticity(prev.price, prev.share, step.price, step.share);
    return { fromPrice: prev.price, toPrice: step.price, elasticity };
  });
}
