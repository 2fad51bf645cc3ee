import { starterBlock } from '../block-starters';
import {
  type MultipleChoiceBlock,
  multipleChoiceAnswerSchema,
  multipleChoiceBlockSchema,
} from './multiple-choice-block';

const block = starterBlock('multiple-choice', 'sources') as MultipleChoiceBlock;

describe('the multiple-choice block', () => {
  it('refuses limits that cannot be met', () => {
    expect(multipleChoiceBlockSchema.safeParse(block).success).toBe(true);
    expect(
      multipleChoiceBlockSchema.safeParse({ ...block, minChosen: 3, maxChosen: 2 }).error?.issues[0]
        .message,
    ).toBe('The most choices allowed cannot be below the fewest');
    expect(
      multipleChoiceBlockSchema.safeParse({ ...block, maxChosen: 4 }).error?.issues[0].message,
    ).toBe('There are only 3 options');
  });

  it('takes distinct option values within the limits', () => {
    const schema = multipleChoiceAnswerSchema({ ...block, maxChosen: 2 });
    expect(schema.safeParse({ values: ['first', 'third'] }).success).toBe(true);
    expect(schema.safeParse({ values: [] }).success).toBe(false);
    expect(schema.safeParse({ values: ['first', 'second', 'third'] }).success).toBe(false);
    expect(schema.safeParse({ values: ['first', 'first'] }).success).toBe(false);
    expect(schema.safeParse({ values: ['fourth'] }).success).toBe(false);
  });
});
