import { z } from 'zod';
import { amountAnswerSchema } from '../../money/amount-answer';
import type { AmountWords } from '../../money/amount-words';
import { isRecordWith, isWholeBetween } from '../answer-shape';
import { blockCommonShape } from '../block-common';

/**
 * Purchase recall: how many units the household bought in the last `periodDays`, and, when
 * `askPricePaid`, the price paid per unit the last time.
 */
export const purchaseRecallBlockSchema = z.strictObject({
  ...blockCommonShape,
  kind: z.literal('purchase-recall'),
  periodDays: z.int('Whole days').min(1, 'At least one day').max(366, 'At most 366 days'),
  askPricePaid: z.boolean({ error: 'Say whether to ask the price paid' }),
  maxUnits: z.int('Whole units').min(1, 'Allow at least one unit').max(100000),
});
export type PurchaseRecallBlock = z.infer<typeof purchaseRecallBlockSchema>;

/** The labels of the answer's parts, as the enumerator sees them. */
export function purchaseRecallFieldNames(block: PurchaseRecallBlock) {
  return {
    units: `Units bought in the last ${block.periodDays} days`,
    pricePaidMinor: 'Price paid per unit, the last time',
  } as const;
}

/**
 * Units bought (0 … maxUnits); the price paid is asked only when something was bought.
 * `words` writes amounts in the study's currency.
 */
export function purchaseRecallAnswerSchema(block: PurchaseRecallBlock, words?: AmountWords) {
  const names = purchaseRecallFieldNames(block);
  return z
    .strictObject({
      units: z
        .int(`${names.units}: count whole units`)
        .nonnegative(`${names.units}: a count cannot be negative`)
        .max(block.maxUnits, `${names.units}: at most ${block.maxUnits}`),
      pricePaidMinor: amountAnswerSchema({
        name: names.pricePaidMinor,
        min: 1,
        max: Number.MAX_SAFE_INTEGER,
        words,
      }).optional(),
    })
    .superRefine((answer, ctx) => {
      const wanted = block.askPricePaid && answer.units > 0;
      if (wanted && answer.pricePaidMinor === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['pricePaidMinor'],
          message: `${names.pricePaidMinor}: type the amount`,
        });
      }
      if (!wanted && answer.pricePaidMinor !== undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['pricePaidMinor'],
          message: 'No price is asked here',
        });
      }
    });
}
export interface PurchaseRecallAnswer {
  units: number;
  pricePaidMinor?: number;
}

const recallKeys = ['units', 'pricePaidMinor'];

/** The quick test of a purchase-recall answer (see `answerFitsFor`). */
export function purchaseRecallAnswerFits(block: PurchaseRecallBlock) {
  return (answer: unknown) => {
    if (!isRecordWith(answer, recallKeys)) return false;
    const units = answer['units'];
    if (!isWholeBetween(units, 0, block.maxUnits)) return false;
    const price = answer['pricePaidMinor'];
    return block.askPricePaid && units > 0
      ? isWholeBetween(price, 1, Number.MAX_SAFE_INTEGER)
      : price === undefined;
  };
}
