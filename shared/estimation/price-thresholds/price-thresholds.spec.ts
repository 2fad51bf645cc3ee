import { vanWestendorp as vw } from '../../../tests/fixtures/checks/van-westendorp';
import { EstimationError } from '../estimation-error';
import { analysePriceThresholds } from './price-thresholds';
import type { ThresholdAnswer } from './threshold-answers';
import { refusalOf } from '../../../tests/support/estimation-refusal';

const answers: ThresholdAnswer[] = vw.respondents.map(
  ([tooCheap, cheap, expensive, tooExpensive]) => ({
    tooCheap,
    cheap,
    expensive,
    tooExpensive,
  }),
);
const near = (actual: number | undefined, expected: number) =>
  expect(Math.abs((actual ?? NaN) - expected)).toBeLessThan(vw.expected.tolerance);

describe('analysePriceThresholds on the Van Westendorp worked example', () => {
  const a = analysePriceThresholds({ answers });
  const b = analysePriceThresholds({ answers, convention: 'not-cheap-not-expensive' });

  it('names the curves that define the marginal points in words, not by a code', () => {
    expect(a.assumptions).toContain(
      'point of marginal cheapness where too cheap crosses expensive; point of marginal expensiveness where cheap crosses too expensive',
    );
    expect(b.assumptions.join(' ')).toContain('where too cheap crosses not cheap');
    expect([...a.assumptions, ...b.assumptions].join(' ')).not.toMatch(/'[a-z-]+' convention/);
  });

  it('builds the four curves and their complements on the union grid', () => {
    // CHECKS.md §4, curves computed there from the published construction.
    for (const [price, row] of Object.entries(vw.curves)) {
      const k = a.curves.prices.indexOf(Number(price));
      const { tooCheap, cheap, expensive, tooExpensive, notCheap, notExpensive } = a.curves;
      [tooCheap, cheap, expensive, tooExpensive, notCheap, notExpensive].forEach((curve, j) =>
        near(curve[k], row[j]),
      );
    }
    expect(a.curves.prices[0]).toBe(3);
    expect(a.curves.prices[a.curves.prices.length - 1]).toBe(21);
  });

  it('finds the optimal and indifference price points', () => {
    // CHECKS.md §4, published definitions (Van Westendorp 1976), values exact rationals.
    near(a.optimalPrice?.price, vw.expected.optimal.price);
    near(a.optimalPrice?.share, vw.expected.optimal.share);
    near(a.indifferencePrice?.price, vw.expected.indifference.price);
    near(a.indifferencePrice?.share, vw.expected.indifference.share);
    expect(a.n).toBe(10);
  });

  it('finds the marginal points under the cheap/expensive convention (A, the default)', () => {
    // CHECKS.md §4, convention A ("common description", encyclopedia article on the PSM).
    expect(a.convention).toBe('cheap-expensive');
    near(a.marginalCheapnessPrice?.price, vw.expected.conventionA.pmc.price);
    near(a.marginalCheapnessPrice?.share, vw.expected.conventionA.pmc.share);
    near(a.marginalExpensivenessPrice?.price, vw.expected.conventionA.pme.price);
    near(a.marginalExpensivenessPrice?.share, vw.expected.conventionA.pme.share);
    near(a.acceptableRange?.low, vw.expected.conventionA.pmc.price);
    near(a.acceptableRange?.high, vw.expected.conventionA.pme.price);
  });

  it('finds the marginal points under the not-cheap/not-expensive convention (B)', () => {
    // CHECKS.md §4, convention B (attributed to the original labelling from memory).
    near(b.marginalCheapnessPrice?.price, vw.expected.conventionB.pmc.price);
    near(b.marginalCheapnessPrice?.share, vw.expected.conventionB.pmc.share);
    near(b.marginalExpensivenessPrice?.price, vw.expected.conventionB.pme.price);
    near(b.marginalExpensivenessPrice?.share, vw.expected.conventionB.pme.share);
    near(b.indifferencePrice?.price, vw.expected.indifference.price);
  });
});

describe('analysePriceThresholds tie rule', () => {
  // Too cheap and too expensive are both 0 at prices 9, 10 and 11 (CHECKS.md §4 edge case):
  // the midpoint rule gives 10, the first-point rule 9.
  const tied: ThresholdAnswer[] = [
    { tooCheap: 8, cheap: 9, expensive: 12, tooExpensive: 12 },
    { tooCheap: 8, cheap: 10, expensive: 11, tooExpensive: 13 },
    { tooCheap: 7, cheap: 9, expensive: 10, tooExpensive: 12 },
  ];

  it('places a run of ties at its midpoint by default', () => {
    expect(analysePriceThresholds({ answers: tied }).optimalPrice).toEqual({ price: 10, share: 0 });
  });

  it('places a run of ties at its first price under the first rule', () => {
    expect(analysePriceThresholds({ answers: tied, tieRule: 'first' }).optimalPrice).toEqual({
      price: 9,
      share: 0,
    });
  });
});

describe('analysePriceThresholds refusals and screening', () => {
  it('refuses empty data', () => {
    expect(() => analysePriceThresholds({ answers: [] })).toThrow(EstimationError);
    expect(refusalOf(() => analysePriceThresholds({ answers: [] }))).toMatchObject({
      code: 'too-few-observations',
    });
  });

  it('refuses a NaN threshold and names the field', () => {
    const bad = [{ tooCheap: 1, cheap: NaN, expensive: 3, tooExpensive: 4 }];
    expect(refusalOf(() => analysePriceThresholds({ answers: bad }))).toMatchObject({
      code: 'invalid-value',
      field: 'cheap',
    });
  });

  it('excludes respondents whose thresholds are out of order, and counts them', () => {
    const withBad = [...answers, { tooCheap: 20, cheap: 5, expensive: 3, tooExpensive: 1 }];
    const result = analysePriceThresholds({ answers: withBad });
    expect(result.outOfOrderRespondents).toBe(1);
    expect(result.n).toBe(10);
    near(result.optimalPrice?.price, vw.expected.optimal.price);
  });
});
