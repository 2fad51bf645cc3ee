import { newtonMillerSmith as nms } from '../../../tests/fixtures/checks/van-westendorp';
import { buildTrialCurve } from './trial-curve';
import type { ThresholdAnswer } from './threshold-answers';
import { refusalOf } from '../../../tests/support/estimation-refusal';

const answers: ThresholdAnswer[] = nms.respondents.map(
  ([tooCheap, cheap, expensive, tooExpensive, lc, le]) => ({
    tooCheap,
    cheap,
    expensive,
    tooExpensive,
    likelihoodCheap: lc,
    likelihoodExpensive: le,
  }),
);

describe('buildTrialCurve (Newton–Miller–Smith extension)', () => {
  const curve = buildTrialCurve(answers);

  it('gives the trial share at each price of the worked example', () => {
    // CHECKS.md §6 (from memory: Newton, Miller & Smith 1993; calibration common practice), printed to 6 digits.
    for (const [price, expected] of Object.entries(nms.trial)) {
      const k = curve.prices.indexOf(Number(price));
      expect(k).toBeGreaterThanOrEqual(0);
      expect(Math.abs(curve.trial[k] - expected)).toBeLessThan(nms.trialTolerance);
    }
  });

  it('reports the tie of the largest trial at 8 and 9 and applies the tie rule', () => {
    // CHECKS.md §6: "a tie at 8 and 9, so a tie rule is needed".
    expect([curve.maxTrial.tiedFrom, curve.maxTrial.tiedTo]).toEqual(nms.maxTrialTiedAt);
    expect(curve.maxTrial.price).toBe(8.5);
    expect(buildTrialCurve(answers, undefined, 'first').maxTrial.price).toBe(8);
  });

  it('finds the revenue maximum at 9 with revenue 4.6', () => {
    // CHECKS.md §6, tolerance 1e-9.
    expect(Math.abs(curve.maxRevenue.price - nms.maxRevenue.price)).toBeLessThan(nms.tolerance);
    expect(Math.abs(curve.maxRevenue.value - nms.maxRevenue.value)).toBeLessThan(nms.tolerance);
  });

  it('uses a configured calibration', () => {
    // Computed here by hand: with every level worth 1, respondent 2 at price 5 is 1·(5 − 4)/(7 − 4).
    const flat = buildTrialCurve(answers, { 1: 1, 2: 1, 3: 1, 4: 1, 5: 1 });
    expect(flat.trial[flat.prices.indexOf(5)]).toBeCloseTo(1 / 9, 12);
  });

  it('refuses a missing likelihood and names it', () => {
    const missing = [{ tooCheap: 1, cheap: 2, expensive: 3, tooExpensive: 4, likelihoodCheap: 5 }];
    expect(refusalOf(() => buildTrialCurve(missing))).toMatchObject({
      code: 'invalid-value',
      field: 'likelihoodExpensive',
    });
  });
});
