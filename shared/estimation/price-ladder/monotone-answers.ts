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
  readonly changedAnswers: number;
}

/** Applies the monotone rule per respondent. */
export function enforceMonotone(
  respondents: readonly (string | number)[],
  prices: readonly number[],
  probabilities: readonly number[],
  rule: MonotoneRule,
): MonotoneAdjustment {
  const byRespondent = new Map<string | number, number[]>();
  respondents.forEach((r, i) => byRespondent.set(r, [...(byRespondent.get(r) ?? []), i]));
  const adjusted = [...probabilities];
  const nonMonotone: (string | number)[] = [];
  let changed = 0;
  for (const [respondent, rows] of byRespondent) {
    const ascending = [...rows].sort((i, j) => prices[i] - prices[j]);
    const isMonotone = ascending.every(
      (row, k) => k === 0 || probabilities[row] <= probabilities[ascending[k - 1]],
    );
    if (isMonotone) continue;
    nonMonotone.push(respondent);
    if (rule === 'keep') continue;
    const order = rule === 'carry-no-upward' ? ascending : [...ascending].reverse();
    const pick = rule === 'carry-no-upward' ? Math.min : Math.max;
    let carried = probabilities[order[0]];
    for (const row of order) {
      carried = pick(carried, probabilities[row]);
      if (carried !== adjusted[row]) changed++;
      adjusted[row] = carried;
    }
  }
  return { probabilities: adjusted, nonMonotoneRespondents: nonMonotone, changedAnswers: changed };
}
