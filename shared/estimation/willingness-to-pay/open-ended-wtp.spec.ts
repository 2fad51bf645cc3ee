import { contingentValuation as cv } from '../../../tests/fixtures/checks/contingent-valuation';
import { analyseOpenEndedWtp } from './open-ended-wtp';
import { refusalOf } from '../../../tests/support/estimation-refusal';

const oe = cv.openEnded;

describe('analyseOpenEndedWtp', () => {
  const result = analyseOpenEndedWtp({ wtp: oe.wtp });

  it('gives the mean and median of the worked example', () => {
    // CHECKS.md §7, common practice: mean 27.5, median 17.5.
    expect(result.meanWtp.estimate).toBe(oe.mean);
    expect(result.medianWtp.estimate).toBe(oe.median);
    expect(result.n).toBe(10);
  });

  it('gives the share with WTP at or above each stated amount', () => {
    // Computed here by counting: 10 of 10 at 0, 8 of 10 at 10, 1 of 10 at 100.
    const at = (price: number) => result.demandCurve.find((d) => d.price === price)?.share;
    expect([at(0), at(10), at(100)]).toEqual([1, 0.8, 0.1]);
    expect(result.curve.quantity(12)).toBe(0.6);
  });

  it('gives a reproducible bootstrap interval from its seed', () => {
    const again = analyseOpenEndedWtp({ wtp: oe.wtp });
    const other = analyseOpenEndedWtp({ wtp: oe.wtp, seed: 7 });
    expect(again.meanWtp).toEqual(result.meanWtp);
    expect(other.meanWtp.ciLow).not.toBe(result.meanWtp.ciLow);
    expect(result.meanWtp.ciLow).toBeLessThan(oe.mean);
    expect(result.meanWtp.ciHigh).toBeGreaterThan(oe.mean);
  });

  it('has a bootstrap standard error of the mean close to s·√((n − 1)/n)/√n', () => {
    // Common practice: the bootstrap SE of a mean estimates the plug-in SE; 2000 resamples, 10 %.
    const n = oe.wtp.length;
    const variance = oe.wtp.reduce((s: number, v) => s + (v - oe.mean) ** 2, 0) / n;
    const plugIn = Math.sqrt(variance / n);
    expect(Math.abs(result.meanWtp.stdError - plugIn) / plugIn).toBeLessThan(0.1);
  });

  it('weights respondents', () => {
    // Computed here: weights 3 on 0 and 1 on 100 → mean 25, median 0.
    const weighted = analyseOpenEndedWtp({ wtp: [0, 100], weights: [3, 1], replicates: 50 });
    expect(weighted.meanWtp.estimate).toBe(25);
    expect(weighted.medianWtp.estimate).toBe(0);
  });

  it('refuses a negative or missing amount and too few answers', () => {
    expect(refusalOf(() => analyseOpenEndedWtp({ wtp: [1, -2] }))).toMatchObject({
      code: 'invalid-value',
      field: 'wtp',
    });
    expect(refusalOf(() => analyseOpenEndedWtp({ wtp: [1, NaN] }))).toMatchObject({
      code: 'invalid-value',
      field: 'wtp',
    });
    expect(refusalOf(() => analyseOpenEndedWtp({ wtp: [] }))).toMatchObject({
      code: 'too-few-observations',
    });
  });
});
