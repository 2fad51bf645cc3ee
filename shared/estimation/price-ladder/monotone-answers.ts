/**
 * How to treat a respondent whose answers rise with price somewhere:
 * - 'carry-no-upward' (default, common practice): a "no" (or a lower intent) at a price carries
 *   to every higher price — the running minimum of purchase probability in ascending price;
 * - 'carry-yes-downward': a "yes" at a price carries to every lower price — the running maximum
 *   in descending price;
 * - 'keep': answers are used as given (non-monotone respondents are still counted).
 */
export type MonotoneRule = 'carry-no-upward' | 'carry-yes-downward' | 'keep';

export interface MonotoneAdjustment {
  /** Purchase probability per answer after the rule, in input order. */
  readonly probabilities: number[];
  readonly nonMonotoneRespondents: (string | number)[];
  /** Respondents behind `nonMonotoneRespondents` (more than their number in a frequency table). */
  readonly nonMonotoneCount: number;
  readonly changedAnswers: number;
}

/** Applies the monotone rule per respondent. */
export function enforceMonotone(
  respondents: readonly (string | number)[],
  prices: readonly number[],
  probabilities: readonly number[],
  rule: MonotoneRule,
  /** Respondents each answer's respondent stands for (a frequency table's cells); default 1. */
  counts?: readonly number[],
): MonotoneAdjustment {
  const byRespondent = new Map<string | number, number[]>();
  respondents.forEach((r, i) => byRespondent.set(r, [...(byRespondent.get(r) ?? []), i]));
  const adjusted = [...probabilities];
  const nonMonotone: (string | number)[] = [];
  let changed = 0;
  let nonMonotoneCount = 0;
  for (const [respondent, rows] of byRespondent) {
    const count = counts?.[rows[0]] ?? 1;
    const ascending = [...rows].sort((i, j) => prices[i] - prices[j]);
    const isMonotone = ascending.every(
      (row, k) => k === 0 || probabilities[row] <= probabilities[ascending[k - 1]],
    );
    if (isMonotone) continue;
    nonMonotone.push(respondent);
    nonMonotoneCount += count;
    if (rule === 'keep') continue;
    const order = rule === 'carry-no-upward' ? ascending : [...ascending].reverse();
    const pick = rule === 'carry-no-upward' ? Math.min : Math.max;
    let carried = probabilities[order[0]];
    for (const row of order) {
      carried = pick(carried, probabilities[row]);
      if (carried !== adjusted[row]) changed += count;
      adjusted[row] = carried;
    }
  }
  return {
    probabilities: adjusted,
    nonMonotoneRespondents: nonMonotone,
    nonMonotoneCount,
    changedAnswers: changed,
  };
}
