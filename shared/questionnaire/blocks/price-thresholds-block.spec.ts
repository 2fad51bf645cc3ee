import { amountWordsFor } from '../../money/amount-words';
import { starterBlock } from '../block-starters';
import {
  type PriceThresholdsBlock,
  priceThresholdsAnswerSchema,
  priceThresholdsBlockSchema,
} from './price-thresholds-block';

// Intl puts a no-break space after the symbol; the expected texts use a plain one.
const kesWords = (minor: number) => amountWordsFor('KES', 'en-KE')(minor).replace(/\s/g, ' ');

const block = starterBlock('price-thresholds', 'thresholds') as PriceThresholdsBlock;
const four = { tooCheapMinor: 50, cheapMinor: 100, expensiveMinor: 200, tooExpensiveMinor: 300 };

describe('the price-thresholds block', () => {
  it('accepts the four questions with or without the likelihood follow-ups', () => {
    expect(priceThresholdsBlockSchema.safeParse(block).success).toBe(true);
    expect(priceThresholdsBlockSchema.safeParse({ ...block, askLikelihood: true }).success).toBe(
      true,
    );
  });

  it('refuses a cap of zero', () => {
    const result = priceThresholdsBlockSchema.safeParse({ ...block, maxPriceMinor: 0 });
    expect(result.error?.issues[0]).toMatchObject({
      path: ['maxPriceMinor'],
      message: 'Must be more than zero',
    });
  });

  it('keeps out-of-order answers for the quality checks to flag', () => {
    const reversed = {
      tooCheapMinor: 300,
      cheapMinor: 200,
      expensiveMinor: 100,
      tooExpensiveMinor: 50,
    };
    expect(priceThresholdsAnswerSchema(block).safeParse(reversed).success).toBe(true);
  });

  it('refuses a price above the cap', () => {
    const result = priceThresholdsAnswerSchema(block).safeParse({
      ...four,
      tooExpensiveMinor: 100001,
    });
    expect(result.error?.issues[0]).toMatchObject({ path: ['tooExpensiveMinor'] });
  });

  it('names each part left out or over the cap, the cap in the study’s currency', () => {
    const schema = priceThresholdsAnswerSchema(
      { ...block, askLikelihood: true, maxPriceMinor: 2000000 },
      kesWords,
    );
    const result = schema.safeParse({
      tooCheapMinor: 50,
      cheapMinor: 100,
      tooExpensiveMinor: 2000001,
    });
    expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['expensiveMinor', 'Expensive price: type the amount'],
      ['tooExpensiveMinor', 'Too expensive price: must be at most Ksh 20,000.00'],
      ['likelihoodCheap', 'Choose how likely they would buy it at the bargain price'],
      ['likelihoodExpensive', 'Choose how likely they would buy it at the expensive price'],
    ]);
  });

  it('wants both likelihoods exactly when the block asks for them', () => {
    const withLikelihood = priceThresholdsAnswerSchema({ ...block, askLikelihood: true });
    expect(withLikelihood.safeParse(four).success).toBe(false);
    expect(
      withLikelihood.safeParse({ ...four, likelihoodCheap: 4, likelihoodExpensive: 2 }).success,
    ).toBe(true);
    expect(
      withLikelihood.safeParse({ ...four, likelihoodCheap: 0, likelihoodExpensive: 2 }).success,
    ).toBe(false);
    expect(
      priceThresholdsAnswerSchema(block).safeParse({ ...four, likelihoodCheap: 4 }).success,
    ).toBe(false);
  });
});
