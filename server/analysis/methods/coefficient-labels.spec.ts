import { INTERCEPT_TERM } from '@shared/estimation/least-squares/weighted-design';
import { regressionTermLabel, wtpTermLabels } from './coefficient-labels';

describe('regressionTermLabel', () => {
  it('names the intercept and a logged price as the screen does', () => {
    expect(regressionTermLabel(INTERCEPT_TERM, ['quantity', 'price'])).toBe('Intercept');
    expect(regressionTermLabel('price', ['quantity', 'price'])).toBe('ln price');
  });

  it('keeps an unlogged column plain and readable', () => {
    expect(regressionTermLabel('price', ['quantity'])).toBe('Price');
    expect(regressionTermLabel('household_size', [])).toBe('Household size');
    expect(regressionTermLabel('income', ['income'])).toBe('ln income');
  });

  it('names a region effect with the region it is measured against', () => {
    expect(regressionTermLabel('region=North shore', [], { region: 'Central' })).toBe(
      'Region: North shore (against Central)',
    );
    expect(regressionTermLabel('region=North shore', [], { region: null })).toBe(
      'Region: North shore',
    );
  });
});

describe('wtpTermLabels', () => {
  it('names α and β by what they do in F(α − β·P)', () => {
    expect(Object.values(wtpTermLabels)).not.toContain('alpha');
    expect(wtpTermLabels.beta).toBe('Price slope (β)');
  });
});
