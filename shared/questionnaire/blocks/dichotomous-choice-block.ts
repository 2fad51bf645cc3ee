import { z } from 'zod';
import { isRecordWith } from '../answer-shape';
import { blockCommonShape } from '../block-common';
import { bidDesignSchema, checkBidDesign } from '../bid-design';

/**
 * Dichotomous choice: "would you buy it at this price?" at a bid assigned from the design.
 * Double-bounded adds one follow-up: a higher bid after a yes, a lower one after a no.
 */
export const dichotomousChoiceBlockSchema = z
  .strictObject({
    ...blockCommonShape,
    kind: z.literal('dichotomous-choice'),
    bounds: z.enum(['single', 'double'], { error: 'Choose single- or double-bounded' }),
    bidDesign: bidDesignSchema,
  })
  .superRefine((block, ctx) => checkBidDesign(block.bidDesign, block.bounds, ctx));
export type DichotomousChoiceBlock = z.infer<typeof dichotomousChoiceBlockSchema>;

const yesNo = z.enum(['yes', 'no'], { error: 'Answer yes or no' });

/**
 * The bid asked and the answer; with double bounds also the follow-up bid, which must be the
 * design's follow-up for that bid and that first answer, and the second answer.
 */
export function dichotomousChoiceAnswerSchema(block: DichotomousChoiceBlock) {
  const single = z.strictObject({ bidMinor: z.int(), firstResponse: yesNo });
  const schema =
    block.bounds === 'single'
      ? single
      : single.extend({ followUpMinor: z.int(), secondResponse: yesNo });
  return schema.superRefine((answer, ctx) => {
    const level = block.bidDesign.levels.find((l) => l.bidMinor === answer.bidMinor);
    if (!level) {
      ctx.addIssue({
        code: 'custom',
        path: ['bidMinor'],
        message: 'This bid is not in the design',
      });
      return;
    }
    if (!('followUpMinor' in answer)) return;
    const expected = answer.firstResponse === 'yes' ? level.afterYesMinor : level.afterNoMinor;
    if (answer.followUpMinor !== expected) {
      ctx.addIssue({
        code: 'custom',
        path: ['followUpMinor'],
        message: `After a ${answer.firstResponse} to ${level.bidMinor}, the follow-up bid is ${expected}`,
      });
    }
  });
}
export interface DichotomousChoiceAnswer {
  bidMinor: number;
  firstResponse: 'yes' | 'no';
  followUpMinor?: number;
  secondResponse?: 'yes' | 'no';
}

const singleKeys = ['bidMinor', 'firstResponse'];
const doubleKeys = [...singleKeys, 'followUpMinor', 'secondResponse'];
const isYesNo = (value: unknown) => value === 'yes' || value === 'no';

/** The quick test of a dichotomous-choice answer (see `answerFitsFor`). */
export function dichotomousChoiceAnswerFits(block: DichotomousChoiceBlock) {
  const levels = new Map(block.bidDesign.levels.map((level) => [level.bidMinor, level]));
  const double = block.bounds === 'double';
  return (answer: unknown) => {
    if (!isRecordWith(answer, double ? doubleKeys : singleKeys)) return false;
    const bid = answer['bidMinor'];
    const first = answer['firstResponse'];
    if (!Number.isSafeInteger(bid) || !isYesNo(first)) return false;
    const level = levels.get(bid as number);
    if (!level) return false;
    if (!double) return true;
    const followUp = answer['followUpMinor'];
    const expected = first === 'yes' ? level.afterYesMinor : level.afterNoMinor;
    return (
      Number.isSafeInteger(followUp) && followUp === expected && isYesNo(answer['secondResponse'])
    );
  };
}
