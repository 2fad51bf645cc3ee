import { z } from 'zod';
import { storableText } from '../storable/storable-text';
import { blockIdSchema } from './block-id';
import { skipConditionSchema } from './skip-condition';

/**
 * The fields every block has: its id, the words the enumerator reads out, an optional note for
 * the enumerator, whether an answer is required, and an optional skip condition.
 */
export const blockCommonShape = {
  id: blockIdSchema,
  prompt: storableText({ error: 'Write the question the enumerator reads out' })
    .trim()
    .min(1, 'Write the question the enumerator reads out')
    .max(1000, 'Keep the question under 1000 characters'),
  note: storableText().max(1000, 'Keep the note under 1000 characters').optional(),
  required: z.boolean({ error: 'Say whether an answer is required' }),
  showIf: skipConditionSchema.optional(),
};

/** A custom zod issue at `path` inside the block being checked. */
export interface BlockIssueSink {
  addIssue(issue: { code: 'custom'; message: string; path: (string | number)[] }): void;
}

/**
 * Adds an issue for each position where `values` does not strictly increase. The message names
 * positions, not amounts: the values are minor units, and the schema does not know the
 * currency the researcher typed them in.
 */
export function requireIncreasing(
  values: readonly number[],
  field: string,
  noun: string,
  ctx: BlockIssueSink,
): void {
  const word = noun.toLowerCase();
  for (let i = 1; i < values.length; i++) {
    if (values[i] <= values[i - 1]) {
      ctx.addIssue({
        code: 'custom',
        path: [field, i],
        message: `Each ${word} must be higher than the one before: ${word} ${i + 1} is not`,
      });
    }
  }
}
