import {
  type DichotomousChoiceBlock,
  dichotomousChoiceAnswerSchema,
  dichotomousChoiceBlockSchema,
} from './dichotomous-choice-block';
import { starterBlock } from '../block-starters';

const single = starterBlock('dichotomous-choice', 'bid') as DichotomousChoiceBlock;
const double: DichotomousChoiceBlock = {
  ...single,
  bounds: 'double',
  bidDesign: { levels: [{ bidMinor: 200, afterYesMinor: 400, afterNoMinor: 100 }] },
};

describe('the dichotomous-choice block', () => {
  it('accepts a single-bounded and a double-bounded design', () => {
    expect(dichotomousChoiceBlockSchema.safeParse(single).success).toBe(true);
    expect(dichotomousChoiceBlockSchema.safeParse(double).success).toBe(true);
  });

  it('refuses a design with no bids', () => {
    const result = dichotomousChoiceBlockSchema.safeParse({ ...single, bidDesign: { levels: [] } });
    expect(result.error?.issues[0]).toMatchObject({
      path: ['bidDesign', 'levels'],
      message: 'A bid design needs at least one bid',
    });
  });

  it('refuses a bid of zero', () => {
    const result = dichotomousChoiceBlockSchema.safeParse({
      ...single,
      bidDesign: { levels: [{ bidMinor: 0 }] },
    });
    expect(result.error?.issues[0].path.join('.')).toBe('bidDesign.levels.0.bidMinor');
  });

  it('checks an answer against the assigned bid and its follow-up', () => {
    const schema = dichotomousChoiceAnswerSchema(double);
    expect(
      schema.safeParse({
        bidMinor: 200,
        firstResponse: 'yes',
        followUpMinor: 400,
        secondResponse: 'no',
      }).success,
    ).toBe(true);
    const wrongFollowUp = schema.safeParse({
      bidMinor: 200,
      firstResponse: 'no',
      followUpMinor: 400,
      secondResponse: 'no',
    });
    expect(wrongFollowUp.error?.issues[0]).toMatchObject({
      path: ['followUpMinor'],
      message: 'After a no to 200, the follow-up bid is 100',
    });
    expect(
      schema.safeParse({
        bidMinor: 300,
        firstResponse: 'yes',
        followUpMinor: 400,
        secondResponse: 'no',
      }).error?.issues[0].message,
    ).toBe('This bid is not in the design');
  });

  it('asks no follow-up when single-bounded', () => {
    const schema = dichotomousChoiceAnswerSchema(single);
    expect(schema.safeParse({ bidMinor: 100, firstResponse: 'no' }).success).toBe(true);
    expect(
      schema.safeParse({
        bidMinor: 100,
        firstResponse: 'no',
        followUpMinor: 50,
        secondResponse: 'no',
      }).success,
    ).toBe(false);
  });
});
