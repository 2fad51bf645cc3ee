import { amountWordsFor } from '../../money/amount-words';
import { starterBlock } from '../block-starters';
import { type WtpOpenBlock, wtpOpenAnswerSchema, wtpOpenBlockSchema } from './wtp-open-block';

// Intl puts a no-break space after the symbol; the expected texts use a plain one.
const kesWords = (minor: number) => amountWordsFor('KES', 'en-KE')(minor).replace(/\s/g, ' ');

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
      'Most they would pay: is above the highest amount this question takes',
    );
    expect(schema.safeParse({ amountMinor: 10.5 }).success).toBe(false);
  });

  it('writes the range in the study’s currency when it is given one', () => {
    const schema = wtpOpenAnswerSchema({ ...block, minMinor: 500, maxMinor: 2000000 }, kesWords);
    expect(schema.safeParse({ amountMinor: 2000001 }).error?.issues[0].message).toBe(
      'Most they would pay: must be at most Ksh 20,000.00',
    );
    expect(schema.safeParse({ amountMinor: 499 }).error?.issues[0].message).toBe(
      'Most they would pay: must be at least Ksh 5.00',
    );
    expect(schema.safeParse({}).error?.issues[0].message).toBe(
      'Most they would pay: type the amount',
    );
  });
});
