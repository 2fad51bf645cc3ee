import { logistic } from '../maximum-likelihood/binomial-logit';
import { logisticOptimalPrice, logisticOptimalPriceGradient } from './logistic-optimum';
import { refusalOf } from '../../../tests/support/estimation-refusal';

// Coefficients of the Gabor–Granger worked example (CHECKS.md §5, computed there by IRLS).
const a = 6.0214009256;
const b = -0.3827271092;

describe('logisticOptimalPrice', () => {
  it('gives the revenue maximum where the point elasticity is −1', () => {
    // CHECKS.md §5: p* = 12.3071781027 solves b·p·(1 − P) = −1.
    const p = logisticOptimalPrice(a, b);
    expect(Math.abs(p - 12.3071781027)).toBeLessThan(1e-8);
    expect(b * p * (1 - logistic(a + b * p))).toBeCloseTo(-1, 12);
  });

  it('gives a profit maximum that satisfies the first-order condition at a unit cost', () => {
    // First-order condition of (p − c)·P(p), common practice.
    const p = logisticOptimalPrice(a, b, 6);
    expect(1 + (p - 6) * b * (1 - logistic(a + b * p))).toBeCloseTo(0, 12);
  });

  it('has an implicit-function gradient equal to central differences', () => {
    // Second route computed here: numerical differentiation of the root itself.
    const p = logisticOptimalPrice(a, b, 6);
    const [ga, gb] = logisticOptimalPriceGradient(a, b, p, 6);
    const h = 1e-6;
    const na = (logisticOptimalPrice(a + h, b, 6) - logisticOptimalPrice(a - h, b, 6)) / (2 * h);
    const nb = (logisticOptimalPrice(a, b + h, 6) - logisticOptimalPrice(a, b - h, 6)) / (2 * h);
    expect(Math.abs(ga - na) / Math.abs(na)).toBeLessThan(1e-6);
    expect(Math.abs(gb - nb) / Math.abs(nb)).toBeLessThan(1e-6);
  });

  it('refuses a purchase curve that does not fall', () => {
    expect(refusalOf(() => logisticOptimalPrice(1, 0.1))).toMatchObject({
      code: 'implausible-estimate',
    });
  });
});
