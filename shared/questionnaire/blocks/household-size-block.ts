import { z } from 'zod';
import { isRecordWith, isWholeBetween } from '../answer-shape';
import { blockCommonShape } from '../block-common';

/** Household size: how many people live and eat together, up to `maxPeople`. */
export const householdSizeBlockSchema = z.strictObject({
  ...blockCommonShape,
  kind: z.literal('household-size'),
  maxPeople: z.int('A whole number').min(1, 'Allow at least one person').max(100, 'At most 100'),
});
export type HouseholdSizeBlock = z.infer<typeof householdSizeBlockSchema>;

/** A whole number of people from 1 to the block's maximum. */
export function householdSizeAnswerSchema(block: HouseholdSizeBlock) {
  return z.strictObject({
    people: z
      .int('Count whole people')
      .min(1, 'A household has at least one person')
      .max(block.maxPeople, `At most ${block.maxPeople} people`),
  });
}
export type HouseholdSizeAnswer = z.infer<ReturnType<typeof householdSizeAnswerSchema>>;

const householdSizeKeys = ['people'];

/** The quick test of a household-size answer (see `answerFitsFor`). */
export function householdSizeAnswerFits(block: HouseholdSizeBlock) {
  return (answer: unknown) =>
    isRecordWith(answer, householdSizeKeys) && isWholeBetween(answer['people'], 1, block.maxPeople);
}
