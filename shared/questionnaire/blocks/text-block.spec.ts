import { starterBlock } from '../block-starters';
import { type TextBlock, textAnswerSchema, textBlockSchema } from './text-block';

const block = starterBlock('text', 'remarks') as TextBlock;

describe('the text block', () => {
  it('refuses a maximum length of zero', () => {
    expect(textBlockSchema.safeParse(block).success).toBe(true);
    expect(textBlockSchema.safeParse({ ...block, maxLength: 0 }).success).toBe(false);
  });

  it('keeps answers non-blank and within the length', () => {
    const schema = textAnswerSchema({ ...block, maxLength: 5 });
    expect(schema.safeParse({ value: 'fine' }).success).toBe(true);
    expect(schema.safeParse({ value: '   ' }).error?.issues[0].message).toBe('Type an answer');
    expect(schema.safeParse({ value: 'too long' }).error?.issues[0].message).toBe(
      'At most 5 characters',
    );
  });
});
