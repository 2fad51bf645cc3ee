import { z } from 'zod';
import { positiveMinorSchema } from '../../money/minor-amount';
import { isRecordWith } from '../answer-shape';
import { blockCommonShape, requireIncreasing } from '../block-common';

/**
 * Payment card: the respondent sees a card of increasing amounts and points at the highest
 * they would certainly pay, which places their willingness to pay in an interval.
 */
export const paymentCardBlockSchema = z
  .strictObject({
    ...blockCommonShape,
    kind: z.literal('payment-card'),
    amountsMinor: z
      .array(positiveMinorSchema)
      .min(2, 'A card needs at least two amounts')
      .max(30, 'A card has at most 30 amounts'),
  })
  .superRefine((block, ctx) =>
    requireIncreasing(block.amountsMinor, 'amountsMinor', 'Amount', ctx),
  );
export type PaymentCardBlock = z.infer<typeof paymentCardBlockSchema>;

/** The highest amount on the card they would pay, or null when they would pay none of them. */
export function paymentCardAnswerSchema(block: PaymentCardBlock) {
  return z.strictObject({
    highestYesMinor: z
      .int()
      .refine((amount) => block.amountsMinor.includes(amount), {
        error: 'This amount is not on the card',
      })
      .nullable(),
  });
}
export type PaymentCardAnswer = z.infer<ReturnType<typeof paymentCardAnswerSchema>>;

const paymentCardKeys = ['highestYesMinor'];

/** The quick test of a payment-card answer (see `answerFitsFor`). */
export function paymentCardAnswerFits(block: PaymentCardBlock) {
  const amounts = new Set(block.amountsMinor);
  return (answer: unknown) => {
    if (!isRecordWith(answer, paymentCardKeys)) return false;
    const amount = answer['highestYesMinor'];
    return amount === null || (Number.isSafeInteger(amount) && amounts.has(amount as number));
  };
}
