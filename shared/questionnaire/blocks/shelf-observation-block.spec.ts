import { amountWordsFor } from '../../money/amount-words';
import { starterBlock } from '../block-starters';
import {
  defaultShelfPriceCapMinor,
  type ShelfObservationBlock,
  shelfObservationAnswerFits,
  shelfObservationAnswerSchema,
  shelfObservationBlockSchema,
} from './shelf-observation-block';

// Intl puts a no-break space after the symbol; the expected texts use a plain one.
const kesWords = (minor: number) => amountWordsFor('KES', 'en-KE')(minor).replace(/\s/g, ' ');

const shelf = starterBlock('shelf-observation', 'shelf') as ShelfObservationBlock;
const answer = { priceMinor: 250, packSize: 500, quantity: 12 };
const photoId = '0b8f3a4e-6c1d-4e2f-9a7b-5c3d2e1f0a9b';

describe('the shelf-observation block', () => {
  it('wants a period for units sold and none for stock on hand', () => {
    expect(shelfObservationBlockSchema.safeParse(shelf).success).toBe(true);
    const noPeriod = shelfObservationBlockSchema.safeParse({ ...shelf, periodDays: undefined });
    expect(noPeriod.error?.issues[0]).toMatchObject({ path: ['periodDays'] });
    expect(
      shelfObservationBlockSchema.safeParse({
        ...shelf,
        measure: 'stock-on-hand',
        periodDays: undefined,
      }).success,
    ).toBe(true);
    expect(
      shelfObservationBlockSchema.safeParse({ ...shelf, measure: 'stock-on-hand' }).success,
    ).toBe(false);
  });

  it('needs the tag photo only when the block requires it', () => {
    expect(shelfObservationAnswerSchema(shelf).safeParse(answer).success).toBe(true);
    const required = shelfObservationAnswerSchema({ ...shelf, photo: 'required' });
    expect(required.safeParse(answer).success).toBe(false);
    expect(required.safeParse({ ...answer, photoId }).success).toBe(true);
    expect(
      shelfObservationAnswerSchema({ ...shelf, photo: 'none' }).safeParse({ ...answer, photoId })
        .success,
    ).toBe(false);
  });

  it('refuses a free price, an empty pack and a negative count', () => {
    const schema = shelfObservationAnswerSchema(shelf);
    expect(schema.safeParse({ ...answer, priceMinor: 0 }).success).toBe(false);
    expect(schema.safeParse({ ...answer, packSize: 0 }).success).toBe(false);
    expect(schema.safeParse({ ...answer, quantity: -1 }).success).toBe(false);
  });

  it('caps the shelf price, at the block’s own cap when it sets one', () => {
    const schema = shelfObservationAnswerSchema(shelf, kesWords);
    const absurd = { ...answer, priceMinor: 9999999999900 };
    expect(schema.safeParse(absurd).error?.issues.map((i) => i.message)).toEqual([
      'Shelf price: must be at most Ksh 1,000,000.00',
    ]);
    expect(shelfObservationAnswerFits(shelf)(absurd)).toBe(false);
    expect(schema.safeParse({ ...answer, priceMinor: defaultShelfPriceCapMinor }).success).toBe(
      true,
    );
    const capped = { ...shelf, maxPriceMinor: 500000 };
    expect(shelfObservationBlockSchema.safeParse(capped).success).toBe(true);
    expect(
      shelfObservationAnswerSchema(capped).safeParse({ ...answer, priceMinor: 500001 }).success,
    ).toBe(false);
    expect(shelfObservationAnswerFits(capped)({ ...answer, priceMinor: 500001 })).toBe(false);
  });

  it('names each part left out in the words of the screen', () => {
    const schema = shelfObservationAnswerSchema({ ...shelf, photo: 'required', packUnit: 'piece' });
    const result = schema.safeParse({ packSize: 1, quantity: 2.5 });
    expect(result.error?.issues.map((i) => i.message)).toEqual([
      'Shelf price: type the amount',
      `Units sold in the last ${shelf.periodDays} days: count whole units`,
      'Take the photo of the price tag',
    ]);
    expect(schema.safeParse({ priceMinor: 100, packSize: 1 }).error?.issues[0].message).toBe(
      `Units sold in the last ${shelf.periodDays} days: type the count`,
    );
  });
});
