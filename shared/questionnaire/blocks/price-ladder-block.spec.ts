import { starterBlock } from '../block-starters';
import {
  type PriceLadderBlock,
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
      ['pricesMinor.2', 'Price 3 (200) must be higher than price 2 (200)'],
      ['pricesMinor.3', 'Price 4 (150) must be higher than price 3 (200)'],
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
    expect(schema.safeParse({ steps: [{ priceMinor: 100, response: 5 }] }).success).toBe(true);
    expect(schema.safeParse({ steps: [{ priceMinor: 100, response: 6 }] }).success).toBe(false);
    expect(schema.safeParse({ steps: [{ priceMinor: 100, response: 'yes' }] }).success).toBe(false);
  });
});
