import type { FitSpec } from '@shared/analysis/fit-spec';
import { commonSpecFields as common, shelfFitSpec as shelf } from '../testing/fit-spec-fixtures';
import { sampleCount, sampleSizeText } from './fit-sample-size';

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
