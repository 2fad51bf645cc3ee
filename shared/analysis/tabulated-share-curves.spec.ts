import { curveEnsemble } from './curve-ensemble';
import { estimateOnEnsemble } from './estimated-figure';
import { fittedCurveFrom } from './fitted-curve';
import { refusalOf } from '../../tests/support/estimation-refusal';

const range = { min: 2, max: 8 };

/** A plain second reading of the band rule: percentiles linear between order statistics. */
function percentile(values: number[], q: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  const position = (sorted.length - 1) * q;
  const low = Math.floor(position);
  const high = Math.ceil(position);
  return sorted[low] + (sorted[high] - sorted[low]) * (position - low);
}

describe('tabulated share curves with resampled curves', () => {
  const resampledShares = [
    [0.1, 0.5, 0.3],
    [0, 0.7, 0.2],
    [0.2, 0.6, 0.1],
    [0.1, 0.4, 0.2],
    [0, 0.8, 0.4],
  ];
  const piecewise = {
    kind: 'piecewise-share' as const,
    prices: [2, 4, 8],
    shares: [0.1, 0.6, 0.2],
    resampledShares,
    observedPriceRange: range,
    n: 30,
  };

  it('bands a piecewise curve by the percentiles of the resampled curves at the price', () => {
    const curve = fittedCurveFrom(piecewise);
    // At 3 every resampled curve is halfway between its first two knots.
    const atThree = resampledShares.map(([a, b]) => (a + b) / 2);
    const band = curve.quantityInterval!(3, 0.5);
    expect(band.low).toBeCloseTo(percentile(atThree, 0.25), 12);
    expect(band.high).toBeCloseTo(percentile(atThree, 0.75), 12);
    // Outside the knots every curve is 0, and so is the band.
    expect(curve.quantityInterval!(9, 0.95)).toEqual({ low: 0, high: 0 });
  });

  it('keeps each resampled row with its amount when a step curve’s points come unsorted', () => {
    const curve = fittedCurveFrom({
      kind: 'step-share',
      points: [
        { price: 20, share: 0.2 },
        { price: 10, share: 0.9 },
      ],
      resampledShares: [
        [0.1, 0.8],
        [0.3, 1],
        [0.2, 0.95],
      ],
      observedPriceRange: { min: 10, max: 20 },
      n: 12,
    });
    expect(curve.quantity(15)).toBe(0.2);
    // Above 10 the rows' first entries (0.1, 0.3, 0.2) count; below it their second ones.
    const at15 = curve.quantityInterval!(15, 0.5);
    expect(at15.low).toBeCloseTo(0.15, 12);
    expect(at15.high).toBeCloseTo(0.25, 12);
    const at5 = curve.quantityInterval!(5, 0.5);
    expect(at5.low).toBeCloseTo(0.875, 12);
    expect(at5.high).toBeCloseTo(0.975, 12);
  });

  it('refuses a resampled curve with the wrong number of knots', () => {
    const refusal = refusalOf(() =>
      fittedCurveFrom({ ...piecewise, resampledShares: [[0.1, 0.2]] }),
    );
    expect(refusal).toMatchObject({ code: 'length-mismatch', field: 'resampledShares' });
  });

  it('draws the resampled curves for intervals of figures read off the curve', () => {
    const ensemble = curveEnsemble(piecewise, 0.5);
    expect(ensemble.draws).toHaveLength(resampledShares.length);
    const share = estimateOnEnsemble(ensemble, (c) => c.quantity(4));
    expect(share.estimate).toBe(0.6);
    expect(share.low).toBeCloseTo(percentile([0.5, 0.7, 0.6, 0.4, 0.8], 0.25), 12);
    expect(share.high).toBeCloseTo(percentile([0.5, 0.7, 0.6, 0.4, 0.8], 0.75), 12);
  });

  it('has no band and no drawn curves without resampled curves (fits stored before them)', () => {
    const bare = { ...piecewise, resampledShares: undefined };
    expect(fittedCurveFrom(bare).quantityInterval).toBeUndefined();
    const figure = estimateOnEnsemble(curveEnsemble(bare, 0.95), (c) => c.quantity(4));
    expect(figure.note).toBe('this model gives no interval');
  });
});
