import { EstimationError } from '../estimation-error';

export interface DesignEffect {
  readonly n: number;
  /** Kish's deff = n·Σw²/(Σw)² = 1 + CV². */
  readonly designEffect: number;
  /** (Σw)²/Σw². */
  readonly effectiveSampleSize: number;
  /** Coefficient of variation of the weights, population form (÷ n). */
  readonly weightCv: number;
  readonly assumptions: string[];
}

/** Kish (1992) design effect of unequal weights and the effective sample size. */
export function kishDesignEffect(
  weights: readonly number[],
  /** Respondents each weight belongs to (default 1 each). */
  counts?: readonly number[],
): DesignEffect {
  if (weights.length === 0)
    throw new EstimationError('too-few-observations', 'there are no weights', 'weight');
  weights.forEach((w, i) => {
    if (!(Number.isFinite(w) && w > 0))
      throw new EstimationError('invalid-value', `weight ${i + 1} must be a number > 0`, 'weight');
  });
  const count = (i: number) => counts?.[i] ?? 1;
  const n = counts ? counts.reduce((s, c) => s + c, 0) : weights.length;
  const sum = weights.reduce((s, w, i) => s + w * count(i), 0);
  const sumSquares = weights.reduce((s, w, i) => s + w * w * count(i), 0);
  const designEffect = (n * sumSquares) / (sum * sum);
  return {
    n,
    designEffect,
    effectiveSampleSize: (sum * sum) / sumSquares,
    weightCv: Math.sqrt(Math.max(0, designEffect - 1)),
    assumptions: [
      'design effect of weighting alone (no clustering), weights uncorrelated with the outcome',
    ],
  };
}
