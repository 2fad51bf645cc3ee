import { starterBlock } from '../block-starters';
import {
  openLadderPrices,
  type PriceLadderBlock,
  priceLadderAnswerFits,
  priceLadderAnswerSchema,
  priceLadderBlockSchema,
} from './price-ladder-block';

const ladder = starterBlock('price-ladder', 'ladder') as PriceLadderBlock;

describe('the price-ladder block', () => {
  it('accepts strictly increasing positive prices', () => {
    expect(priceLadderBlockSchema.safeParse(ladder).success).toBe(true);
  });

  it('names each price that does not rise above the one before', () => {
    const result = priceLadderBlockSchema.safeParse({
      ...ladder,
      pricesMinor: [100, 200, 200, 150],
    });
    expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['pricesMinor.2', 'Each price must be higher than the one before: price 3 is not'],
      ['pricesMinor.3', 'Each price must be higher than the one before: price 4 is not'],
    ]);
  });

  it.each([
    [[0, 100], 'pricesMinor.0'],
    [[-50, 100], 'pricesMinor.0'],
    [[100, 150.5], 'pricesMinor.1'],
  ])('refuses the prices %j at %s', (pricesMinor, path) => {
    const result = priceLadderBlockSchema.safeParse({ ...ladder, pricesMinor });
    expect(result.error?.issues.map((i) => i.path.join('.'))).toContain(path);
  });

  it('needs at least two prices', () => {
    const result = priceLadderBlockSchema.safeParse({ ...ladder, pricesMinor: [100] });
    expect(result.error?.issues[0].message).toBe('A ladder needs at least two prices');
  });

  it('accepts answers at ladder prices on the block’s scale', () => {
    const schema = priceLadderAnswerSchema(ladder);
    expect(
      schema.safeParse({
        steps: [
          { priceMinor: 100, response: 'yes' },
          { priceMinor: 150, response: 'no' },
        ],
      }).success,
    ).toBe(true);
    expect(
      schema.safeParse({ steps: [{ priceMinor: 120, response: 'yes' }] }).error?.issues[0].message,
    ).toBe('This price is not on the ladder');
    expect(schema.safeParse({ steps: [{ priceMinor: 100, response: 4 }] }).success).toBe(false);
  });

  it('refuses a price answered twice', () => {
    const schema = priceLadderAnswerSchema(ladder);
    const twice = {
      steps: [
        { priceMinor: 100, response: 'yes' },
        { priceMinor: 100, response: 'no' },
      ],
    };
    expect(schema.safeParse(twice).error?.issues[0].message).toBe('A price is answered twice');
  });

  it('takes intent from 1 to 5 on the 5-point scale', () => {
    const schema = priceLadderAnswerSchema({ ...ladder, scale: 'intent-5' });
    expect(schema.safeParse({ steps: [{ priceMinor: 100, response: 1 }] }).success).toBe(true);
    expect(
      schema.safeParse({ steps: [{ priceMinor: 100, response: 6 }] }).error?.issues[0],
    ).toMatchObject({ message: 'Choose an intent from 1 to 5 at each price' });
    expect(schema.safeParse({ steps: [{ priceMinor: 100, response: 'yes' }] }).success).toBe(false);
  });

  describe('settling every price', () => {
    // The starter ladder: 100, 150, 200, 250, 300.
    const kes = (minor: number) => `Ksh ${(minor / 100).toFixed(2)}`;
    const answered = (...pairs: [number, string | number][]) => ({
      steps: pairs.map(([priceMinor, response]) => ({ priceMinor, response })),
    });

    it('refuses a lone "yes" at the lowest price, naming the next price and counting the rest', () => {
      const partial = answered([100, 'yes']);
      const result = priceLadderAnswerSchema(ladder, kes).safeParse(partial);
      expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
        ['steps', 'Ask every price on the ladder: Ksh 1.50 and 3 more have no answer'],
      ]);
      expect(priceLadderAnswerFits(ladder)(partial)).toBe(false);
    });

    it('counts the open prices when it has no currency to write them in', () => {
      const result = priceLadderAnswerSchema(ladder).safeParse(answered([100, 'yes']));
      expect(result.error?.issues[0].message).toBe(
        'Ask every price on the ladder: 4 prices have no answer',
      );
    });

    it('accepts an ascending ladder stopped at its first "no"', () => {
      const stopped = answered([100, 'yes'], [150, 'yes'], [200, 'no']);
      expect(priceLadderAnswerSchema(ladder).safeParse(stopped).success).toBe(true);
      expect(priceLadderAnswerFits(ladder)(stopped)).toBe(true);
      expect(priceLadderAnswerSchema(ladder).safeParse(answered([100, 'no'])).success).toBe(true);
    });

    it('accepts a descending ladder stopped at its first "yes", naming its highest open price', () => {
      const down = { ...ladder, order: 'descending' as const };
      expect(
        priceLadderAnswerSchema(down).safeParse(answered([300, 'no'], [250, 'yes'])).success,
      ).toBe(true);
      const result = priceLadderAnswerSchema(down, kes).safeParse(answered([300, 'no']));
      expect(result.error?.issues[0].message).toBe(
        'Ask every price on the ladder: Ksh 2.50 and 3 more have no answer',
      );
    });

    it('accepts a ladder started in the middle once both sides are settled', () => {
      const fromMiddle = answered([200, 'yes'], [250, 'no']);
      expect(priceLadderAnswerSchema(ladder).safeParse(fromMiddle).success).toBe(true);
      const oneSide = answered([200, 'yes'], [250, 'yes']);
      expect(priceLadderAnswerSchema(ladder, kes).safeParse(oneSide).error?.issues[0].message).toBe(
        'Ask every price on the ladder: Ksh 3.00 has no answer',
      );
    });

    it('settles prices on the intent scale only from its ends', () => {
      const intent = { ...ladder, scale: 'intent-5' as const };
      expect(openLadderPrices(intent, answered([150, 5], [200, 3], [250, 1]).steps)).toEqual([]);
      expect(openLadderPrices(intent, answered([150, 4], [250, 2]).steps)).toEqual([100, 200, 300]);
    });

    it('refuses an empty ladder', () => {
      expect(priceLadderAnswerSchema(ladder).safeParse({ steps: [] }).success).toBe(false);
    });
  });
});
