import { z } from 'zod';
import { allDistinct, isRecordWith } from '../answer-shape';
import { blockCommonShape } from '../block-common';
import {
  choiceOptionListSchema,
  optionValueSchema,
  requireDistinctOptions,
} from '../choice-option';

/** Multiple choice: between `minChosen` and `maxChosen` of the options. */
export const multipleChoiceBlockSchema = z
  .strictObject({
    ...blockCommonShape,
    kind: z.literal('multiple-choice'),
    options: choiceOptionListSchema,
    minChosen: z.int('A whole number').min(1, 'At least one'),
    maxChosen: z.int('A whole number').min(1, 'At least one'),
  })
  .superRefine((block, ctx) => {
    requireDistinctOptions(block.options, 'options', ctx);
    if (block.maxChosen < block.minChosen) {
      ctx.addIssue({
        code: 'custom',
        path: ['maxChosen'],
        message: 'The most choices allowed cannot be below the fewest',
      });
    }
    if (block.maxChosen > block.options.length) {
      ctx.addIssue({
        code: 'custom',
        path: ['maxChosen'],
        message: `There are only ${block.options.length} options`,
      });
    }
  });
export type MultipleChoiceBlock = z.infer<typeof multipleChoiceBlockSchema>;

export function multipleChoiceAnswerSchema(block: MultipleChoiceBlock) {
  return z.strictObject({
    values: z
      .array(optionValueSchema(block.options))
      .min(block.minChosen, `Choose at least ${block.minChosen}`)
      .max(block.maxChosen, `Choose at most ${block.maxChosen}`)
      .refine((values) => new Set(values).size === values.length, {
        error: 'An option is chosen twice',
      }),
  });
}
export type MultipleChoiceAnswer = z.infer<ReturnType<typeof multipleChoiceAnswerSchema>>;

const multipleChoiceKeys = ['values'];

/** The quick test of a multiple-choice answer (see `answerFitsFor`). */
export function multipleChoiceAnswerFits(block: MultipleChoiceBlock) {
  const options = new Set(block.options.map((o) => o.value));
  return (answer: unknown) => {
    if (!isRecordWith(answer, multipleChoiceKeys)) return false;
    const values = answer['values'];
    if (!Array.isArray(values)) return false;
    if (values.length < block.minChosen || values.length > block.maxChosen) return false;
    for (let i = 0; i < values.length; i++) {
      const value: unknown = values[i];
      if (typeof value !== 'string' || !options.has(value)) return false;
    }
    return allDistinct(values);
  };
}
