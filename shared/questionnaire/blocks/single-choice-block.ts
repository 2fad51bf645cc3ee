import { z } from 'zod';
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
