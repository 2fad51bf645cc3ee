import type { FitSpec, FitSpecOf } from '@shared/analysis/fit-spec';
import { sampleCount, sampleSizeText } from './fit-sample-size';

const common = {
  filters: { flagged: 'include' as const },
  weighting: null,
  priceGrid: { from: 500, to: 4000, steps: 8 },
  unitCost: null,
  confidenceLevel: 0.95,
};
const shelf: FitSpecOf<'observed-prices'> = {
  method: 'observed-prices',
  ...common,
  source: 'shelf',
  form: 'loglog',
  covariates: [],
  regionEffects: false,
  standardErrors: 'hc1',
  instrument: 'none',
};
const recall: FitSpec = { ...shelf, source: 'recall' };
const ladder: FitSpec = { method: 'price-ladder', ...common };

describe('what a fit’s n counts', () => {
  it('counts shelf observations, not respondents, for shelf data', () => {
    expect(sampleCount(shelf, 72)).toBe('72 shelf observations');
    expect(sampleCount(shelf, 1)).toBe('1 shelf observation');
  });

  it('counts respondents for purchase recall and stated-preference methods', () => {
    expect(sampleCount(recall, 40)).toBe('40 respondents');
    expect(sampleCount(ladder, 1)).toBe('1 respondent');
  });

  it('leaves out the rows of shelf data when each is one shelf observation', () => {
    expect(sampleSizeText(shelf, { n: 72, observations: 72 })).toBe('n = 72 shelf observations');
    expect(sampleSizeText(shelf, { n: 72, observations: 70 })).toBe(
      'n = 72 shelf observations · 70 observations',
    );
  });

  it('names the rows beside the respondents of a stated-preference fit', () => {
    expect(sampleSizeText(ladder, { n: 50, observations: 350 })).toBe(
      'n = 50 respondents · 350 observations',
    );
  });
});
