import { pointElasticity } from '../estimation/welfare/point-elasticity';
import { empiricalWtpCurve } from '../estimation/willingness-to-pay/open-ended-wtp';
import { fittedCurveFrom } from './fitted-curve';

const range = { min: 1, max: 10 };

describe('fittedCurveFrom', () => {
  it('rebuilds a semi-log curve whose elasticity is b·P (textbook semi-log demand)', () => {
    const curve = fittedCurveFrom({
      kind: 'semilog',
      intercept: 3,
      priceCoefficient: -0.2,
      covariance: [
        [0.01, 0],
        [0, 0.0001],
      ],
      dfResidual: 20,
      observedPriceRange: range,
      n: 22,
    });
    expect(curve.quantity(5)).toBeCloseTo(Math.exp(3 - 1), 12);
    expect(pointElasticity(curve, 5)).toBeCloseTo(-1, 9);
    const band = curve.quantityInterval!(5, 0.95);
    expect(band.low).toBeLessThan(curve.quantity(5));
    expect(band.high).toBeGreaterThan(curve.quantity(5));
  });

  it('rebuilds a WTP model whose share at the median α/β is one half (symmetric F)', () => {
    const curve = fittedCurveFrom({
      kind: 'wtp-model',
      method: 'payment card',
      distribution: 'normal',
      alpha: 3,
      beta: 0.002,
      covariance: [
        [0.04, 0],
        [0, 1e-8],
      ],
      observedPriceRange: range,
      n: 40,
    });
    expect(curve.quantity(1500)).toBeCloseTo(0.5, 12);
  });

  it('rebuilds the empirical WTP step curve from its tabulated points', () => {
    const wtp = [0, 5, 5, 10, 20];
    const engine = empiricalWtpCurve(
      wtp,
      wtp.map(() => 1),
    );
    const points = [0, 5, 10, 20].map((price) => ({ price, share: engine.quantity(price) }));
    const rebuilt = fittedCurveFrom({
      kind: 'step-share',
      points,
      observedPriceRange: range,
      n: 5,
    });
    for (const p of [0, 1, 5, 7, 10, 15, 20, 25])
      expect(rebuilt.quantity(p)).toBe(engine.quantity(p));
  });

  it('interpolates a piecewise share linearly and is 0 outside its knots', () => {
    const curve = fittedCurveFrom({
      kind: 'piecewise-share',
      prices: [2, 4, 8],
      shares: [0, 0.6, 0.2],
      observedPriceRange: range,
      n: 3,
    });
    expect([1, 2, 3, 4, 6, 8, 9].map((p) => curve.quantity(p))).toEqual([
      0, 0, 0.3, 0.6, 0.4, 0.2, 0,
    ]);
  });
});
