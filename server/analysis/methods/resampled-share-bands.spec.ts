import type { FitSpecOf } from '@shared/analysis/fit-spec';
import { fittedCurveFrom } from '@shared/analysis/fitted-curve';
import { mulberry32 } from '@shared/estimation/random/mulberry32';
import type { AnalysisDataset, RowsByMethod } from '../analysis-dataset';
import { fitThresholds } from './fit-thresholds';
import { fitWtpOpen } from './fit-wtp-open';

function dataset<M extends 'wtp-open' | 'price-thresholds'>(
  method: M,
  rows: RowsByMethod[M][],
): AnalysisDataset<M> {
  return {
    method,
    rows,
    blockIds: [],
    designLevels: null,
    bounds: null,
    profiles: new Map(),
    interviewsMatched: rows.length,
    skipped: [],
  };
}

const common = {
  filters: { flagged: 'include' as const },
  weighting: null,
  priceGrid: { from: 10, to: 300, steps: 10 },
  unitCost: null,
  confidenceLevel: 0.95,
};
const wtpSpec: FitSpecOf<'wtp-open'> = {
  method: 'wtp-open',
  ...common,
  bootstrap: { replicates: 200, seed: 7 },
};
const thresholdSpec: FitSpecOf<'price-thresholds'> = { method: 'price-thresholds', ...common };

describe('bands of tabulated demand curves from respondent resamples', () => {
  it('gives the open-WTP share at a price the binomial interval of a proportion', () => {
    // 400 respondents, 40 at each of 10, 20, …, 100: 60 % state 50 or more.
    const rows = Array.from({ length: 400 }, (_, i) => ({
      interviewId: `r${i}`,
      amount: 10 * (1 + (i % 10)),
    }));
    const fit = fitWtpOpen(dataset('wtp-open', rows), wtpSpec, null);
    const curve = fittedCurveFrom(fit.curve!);
    expect(curve.quantity(50)).toBeCloseTo(0.6, 12);
    const band = curve.quantityInterval!(50, 0.95);
    // Normal approximation to a binomial proportion, p ± z·√(p(1 − p)/n) with z = 1.96
    // (common practice): 0.6 ± 0.048. Resampling noise allows a little either way.
    const half = 1.959964 * Math.sqrt((0.6 * 0.4) / 400);
    expect(band.low).toBeCloseTo(0.6 - half, 1);
    expect(band.high).toBeCloseTo(0.6 + half, 1);
    expect(Math.abs(band.high - band.low - 2 * half)).toBeLessThan(0.02);
    expect(fit.assumptions).toContain(
      'curve band and intervals of figures read off it: percentiles over 400 respondent resamples (seeded)',
    );
  });

  it('narrows the trial curve’s band about as 1/√n when the sample is four times larger', () => {
    const random = mulberry32(3);
    const answers = Array.from({ length: 150 }, (_, i) => {
      const cheap = 100 + 10 * Math.floor(random() * 10);
      return {
        interviewId: `t${i}`,
        tooCheap: cheap - 30,
        cheap,
        expensive: cheap + 40 + 10 * Math.floor(random() * 6),
        tooExpensive: cheap + 120,
        likelihoodCheap: 3 + Math.floor(random() * 3),
        likelihoodExpensive: 1 + Math.floor(random() * 3),
      };
    });
    const widthAtPeak = (rows: typeof answers) => {
      const fit = fitThresholds(dataset('price-thresholds', rows), thresholdSpec, null);
      const curve = fittedCurveFrom(fit.curve!);
      const peak = fit.keyFigures.find((f) => f.label.startsWith('Price of the highest trial'))!;
      const band = curve.quantityInterval!(peak.estimate, 0.95);
      expect(band.low).toBeLessThan(curve.quantity(peak.estimate));
      return band.high - band.low;
    };
    const [curves] = fitThresholds(
      dataset('price-thresholds', answers),
      thresholdSpec,
      null,
    ).tables;
    // The four curves go to the screen as lines against price, shares as shares.
    expect(curves).toMatchObject({
      columns: ['Price', 'Too cheap', 'Cheap', 'Expensive', 'Too expensive'],
      columnUnits: ['price', 'share', 'share', 'share', 'share'],
      plot: 'lines',
    });
    const quadrupled = [0, 1, 2, 3].flatMap((copy) =>
      answers.map((a) => ({ ...a, interviewId: `${a.interviewId}-${copy}` })),
    );
    // The standard error of a mean scales as 1/√n (common practice): half the width.
    const ratio = widthAtPeak(quadrupled) / widthAtPeak(answers);
    expect(ratio).toBeGreaterThan(0.4);
    expect(ratio).toBeLessThan(0.6);
  });
});
