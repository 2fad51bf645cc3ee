import { z } from 'zod';
import type { AmountWords } from './amount-words';

/** What an answered amount must be, and how its messages name it. */
export interface AmountAnswerRules {
  /** The field as the enumerator sees it; each message starts with it ("Shelf price: …"). */
  readonly name: string;
  /** The lowest and highest amounts accepted, in minor units (`min` 0 or more). */
  readonly min: number;
  readonly max: number;
  /**
   * How the study writes amounts. Without it (the server knows no currency here) a message
   * says which limit was crossed but names no amount, rather than a count of minor units.
   */
  readonly words?: AmountWords;
}

/**
 * An amount answered in integer minor units, within `min`–`max`, whose messages name the
 * field and say what to do in the enumerator's terms.
 */
export function amountAnswerSchema({ name, min, max, words }: AmountAnswerRules) {
  const lowest =
    min === 0
      ? 'cannot be negative'
      : min === 1
        ? 'must be more than zero'
        : words
          ? `must be at least ${words(min)}`
          : 'is below the lowest amount this question takes';
  const highest = words
    ? `must be at most ${words(max)}`
    : 'is above the highest amount this question takes';
  return z
    .int({ error: `${name}: type the amount` })
    .min(min, { error: `${name}: ${lowest}` })
    .max(max, { error: `${name}: ${highest}` });
}
