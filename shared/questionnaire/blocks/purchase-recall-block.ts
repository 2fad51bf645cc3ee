import { z } from 'zod';
import { positiveMinorSchema } from '../../money/minor-amount';
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

/** Units bought (0 … maxUnits); the price paid is asked only when something was bought. */
export function purchaseRecallAnswerSchema(block: PurchaseRecallBlock) {
  return z
    .strictObject({
      units: z
        .int('Count whole units')
        .nonnegative('A count cannot be negative')
        .max(block.maxUnits, `At most ${block.maxUnits} units`),
      pricePaidMinor: positiveMinorSchema.optional(),
    })
    .superRefine((answer, ctx) => {
      const wanted = block.askPricePaid && answer.units > 0;
      if (wanted && answer.pricePaidMinor === undefined) {
        ctx.addIssue({
          code: 'custom',
          path: ['pricePaidMinor'],
          message: 'Record the price paid',
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
