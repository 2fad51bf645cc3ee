import { starterBlock } from '../block-starters';
import { type WtpOpenBlock, wtpOpenAnswerSchema, wtpOpenBlockSchema } from './wtp-open-block';

const block = starterBlock('wtp-open', 'most') as WtpOpenBlock;

describe('the open willingness-to-pay block', () => {
  it('accepts a range from zero up', () => {
    expect(wtpOpenBlockSchema.safeParse(block).success).toBe(true);
  });

  it('refuses a range the wrong way round', () => {
    const result = wtpOpenBlockSchema.safeParse({ ...block, minMinor: 500, maxMinor: 500 });
    expect(result.error?.issues[0]).toMatchObject({
      path: ['maxMinor'],
      message: 'The highest amount (500) must be above the lowest (500)',
    });
  });

  it('accepts zero and refuses amounts outside the range or with fractions of a minor unit', () => {
    const schema = wtpOpenAnswerSchema({ ...block, minMinor: 0, maxMinor: 1000 });
    expect(schema.safeParse({ amountMinor: 0 }).success).toBe(true);
    expect(schema.safeParse({ amountMinor: 1001 }).error?.issues[0].message).toBe(
      'Must be at most 1000 minor units',
    );
    expect(schema.safeParse({ amountMinor: 10.5 }).success).toBe(false);
  });
});
