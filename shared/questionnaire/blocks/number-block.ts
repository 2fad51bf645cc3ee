import { z } from 'zod';
import { storableText } from '../../storable/storable-text';
import { isNumberBetween, isRecordWith, isWholeBetween } from '../answer-shape';
import { blockCommonShape } from '../block-common';

/** Number: a count or measurement within an optional range, whole or not, with a unit label. */
export const numberBlockSchema = z
  .strictObject({
    ...blockCommonShape,
    kind: z.literal('number'),
    min: z.number().finite().optional(),
    max: z.number().finite().optional(),
    wholeNumber: z.boolean({ error: 'Say whether only whole numbers are allowed' }),
    unit: storableText().trim().max(40, 'Keep the unit short').optional(),
  })
  .superRefine((block, ctx) => {
    if (block.min !== undefined && block.max !== undefined && block.max < block.min) {
      ctx.addIssue({
        code: 'custom',
        path: ['max'],
        message: `The largest value (${block.max}) cannot be below the smallest (${block.min})`,
      });
    }
  });
export type NumberBlock = z.infer<typeof numberBlockSchema>;

export function numberAnswerSchema(block: NumberBlock) {
  let value = block.wholeNumber ? z.int('Type a whole number') : z.number().finite();
  if (block.min !== undefined) value = value.min(block.min, `At least ${block.min}`);
  if (block.max !== undefined) value = value.max(block.max, `At most ${block.max}`);
  return z.strictObject({ value });
}
export type NumberAnswer = z.infer<ReturnType<typeof numberAnswerSchema>>;

const numberKeys = ['value'];

/** The quick test of a number answer (see `answerFitsFor`). */
export function numberAnswerFits(block: NumberBlock) {
  const min = block.min ?? -Infinity;
  const max = block.max ?? Infinity;
  const inRange = block.wholeNumber ? isWholeBetween : isNumberBetween;
  return (answer: unknown) =>
    isRecordWith(answer, numberKeys) && inRange(answer['value'], min, max);
}
