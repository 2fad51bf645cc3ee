import { z } from 'zod';
import { storableText } from '../storable/storable-text';
import type { BlockIssueSink } from './block-common';

/** One answer a respondent can pick: a stable value for the data and a label to read out. */
export const choiceOptionSchema = z.strictObject({
  value: z.string().regex(/^[a-z0-9][a-z0-9_-]{0,39}$/, {
    error: 'Use 1–40 lower-case letters, digits, - or _ for the stored value',
  }),
  label: storableText().trim().min(1, 'Give the option a label').max(200),
});
export type ChoiceOption = z.infer<typeof choiceOptionSchema>;

/** Between 2 and 50 options. */
export const choiceOptionListSchema = z
  .array(choiceOptionSchema)
  .min(2, 'Offer at least two options')
  .max(50, 'Offer at most 50 options');

/** Adds an issue on each option whose value or label repeats an earlier one. */
export function requireDistinctOptions(
  options: readonly { value: string; label: string }[],
  field: string,
  ctx: BlockIssueSink,
): void {
  options.forEach((option, i) => {
    const first = options.findIndex((o) => o.value === option.value);
    if (first < i) {
      ctx.addIssue({
        code: 'custom',
        path: [field, i, 'value'],
        message: `The value "${option.value}" is already used by option ${first + 1}`,
      });
    }
    const firstLabel = options.findIndex((o) => o.label.trim() === option.label.trim());
    if (firstLabel < i) {
      ctx.addIssue({
        code: 'custom',
        path: [field, i, 'label'],
        message: `The label "${option.label}" is already used by option ${firstLabel + 1}`,
      });
    }
  });
}

/** A schema for a value that must be one of the options. */
export function optionValueSchema(options: readonly ChoiceOption[]) {
  const values = options.map((o) => o.value);
  return z.string().refine((value) => values.includes(value), {
    error: `Choose one of: ${values.join(', ')}`,
  });
}
