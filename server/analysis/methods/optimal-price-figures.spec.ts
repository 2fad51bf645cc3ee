import type { CurveDescription } from '@shared/analysis/curve-description';
import { optimalPriceFigures } from './optimal-price-figures';

/** Q = 100 − 2P (the textbook demand of CHECKS.md §8) as a fit describes it, with a covariance. */
function linear(kind: 'linear' | 'loglog' = 'linear'): CurveDescription {
  return {
    kind,
    intercept: kind === 'linear' ? 100 : 3,
    priceCoefficient: kind === 'linear' ? -2 : -0.6,
    covariance: [
      [4, -0.15],
      [-0.15, 0.01],
    ],
    dfResidual: 48,
    observedPriceRange: { min: 10, max: 30 },
    n: 50,
  };
}

describe('optimalPriceFigures', () => {
  it('puts the revenue maximum at a/2b = 25 and the profit maximum at (a/b + c)/2 = 30, each with an interval', () => {
    const [revenue, profit] = optimalPriceFigures(linear(), 10, 0.95);
    expect(revenue.label).toBe('Revenue-maximising price');
    expect(revenue.estimate).toBeCloseTo(25, 8); // handbook: P* = a/(2b) for Q = a − bP
    expect(profit.label).toBe('Profit-maximising price at unit cost 10');
    expect(profit.estimate).toBeCloseTo(30, 8); // handbook: P* = (a/b + c)/2
    for (const figure of [revenue, profit]) {
      expect(figure.ciLow!).toBeLessThan(figure.estimate);
      expect(figure.ciHigh!).toBeGreaterThan(figure.estimate);
    }
  });

  it('gives the same interval each time (seeded draws), wider at a higher level', () => {
    const [a] = optimalPriceFigures(linear(), null, 0.95);
    const [b] = optimalPriceFigures(linear(), null, 0.95);
    const [narrow] = optimalPriceFigures(linear(), null, 0.5);
    expect(b).toEqual(a);
    expect(narrow.ciHigh! - narrow.ciLow!).toBeLessThan(a.ciHigh! - a.ciLow!);
  });

  it('leaves out a price the curve does not have (inelastic log-log: no revenue maximum)', () => {
    expect(optimalPriceFigures(linear('loglog'), null, 0.95)).toEqual([]);
  });
});
