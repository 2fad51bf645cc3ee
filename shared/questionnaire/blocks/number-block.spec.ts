import { starterBlock } from '../block-starters';
import { type NumberBlock, numberAnswerSchema, numberBlockSchema } from './number-block';

const block = starterBlock('number', 'count') as NumberBlock;

describe('the number block', () => {
  it('refuses a range the wrong way round', () => {
    expect(numberBlockSchema.safeParse(block).success).toBe(true);
    expect(
      numberBlockSchema.safeParse({ ...block, min: 10, max: 5 }).error?.issues[0],
    ).toMatchObject({
      path: ['max'],
      message: 'The largest value (5) cannot be below the smallest (10)',
    });
  });

  it('keeps answers within the range and whole when asked', () => {
    const schema = numberAnswerSchema(block);
    expect(schema.safeParse({ value: 12 }).success).toBe(true);
    expect(schema.safeParse({ value: 1001 }).error?.issues[0].message).toBe('At most 1000');
    expect(schema.safeParse({ value: 1.5 }).success).toBe(false);
    expect(
      numberAnswerSchema({ ...block, wholeNumber: false }).safeParse({ value: 1.5 }).success,
    ).toBe(true);
  });

  it('accepts any finite number without a range', () => {
    const schema = numberAnswerSchema({
      ...block,
      min: undefined,
      max: undefined,
      wholeNumber: false,
    });
    expect(schema.safeParse({ value: -1e6 }).success).toBe(true);
    expect(schema.safeParse({ value: Number.NaN }).success).toBe(false);
  });
});
