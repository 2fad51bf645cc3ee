import { starterBlock } from '../block-starters';
import {
  type PaymentCardBlock,
  paymentCardAnswerSchema,
  paymentCardBlockSchema,
} from './payment-card-block';

const card = starterBlock('payment-card', 'card') as PaymentCardBlock;

describe('the payment-card block', () => {
  it('accepts increasing amounts', () => {
    expect(paymentCardBlockSchema.safeParse(card).success).toBe(true);
  });

  it('names an amount that does not increase', () => {
    const result = paymentCardBlockSchema.safeParse({ ...card, amountsMinor: [100, 50, 200] });
    expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['amountsMinor.1', 'Each amount must be higher than the one before: amount 2 is not'],
    ]);
  });

  it('records an amount on the card, or none of them', () => {
    const schema = paymentCardAnswerSchema(card);
    expect(schema.safeParse({ highestYesMinor: 200 }).success).toBe(true);
    expect(schema.safeParse({ highestYesMinor: null }).success).toBe(true);
    expect(schema.safeParse({ highestYesMinor: 150 }).error?.issues[0].message).toBe(
      'This amount is not on the card',
    );
  });
});
