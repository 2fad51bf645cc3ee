import { amountAnswerSchema } from './amount-answer';
import { amountWordsFor } from './amount-words';

// Intl puts a no-break space after the symbol; the expected texts use a plain one.
const kesWords = (minor: number) => amountWordsFor('KES', 'en-KE')(minor).replace(/\s/g, ' ');

const messageOf = (schema: ReturnType<typeof amountAnswerSchema>, value: unknown) =>
  schema.safeParse(value).error?.issues.map((issue) => issue.message);

describe('amountAnswerSchema', () => {
  it('names the field and writes the limits in the study’s currency', () => {
    const schema = amountAnswerSchema({
      name: 'Shelf price',
      min: 500,
      max: 2000000,
      words: kesWords,
    });
    expect(schema.safeParse(150000).success).toBe(true);
    expect(messageOf(schema, 2000001)).toEqual(['Shelf price: must be at most Ksh 20,000.00']);
    expect(messageOf(schema, 499)).toEqual(['Shelf price: must be at least Ksh 5.00']);
  });

  it('asks for the amount when it is missing or not a whole number of minor units', () => {
    const schema = amountAnswerSchema({ name: 'Shelf price', min: 1, max: 100, words: kesWords });
    expect(messageOf(schema, undefined)).toEqual(['Shelf price: type the amount']);
    expect(messageOf(schema, 12.5)).toEqual(['Shelf price: type the amount']);
  });

  it('says zero and negative amounts are refused without naming an amount', () => {
    expect(messageOf(amountAnswerSchema({ name: 'Paid', min: 1, max: 100 }), 0)).toEqual([
      'Paid: must be more than zero',
    ]);
    expect(messageOf(amountAnswerSchema({ name: 'Paid', min: 0, max: 100 }), -5)).toEqual([
      'Paid: cannot be negative',
    ]);
  });

  it('never counts minor units when it has no currency to write the limit in', () => {
    const schema = amountAnswerSchema({ name: 'Most they would pay', min: 500, max: 1000 });
    expect(messageOf(schema, 1001)).toEqual([
      'Most they would pay: is above the highest amount this question takes',
    ]);
    expect(messageOf(schema, 10)).toEqual([
      'Most they would pay: is below the lowest amount this question takes',
    ]);
  });
});
