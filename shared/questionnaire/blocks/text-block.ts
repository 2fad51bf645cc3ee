import { z } from 'zod';
import { storableText } from '../../storable/storable-text';
import { unstorableTextReason } from '../../storable/unstorable-text';
import { isRecordWith } from '../answer-shape';
import { blockCommonShape } from '../block-common';

/** Text: a free answer up to `maxLength` characters, on one line or several. */
export const textBlockSchema = z.strictObject({
  ...blockCommonShape,
  kind: z.literal('text'),
  maxLength: z.int('A whole number').min(1, 'At least one character').max(4000, 'At most 4000'),
  multiline: z.boolean({ error: 'Say whether the answer may run over several lines' }),
});
export type TextBlock = z.infer<typeof textBlockSchema>;

export function textAnswerSchema(block: TextBlock) {
  return z.strictObject({
    value: storableText()
      .trim()
      .min(1, 'Type an answer')
      .max(block.maxLength, `At most ${block.maxLength} characters`),
  });
}
export type TextAnswer = z.infer<ReturnType<typeof textAnswerSchema>>;

const textKeys = ['value'];

/** The quick test of a text answer (see `answerFitsFor`); the schema trims before counting. */
export function textAnswerFits(block: TextBlock) {
  return (answer: unknown) => {
    if (!isRecordWith(answer, textKeys)) return false;
    const value = answer['value'];
    if (typeof value !== 'string' || unstorableTextReason(value)) return false;
    const length = value.trim().length;
    return length >= 1 && length <= block.maxLength;
  };
}
