import { starterBlock } from '../block-starters';
import {
  type ShelfObservationBlock,
  shelfObservationAnswerSchema,
  shelfObservationBlockSchema,
} from './shelf-observation-block';

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
});
