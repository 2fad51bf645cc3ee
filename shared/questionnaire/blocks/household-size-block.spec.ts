import { starterBlock } from '../block-starters';
import {
  type HouseholdSizeBlock,
  householdSizeAnswerSchema,
  householdSizeBlockSchema,
} from './household-size-block';

const block = starterBlock('household-size', 'people') as HouseholdSizeBlock;

describe('the household-size block', () => {
  it('accepts a maximum and refuses one of zero', () => {
    expect(householdSizeBlockSchema.safeParse(block).success).toBe(true);
    expect(householdSizeBlockSchema.safeParse({ ...block, maxPeople: 0 }).success).toBe(false);
  });

  it('counts whole people from one to the maximum', () => {
    const schema = householdSizeAnswerSchema(block);
    expect(schema.safeParse({ people: 4 }).success).toBe(true);
    expect(schema.safeParse({ people: 0 }).error?.issues[0].message).toBe(
      'A household has at least one person',
    );
    expect(schema.safeParse({ people: 31 }).error?.issues[0].message).toBe('At most 30 people');
    expect(schema.safeParse({ people: 2.5 }).success).toBe(false);
  });
});
