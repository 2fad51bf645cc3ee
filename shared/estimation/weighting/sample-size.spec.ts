import { surveyWeighting as sw } from '../../../tests/fixtures/checks/survey-weighting';
import { sampleSizeForProportion } from './sample-size';
import { refusalOf } from '../../../tests/support/estimation-refusal';

const s = sw.sampleSize;
const near = (actual: number, expected: number) =>
  expect(Math.abs(actual - expected)).toBeLessThan(s.printedTolerance);

describe('sampleSizeForProportion (CHECKS.md §10, Cochran 1977)', () => {
  it('needs 385 for ±5 points at p = 0.5 and 95 %', () => {
    const r = sampleSizeForProportion({
      marginOfError: s.conservative.e,
      proportion: s.conservative.p,
    });
    near(r.n0, s.conservative.n0);
    expect(r.n).toBe(s.conservative.n);
    // z = 1.959963984540054 (CHECKS.md §3, stdlib normal quantile).
    expect(r.z).toBeCloseTo(1.959963984540054, 14);
  });

  it('needs 323 from a population of 2000 under either correction', () => {
    const cochran = sampleSizeForProportion({
      marginOfError: 0.05,
      populationSize: s.finite.populationSize,
    });
    const simple = sampleSizeForProportion({
      marginOfError: 0.05,
      populationSize: s.finite.populationSize,
      correction: 'simple',
    });
    near(cochran.nAdjusted, s.finite.cochran);
    near(simple.nAdjusted, s.finite.simple);
    expect([cochran.n, simple.n]).toEqual([s.finite.n, s.finite.n]);
  });

  it('needs 897 for ±3 points at p = 0.3', () => {
    const r = sampleSizeForProportion({ marginOfError: s.other.e, proportion: s.other.p });
    near(r.n0, s.other.n0);
    expect(r.n).toBe(s.other.n);
  });

  it('refuses a margin of error outside (0, 1) and a fractional population', () => {
    expect(refusalOf(() => sampleSizeForProportion({ marginOfError: 0 }))).toMatchObject({
      field: 'marginOfError',
    });
    expect(
      refusalOf(() => sampleSizeForProportion({ marginOfError: 0.05, populationSize: 10.5 })),
    ).toMatchObject({ field: 'populationSize' });
  });
});
