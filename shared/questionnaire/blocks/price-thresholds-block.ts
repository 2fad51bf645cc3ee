import { z } from 'zod';
import { amountAnswerSchema } from '../../money/amount-answer';
import type { AmountWords } from '../../money/amount-words';
import { positiveMinorSchema } from '../../money/minor-amount';
import { isRecordWith, isWholeBetween } from '../answer-shape';
import { blockCommonShape } from '../block-common';

/**
 * Price thresholds (Van Westendorp): the four prices at which the product seems too cheap,
 * cheap, expensive and too expensive; with `askLikelihood`, the two purchase-likelihood
 * follow-ups of the Newton–Miller–Smith extension, on a 1–5 scale, at the cheap and expensive
 * prices. `maxPriceMinor` bounds what the device accepts, to catch a slipped digit.
 */
export const priceThresholdsBlockSchema = z.strictObject({
  ...blockCommonShape,
  kind: z.literal('price-thresholds'),
  askLikelihood: z.boolean({ error: 'Say whether to ask the purchase-likelihood follow-ups' }),
  maxPriceMinor: positiveMinorSchema,
});
export type PriceThresholdsBlock = z.infer<typeof priceThresholdsBlockSchema>;

/** The four thresholds in the order they are asked, with the words the enumerator reads. */
export const thresholdQuestions = [
  ['tooCheapMinor', 'At what price would it be so cheap that you would doubt its quality?'],
  ['cheapMinor', 'At what price would it be a bargain — a good buy for the money?'],
  ['expensiveMinor', 'At what price would it start to seem expensive, though still worth it?'],
  ['tooExpensiveMinor', 'At what price would it be too expensive to consider?'],
] as const;

export type ThresholdField = (typeof thresholdQuestions)[number][0];

/** Each threshold's short name, leading the messages about it. */
export const thresholdFieldNames: Readonly<Record<ThresholdField, string>> = {
  tooCheapMinor: 'Too cheap price',
  cheapMinor: 'Bargain price',
  expensiveMinor: 'Expensive price',
  tooExpensiveMinor: 'Too expensive price',
};

/** The two purchase-likelihood follow-ups, with the words the enumerator reads. */
export const likelihoodQuestions = [
  ['likelihoodCheap', 'How likely would they buy it at the bargain price?'],
  ['likelihoodExpensive', 'How likely would they buy it at the expensive price?'],
] as const;

export type LikelihoodField = (typeof likelihoodQuestions)[number][0];

const likelihoodUnset: Readonly<Record<LikelihoodField, string>> = {
  likelihoodCheap: 'Choose how likely they would buy it at the bargain price',
  likelihoodExpensive: 'Choose how likely they would buy it at the expensive price',
};

/**
 * The four prices (out-of-order answers are kept: quality checks flag them), and the two
 * likelihoods exactly when the block asks for them. `words` writes the price limit in the
 * study's currency.
 */
export function priceThresholdsAnswerSchema(block: PriceThresholdsBlock, words?: AmountWords) {
  const price = (field: ThresholdField) =>
    amountAnswerSchema({
      name: thresholdFieldNames[field],
      min: 0,
      max: block.maxPriceMinor,
      words,
    });
  const likelihood = (field: LikelihoodField) => {
    const error = likelihoodUnset[field];
    return z.int({ error }).min(1, error).max(5, error);
  };
  const shape = {
    tooCheapMinor: price('tooCheapMinor'),
    cheapMinor: price('cheapMinor'),
    expensiveMinor: price('expensiveMinor'),
    tooExpensiveMinor: price('tooExpensiveMinor'),
  };
  if (!block.askLikelihood) return z.strictObject(shape);
  return z.strictObject({
    ...shape,
    likelihoodCheap: likelihood('likelihoodCheap'),
    likelihoodExpensive: likelihood('likelihoodExpensive'),
  });
}
export interface PriceThresholdsAnswer {
  tooCheapMinor: number;
  cheapMinor: number;
  expensiveMinor: number;
  tooExpensiveMinor: number;
  likelihoodCheap?: number;
  likelihoodExpensive?: number;
}

const likelihoodFields = likelihoodQuestions.map(([field]) => field as string);

/** The quick test of a price-thresholds answer (see `answerFitsFor`). */
export function priceThresholdsAnswerFits(block: PriceThresholdsBlock) {
  const prices = thresholdQuestions.map(([field]) => field as string);
  const likelihoods = block.askLikelihood ? likelihoodFields : [];
  const keys = [...prices, ...likelihoods];
  return (answer: unknown) => {
    if (!isRecordWith(answer, keys)) return false;
    for (const field of prices) {
      if (!isWholeBetween(answer[field], 0, block.maxPriceMinor)) return false;
    }
    for (const field of likelihoods) if (!isWholeBetween(answer[field], 1, 5)) return false;
    return true;
  };
}
