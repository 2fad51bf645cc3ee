import { contingentValuation as cv } from '../../../tests/fixtures/checks/contingent-valuation';
import { intervalLogLikelihood } from '../maximum-likelihood/interval-censored';
import { normalDistribution } from '../maximum-likelihood/latent-distribution';
import { analysePaymentCard, type CardInterval } from './payment-card';
import { refusalOf } from '../../../tests/support/estimation-refusal';

const pc = cv.paymentCard;
const intervals: CardInterval[] = pc.picks.map((lower) => {
  const k = pc.card.indexOf(lower);
  return { lower, upper: pc.card[k + 1] ?? Infinity };
});

describe('analysePaymentCard', () => {
  it('gives the worked example log-likelihood at μ = 20, σ = 15', () => {
    // CHECKS.md §7, published (Cameron & Huppert 1989); value computed there. α = μ/σ, β = 1/σ.
    const logL = intervalLogLikelihood(
      [pc.mu / pc.sigma, 1 / pc.sigma],
      intervals,
      normalDistribution,
    ).value;
    expect(Math.abs(logL - pc.logLikelihood)).toBeLessThan(pc.tolerance);
  });

  it('maximises the likelihood and reports μ as median and mean WTP', () => {
    const result = analysePaymentCard(intervals);
    expect(result.n).toBe(10);
    expect(result.logLikelihood).toBeGreaterThanOrEqual(pc.logLikelihood);
    const [alpha, beta] = result.coefficients.map((c) => c.estimate);
    const { gradient } = intervalLogLikelihood([alpha, beta], intervals, normalDistribution);
    expect(Math.abs(gradient[0]) + Math.abs(gradient[1])).toBeLessThan(1e-8);
    expect(result.medianWtp.estimate).toBeCloseTo(alpha / beta, 12);
    expect(result.sigma).toBeCloseTo(1 / beta, 12);
    // Mean of max(WTP, 0) exceeds the whole-line mean (it drops the negative part).
    expect(result.meanWtpNonNegative.estimate).toBeGreaterThan(result.meanWtp.estimate);
  });

  it('refuses an interval whose upper end is not above its lower end', () => {
    expect(
      refusalOf(() => analysePaymentCard([{ lower: 5, upper: 5 }, ...intervals])),
    ).toMatchObject({ code: 'invalid-value', field: 'upper' });
  });

  it('refuses data where every answer is the same interval', () => {
    expect(
      refusalOf(() =>
        analysePaymentCard([
          { lower: 5, upper: 10 },
          { lower: 5, upper: 10 },
        ]),
      ),
    ).toMatchObject({ code: 'too-few-levels' });
  });
});
