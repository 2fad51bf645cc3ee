import { z } from 'zod';
import { amountAnswerSchema } from '../../money/amount-answer';
import type { AmountWords } from '../../money/amount-words';
import { nonNegativeMinorSchema, positiveMinorSchema } from '../../money/minor-amount';
import { isRecordWith, isWholeBetween } from '../answer-shape';
import { blockCommonShape } from '../block-common';

/**
 * Open willingness to pay: the most the respondent would pay, typed as an amount. The range
 * (minor units) catches slipped digits on the device; zero is a valid answer.
 */
export const wtpOpenBlockSchema = z
  .strictObject({
    ...blockCommonShape,
    kind: z.literal('wtp-open'),
    minMinor: nonNegativeMinorSchema,
    maxMinor: positiveMinorSchema,
  })
  .superRefine((block, ctx) => {
    if (block.maxMinor <= block.minMinor) {
      ctx.addIssue({
        code: 'custom',
        path: ['maxMinor'],
        message: `The highest amount (${block.maxMinor}) must be above the lowest (${block.minMinor})`,
      });
    }
  });
export type WtpOpenBlock = z.infer<typeof wtpOpenBlockSchema>;

/** The label of the amount, leading the messages about it. */
export const wtpOpenAmountName = 'Most they would pay';

/** The amount, within the block's range; `words` writes the range in the study's currency. */
export function wtpOpenAnswerSchema(block: WtpOpenBlock, words?: AmountWords) {
  const { minMinor, maxMinor } = block;
  return z.strictObject({
    amountMinor: amountAnswerSchema({
      name: wtpOpenAmountName,
      min: Math.max(0, minMinor),
      max: maxMinor,
      words,
    }),
  });
}
export type WtpOpenAnswer = z.infer<ReturnType<typeof wtpOpenAnswerSchema>>;

const wtpOpenKeys = ['amountMinor'];

/** The quick test of an open willingness-to-pay answer (see `answerFitsFor`). */
export function wtpOpenAnswerFits(block: WtpOpenBlock) {
  const lowest = Math.max(0, block.minMinor);
  return (answer: unknown) =>
    isRecordWith(answer, wtpOpenKeys) &&
    isWholeBetween(answer['amountMinor'], lowest, block.maxMinor);
}
