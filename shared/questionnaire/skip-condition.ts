import { z } from 'zod';
import { storableText } from '../storable/storable-text';
import { blockIdSchema } from './block-id';

/** The comparisons a skip condition can make with an earlier block's answer. */
export const skipTests = ['equals', 'not-equals', 'less', 'greater', 'answered'] as const;
export type SkipTest = (typeof skipTests)[number];

/** Words the editor and preview use for each comparison. */
export const skipTestLabels: Readonly<Record<SkipTest, string>> = {
  equals: 'is',
  'not-equals': 'is not',
  less: 'is less than',
  greater: 'is more than',
  answered: 'was answered',
};

const compared = z.union([storableText().min(1, 'Choose a value to compare with'), z.number()]);

/**
 * `showIf` of a block: the block is asked only when an earlier block's answer passes the test.
 * On a multiple-choice block, `equals` means "includes" and `not-equals` "does not include".
 * When the earlier block was not answered (skipped itself, or left empty), the block is hidden.
 */
export const skipConditionSchema = z.discriminatedUnion('test', [
  z.strictObject({ blockId: blockIdSchema, test: z.literal('answered') }),
  z.strictObject({
    blockId: blockIdSchema,
    test: z.enum(['equals', 'not-equals']),
    value: compared,
  }),
  z.strictObject({
    blockId: blockIdSchema,
    test: z.enum(['less', 'greater']),
    value: z.number({ error: 'Compare with a number' }).finite(),
  }),
]);

export type SkipCondition = z.infer<typeof skipConditionSchema>;
