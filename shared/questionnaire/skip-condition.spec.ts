import { blockIdSchema } from './block-id';
import { skipConditionSchema } from './skip-condition';

describe('skip conditions', () => {
  it('accepts each test with the value it needs', () => {
    for (const condition of [
      { blockId: 'owns', test: 'answered' },
      { blockId: 'owns', test: 'equals', value: 'yes' },
      { blockId: 'size', test: 'not-equals', value: 3 },
      { blockId: 'size', test: 'less', value: 3 },
    ]) {
      expect(skipConditionSchema.safeParse(condition).success).toBe(true);
    }
  });

  it('refuses "less" with a text value, a value on "answered", and an unknown test', () => {
    expect(
      skipConditionSchema.safeParse({ blockId: 'a', test: 'less', value: 'x' }).error?.issues[0]
        .message,
    ).toBe('Compare with a number');
    expect(
      skipConditionSchema.safeParse({ blockId: 'a', test: 'answered', value: 1 }).success,
    ).toBe(false);
    expect(
      skipConditionSchema.safeParse({ blockId: 'a', test: 'contains', value: 1 }).success,
    ).toBe(false);
  });
});

describe('block ids', () => {
  it.each(['consent', 'price-ladder-2', 'q_7'])('accepts %s', (id) => {
    expect(blockIdSchema.safeParse(id).success).toBe(true);
  });

  it.each(['', '7up', 'Price', 'has space', 'x'.repeat(41)])('refuses "%s"', (id) => {
    expect(blockIdSchema.safeParse(id).success).toBe(false);
  });
});
