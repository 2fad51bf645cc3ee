import { starterBlock } from '../block-starters';
import {
  type PurchaseRecallBlock,
  purchaseRecallAnswerSchema,
  purchaseRecallBlockSchema,
} from './purchase-recall-block';

const recall = starterBlock('purchase-recall', 'recall') as PurchaseRecallBlock;

describe('the purchase-recall block', () => {
  it('accepts a period of days and refuses a period of zero', () => {
    expect(purchaseRecallBlockSchema.safeParse(recall).success).toBe(true);
    expect(
      purchaseRecallBlockSchema.safeParse({ ...recall, periodDays: 0 }).error?.issues[0].path,
    ).toEqual(['periodDays']);
  });

  it('asks the price paid only when something was bought', () => {
    const schema = purchaseRecallAnswerSchema(recall);
    expect(schema.safeParse({ units: 3, pricePaidMinor: 120 }).success).toBe(true);
    expect(schema.safeParse({ units: 0 }).success).toBe(true);
    expect(schema.safeParse({ units: 3 }).error?.issues[0].message).toBe(
      'Price paid per unit, the last time: type the amount',
    );
    expect(schema.safeParse({ units: 0, pricePaidMinor: 120 }).error?.issues[0].message).toBe(
      'No price is asked here',
    );
  });

  it('refuses more units than the block allows', () => {
    const schema = purchaseRecallAnswerSchema({ ...recall, maxUnits: 10, askPricePaid: false });
    expect(schema.safeParse({ units: 11 }).error?.issues[0].message).toBe(
      `Units bought in the last ${recall.periodDays} days: at most 10`,
    );
  });
});
