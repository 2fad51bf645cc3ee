import { z } from 'zod';
import { isRecordWith } from '../answer-shape';
import { blockCommonShape } from '../block-common';
import {
  choiceOptionListSchema,
  optionValueSchema,
  requireDistinctOptions,
} from '../choice-option';

/** Single choice: exactly one of the options. */
export const singleChoiceBlockSchema = z
  .strictObject({
    ...blockCommonShape,
    kind: z.literal('single-choice'),
    options: choiceOptionListSchema,
  })
  .superRefine((block, ctx) => requireDistinctOptions(block.options, 'options', ctx));
export type SingleChoiceBlock = z.infer<typeof singleChoiceBlockSchema>;

export function singleChoiceAnswerSchema(block: SingleChoiceBlock) {
  return z.strictObject({ value: optionValueSchema(block.options) });
}
export type SingleChoiceAnswer = z.infer<ReturnType<typeof singleChoiceAnswerSchema>>;

const singleChoiceKeys = ['value'];

/** The quick test of a single-choice answer (see `answerFitsFor`). */
export function singleChoiceAnswerFits(block: SingleChoiceBlock) {
  const values = new Set(block.options.map((o) => o.value));
  return (answer: unknown) => {
    if (!isRecordWith(answer, singleChoiceKeys)) return false;
    const value = answer['value'];
    return typeof value === 'string' && values.has(value);
  };
}
