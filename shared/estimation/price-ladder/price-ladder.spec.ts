import { gaborGranger as gg } from '../../../tests/fixtures/checks/gabor-granger';
import { logistic } from '../maximum-likelihood/binomial-logit';
import type { LadderAnswer } from './ladder-answers';
import { analysePriceLadder } from './price-ladder';

/** 200 monotone respondents whose yes-counts per price are exactly the worked example's. */
function workedExampleAnswers(): LadderAnswer[] {
  const answers: LadderAnswer[] = [];
  let id = 0;
  const lastYes = (count: number, level: number) => {
    for (let r = 0; r < count; r++, id++) {
      gg.prices.forEach((price, j) =>
        answers.push({ respondent: `r${id}`, price, buy: j <= level ? 1 : 0 }),
      );
    }
  };
  lastYes(gg.respondents - gg.buyers[0], -1);
  gg.buyers.forEach((count, j) => lastYes(count - (gg.buyers[j + 1] ?? 0), j));
  return answers;
}

describe('analysePriceLadder on the Gabor–Granger worked example', () => {
  const result = analysePriceLadder({ answers: workedExampleAnswers(), unitCost: gg.unitCost });
  const e = gg.expected;

  it('gives the purchase share, revenue and profit index at each price', () => {
    // Expected: CHECKS.md §5, published (Gabor & Granger 1964/1966), formulas common practice.
    expect(result.n).toBe(200);
    result.steps.forEach((step, j) => {
      expect(step.price).toBe(gg.prices[j]);
      expect(step.share).toBeCloseTo(e.shares[j], 9);
      expect(Math.abs(step.revenueIndex - e.revenueIndex[j])).toBeLessThan(e.tolerance);
      expect(Math.abs((step.profitIndex ?? NaN) - e.profitIndex[j])).toBeLessThan(e.tolerance);
    });
  });

  it('finds the revenue-maximising price 12 and the profit-maximising price 14 on the ladder', () => {
    // CHECKS.md §5, published (Gabor & Granger; revenue index per Lipovetsky et al. 2011).
    expect(result.revenueMaxPrice).toBe(e.revenueMaxPrice);
    expect(result.profitMaxPrice).toBe(e.profitMaxPrice);
  });

  it('gives midpoint arc elasticities between neighbouring prices', () => {
    // CHECKS.md §5, midpoint formula (common practice); values printed to 6 decimals there.
    result.arcElasticities.forEach((arc, j) =>
      expect(Math.abs((arc.elasticity ?? NaN) - e.arcElasticities[j])).toBeLessThan(e.arcTolerance),
    );
  });

  it('fits the logistic purchase curve by maximum likelihood', () => {
    // CHECKS.md §5, computed there by Newton–Raphson/IRLS converged to 1e-14.
    const [a, b] = result.logistic.coefficients;
    expect(Math.abs(a.estimate - e.logit.a)).toBeLessThan(e.logit.tolerance);
    expect(Math.abs(b.estimate - e.logit.b)).toBeLessThan(e.logit.tolerance);
    expect(Math.abs(result.logistic.logLikelihood - e.logit.logLikelihood)).toBeLessThan(
      e.logit.tolerance,
    );
    expect(Math.abs(result.logistic.halfSharePrice.estimate - e.logit.halfSharePrice)).toBeLessThan(
      1e-8,
    );
    expect(
      Math.abs((result.logistic.revenueMaxPrice?.estimate ?? NaN) - e.logit.revenueMaxPrice),
    ).toBeLessThan(1e-8);
    expect(
      Math.abs((result.logistic.maxRevenueIndex?.estimate ?? NaN) - e.logit.maxRevenue),
    ).toBeLessThan(1e-8);
  });

  it('satisfies the score equations at the estimate', () => {
    // CHECKS.md §5: Σ(kᵢ − nᵢPᵢ) = 0 and Σ(kᵢ − nᵢPᵢ)pᵢ = 0, tolerance 1e-8.
    const [a, b] = result.logistic.coefficients.map((c) => c.estimate);
    const residual = gg.prices.map((p, j) => gg.buyers[j] - gg.respondents * logistic(a + b * p));
    expect(Math.abs(residual.reduce((s, r) => s + r, 0))).toBeLessThan(1e-8);
    expect(Math.abs(residual.reduce((s, r, j) => s + r * gg.prices[j], 0))).toBeLessThan(1e-8);
  });

  it('puts the profit-maximising price above the revenue-maximising one and inside its interval', () => {
    // Property of (p − c)·P(p) with c > 0 (common practice); intervals from the delta method.
    const profit = result.logistic.profitMaxPrice;
    const revenue = result.logistic.revenueMaxPrice;
    expect(profit && revenue && profit.estimate > revenue.estimate).toBe(true);
    expect(profit && profit.ciLow < profit.estimate && profit.estimate < profit.ciHigh).toBe(true);
    expect(profit?.stdError).toBeGreaterThan(0);
  });
});
