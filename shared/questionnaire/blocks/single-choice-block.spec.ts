import { starterBlock } from '../block-starters';
import {
  type SingleChoiceBlock,
  singleChoiceAnswerSchema,
  singleChoiceBlockSchema,
} from './single-choice-block';

const block = starterBlock('single-choice', 'owns') as SingleChoiceBlock;

describe('the single-choice block', () => {
  it('needs two options with distinct values', () => {
    expect(singleChoiceBlockSchema.safeParse(block).success).toBe(true);
    expect(
      singleChoiceBlockSchema.safeParse({ ...block, options: [block.options[0]] }).error?.issues[0]
        .message,
    ).toBe('Offer at least two options');
    const twice = [block.options[0], { value: 'yes', label: 'Also yes' }];
    expect(
      singleChoiceBlockSchema.safeParse({ ...block, options: twice }).error?.issues[0],
    ).toMatchObject({
      path: ['options', 1, 'value'],
      message: 'The value "yes" is already used by option 1',
    });
  });

  it('takes one of the option values', () => {
    const schema = singleChoiceAnswerSchema(block);
    expect(schema.safeParse({ value: 'no' }).success).toBe(true);
    expect(schema.safeParse({ value: 'maybe' }).error?.issues[0].message).toBe(
      'Choose one of: yes, no',
    );
  });
});
