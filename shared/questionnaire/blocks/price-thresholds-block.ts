import { z } from 'zod';
import { nonNegativeMinorSchema, positiveMinorSchema } from '../../money/minor-amount';
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

/**
 * The four prices (out-of-order answers are kept: quality checks flag them), and the two
 * likelihoods exactly when the block asks for them.
 */
export function priceThresholdsAnswerSchema(block: PriceThresholdsBlock) {
  const price = nonNegativeMinorSchema.max(block.maxPriceMinor, {
    error: `Must be at most ${block.maxPriceMinor} minor units`,
  });
  const likelihood = z
    .int()
    .min(1, 'Likelihood runs from 1 to 5')
    .max(5, 'Likelihood runs from 1 to 5');
  const shape = {
    tooCheapMinor: price,
    cheapMinor: price,
    expensiveMinor: price,
    tooExpensiveMinor: price,
  };
  return block.askLikelihood
    ? z.strictObject({ ...shape, likelihoodCheap: likelihood, likelihoodExpensive: likelihood })
    : z.strictObject(shape);
}
export interface PriceThresholdsAnswer {
  tooCheapMinor: number;
  cheapMinor: number;
  expensiveMinor: number;
  tooExpensiveMinor: number;
  likelihoodCheap?: number;
  likelihoodExpensive?: number;
}

const likelihoodFields = ['likelihoodCheap', 'likelihoodExpensive'];

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
