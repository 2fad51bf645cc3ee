import { starterBlock } from '../block-starters';
import {
  type PriceThresholdsBlock,
  priceThresholdsAnswerSchema,
  priceThresholdsBlockSchema,
} from './price-thresholds-block';

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
