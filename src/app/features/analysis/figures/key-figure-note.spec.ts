import { curveEnsemble } from '@shared/analysis/curve-ensemble';
import type { KeyFigure } from '@shared/analysis/fit-result';
import { linearDescription } from '../testing/linear-description';
import { keyFigureNote } from './key-figure-note';

const price = (label: string, interval: boolean): KeyFigure => ({
  label,
  unit: 'price',
  estimate: 25,
  ciLow: interval ? 24 : null,
  ciHigh: interval ? 26 : null,
});

describe('keyFigureNote', () => {
  const ensemble = curveEnsemble(linearDescription(), 0.95);

  it('says nothing for a figure that has its interval', () => {
    expect(keyFigureNote(price('Revenue-maximising price', true), ensemble, null)).toBeNull();
  });

  it('finds again why an optimal price has no interval on the curves the fit drew', () => {
    // A price coefficient whose interval reaches zero: many drawn curves have no best price.
    const wide = curveEnsemble(
      linearDescription([
        [4, 0],
        [0, 4],
      ]),
      0.95,
    );
    expect(keyFigureNote(price('Revenue-maximising price', false), wide, null)).toMatch(
      /too few simulated curves give a value \(\d+ of \d+; 90 % are needed\)/,
    );
  });

  it('passes on the engine’s reason when the curve itself has no best price', () => {
    const loglog = curveEnsemble(
      { ...linearDescription(), kind: 'loglog', priceCoefficient: -1.4 },
      0.95,
    );
    expect(keyFigureNote(price('Revenue-maximising price', false), loglog, null)).toMatch(
      /^No best price inside the curve's price range/,
    );
  });

  it('says the method gives no interval for other figures', () => {
    const half: KeyFigure = { ...price('Price at which half would buy', false), unit: 'index' };
    expect(keyFigureNote(half, ensemble, null)).toBe(
      'no interval: the method gives none for this figure',
    );
  });
});
