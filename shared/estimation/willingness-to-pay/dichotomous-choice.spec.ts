import { contingentValuation as cv } from '../../../tests/fixtures/checks/contingent-valuation';
import {
  intervalLogLikelihood,
  intervalProbabilities,
} from '../maximum-likelihood/interval-censored';
import { logisticDistribution } from '../maximum-likelihood/latent-distribution';
import { analyseDichotomousChoice, type BidAnswer } from './dichotomous-choice';
import { refusalOf } from '../../../tests/support/estimation-refusal';

function singleBoundedAnswers(): BidAnswer[] {
  return cv.singleBounded.groups.flatMap(([bid, count, share]) =>
    Array.from({ length: count }, (_, i) => ({ bid, yes: i < Math.round(count * share) })),
  );
}

const doubleBoundedAnswers: BidAnswer[] = cv.doubleBounded.answers.map(
  ([bid, bid2, yes, yes2]) => ({ bid, bid2, yes, yes2 }),
);

describe('analyseDichotomousChoice, single-bounded', () => {
  const sb = cv.singleBounded;
  const result = analyseDichotomousChoice(singleBoundedAnswers(), 'single-bounded');
  const near = (actual: number, expected: number) =>
    expect(Math.abs(actual - expected)).toBeLessThan(sb.tolerance);

  it('recovers α, β, the median and the non-negative mean of the saturated example', () => {
    // CHECKS.md §7, published model (Hanemann 1984, 1989); values computed there.
    near(result.coefficients[0].estimate, sb.alpha);
    near(result.coefficients[1].estimate, sb.beta);
    near(result.medianWtp.estimate, sb.median);
    near(result.meanWtpNonNegative.estimate, sb.meanNonNegative);
    expect(result.n).toBe(20);
  });

  it('gives β the standard error of the two-point saturated logit', () => {
    // Computed here by hand: var(logit p̂) = 1/(n·p·(1 − p)) per bid, β = (logit p₁ − logit p₂)/20.
    const varLogit = (p: number) => 1 / (10 * p * (1 - p));
    const seBeta = Math.sqrt(varLogit(0.8) + varLogit(0.3)) / 20;
    expect(result.coefficients[1].stdError).toBeCloseTo(seBeta, 9);
  });

  it('gives a delta-method interval for the median that contains it', () => {
    const m = result.medianWtp;
    expect(m.ciLow).toBeLessThan(m.estimate);
    expect(m.ciHigh).toBeGreaterThan(m.estimate);
    expect(m.ciHigh - m.estimate).toBeCloseTo(m.estimate - m.ciLow, 9);
  });

  it('refuses all-yes answers: the logit has no finite estimate', () => {
    const allYes = singleBoundedAnswers().map((a) => ({ ...a, yes: true }));
    expect(refusalOf(() => analyseDichotomousChoice(allYes, 'single-bounded'))).toMatchObject({
      code: 'no-finite-estimate',
      field: 'bid',
    });
  });

  it('refuses a single bid level', () => {
    const one = [
      { bid: 10, yes: true },
      { bid: 10, yes: false },
    ];
    expect(refusalOf(() => analyseDichotomousChoice(one, 'single-bounded'))).toMatchObject({
      code: 'too-few-levels',
      field: 'bid',
    });
  });

  it('refuses a NaN bid', () => {
    const bad = [
      { bid: NaN, yes: true },
      { bid: 10, yes: false },
    ];
    expect(refusalOf(() => analyseDichotomousChoice(bad, 'single-bounded'))).toMatchObject({
      code: 'invalid-value',
      field: 'bid',
    });
  });
});

describe('double-bounded dichotomous choice', () => {
  const db = cv.doubleBounded;

  it('gives the outcome probabilities and log-likelihood of the worked example at α = 2.5, β = 0.1', () => {
    // CHECKS.md §7, published likelihood (Hanemann, Loomis & Kanninen 1991); values computed there.
    const result = analyseDichotomousChoice(doubleBoundedAnswers, 'double-bounded');
    expect(result.format).toBe('double-bounded');
    const intervals = doubleBoundedAnswers.map((a) =>
      a.yes
        ? a.yes2
          ? { lower: a.bid2!, upper: Infinity }
          : { lower: a.bid, upper: a.bid2! }
        : a.yes2
          ? { lower: a.bid2!, upper: a.bid }
          : { lower: -Infinity, upper: a.bid2! },
    );
    const probabilities = intervalProbabilities(
      [db.alpha, db.beta],
      intervals,
      logisticDistribution,
    );
    probabilities.forEach((p, i) =>
      expect(Math.abs(p - db.probabilities[i])).toBeLessThan(db.probabilityTolerance),
    );
    const logL = intervalLogLikelihood([db.alpha, db.beta], intervals, logisticDistribution).value;
    expect(Math.abs(logL - db.logLikelihood)).toBeLessThan(db.tolerance);
    // The fitted model can only do better than the worked example's parameters.
    expect(result.logLikelihood).toBeGreaterThanOrEqual(logL);
  });

  it('has a zero score at the estimate', () => {
    const result = analyseDichotomousChoice(doubleBoundedAnswers, 'double-bounded');
    const [alpha, beta] = result.coefficients.map((c) => c.estimate);
    const intervals = [
      { lower: 40, upper: Infinity },
      { lower: 20, upper: 40 },
      { lower: 10, upper: 20 },
      { lower: -Infinity, upper: 10 },
      { lower: 30, upper: 60 },
      { lower: 15, upper: 30 },
    ];
    const { gradient } = intervalLogLikelihood([alpha, beta], intervals, logisticDistribution);
    expect(Math.abs(gradient[0])).toBeLessThan(1e-8);
    expect(Math.abs(gradient[1])).toBeLessThan(1e-8);
  });

  it('refuses a follow-up bid on the wrong side of the first', () => {
    const bad = [{ bid: 20, bid2: 10, yes: true, yes2: true }, ...doubleBoundedAnswers];
    expect(refusalOf(() => analyseDichotomousChoice(bad, 'double-bounded'))).toMatchObject({
      code: 'invalid-value',
      field: 'bid2',
    });
  });

  it('refuses all yes-yes answers', () => {
    const allYes = doubleBoundedAnswers.map((a) => ({
      ...a,
      yes: true,
      yes2: true,
      bid2: a.bid * 2,
    }));
    expect(refusalOf(() => analyseDichotomousChoice(allYes, 'double-bounded'))).toMatchObject({
      code: 'no-finite-estimate',
    });
  });
});
