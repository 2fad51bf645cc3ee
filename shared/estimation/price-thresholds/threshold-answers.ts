import { EstimationError } from '../estimation-error';

/** One respondent's four price-threshold answers (and the optional purchase-likelihood pair). */
export interface ThresholdAnswer {
  /** Price so low they would doubt the quality. */
  readonly tooCheap: number;
  /** Price that is a bargain. */
  readonly cheap: number;
  /** Price at which it starts to get expensive. */
  readonly expensive: number;
  /** Price so high they would not consider it. */
  readonly tooExpensive: number;
  readonly weight?: number;
  /** Purchase likelihood (1–5) at the cheap price (Newton–Miller–Smith follow-up). */
  readonly likelihoodCheap?: number;
  /** Purchase likelihood (1–5) at the expensive price. */
  readonly likelihoodExpensive?: number;
  /**
   * Respondents who gave exactly these answers (default 1); a frequency table's cell carries
   * `count` and, in `weight`, count × one respondent's weight.
   */
  readonly count?: number;
}

/** 'exclude' (default) drops respondents whose thresholds are not too cheap ≤ cheap ≤ expensive ≤ too expensive. */
export type OutOfOrderRule = 'exclude' | 'keep';

const fields = ['tooCheap', 'cheap', 'expensive', 'tooExpensive'] as const;

/** Validates the answers; returns those to use and how many were out of order. */
export function screenThresholdAnswers(
  answers: readonly ThresholdAnswer[],
  rule: OutOfOrderRule,
): { kept: ThresholdAnswer[]; outOfOrder: number } {
  if (answers.length === 0) {
    throw new EstimationError(
      'too-few-observations',
      'there are no price-threshold answers',
      'tooCheap',
    );
  }
  answers.forEach((a, i) => {
    for (const field of fields) {
      if (!(Number.isFinite(a[field]) && a[field] >= 0)) {
        throw new EstimationError(
          'invalid-value',
          `respondent ${i + 1}: ${field} must be a number ≥ 0`,
          field,
        );
      }
    }
    if (a.weight !== undefined && !(Number.isFinite(a.weight) && a.weight > 0)) {
      throw new EstimationError(
        'invalid-value',
        `respondent ${i + 1}: weight must be a number > 0`,
        'weight',
      );
    }
  });
  const ordered = (a: ThresholdAnswer) =>
    a.tooCheap <= a.cheap && a.cheap <= a.expensive && a.expensive <= a.tooExpensive;
  const kept = rule === 'keep' ? [...answers] : answers.filter(ordered);
  if (kept.length === 0) {
    throw new EstimationError(
      'too-few-observations',
      'every respondent has thresholds out of order',
      'tooCheap',
    );
  }
  return {
    kept,
    outOfOrder: answers.filter((a) => !ordered(a)).reduce((s, a) => s + (a.count ?? 1), 0),
  };
}
