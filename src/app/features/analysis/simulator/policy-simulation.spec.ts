import { curveEnsemble } from '@shared/analysis/curve-ensemble';
import { linearDescription, zeroCovariance } from '../testing/linear-description';
import { policyFigureLines } from './policy-figure-lines';
import { simulatePolicy, type PolicyInputs } from './policy-simulation';

const near = (actual: number, expected: number, tolerance = 1e-8) =>
  expect(Math.abs(actual - expected)).toBeLessThan(tolerance);

// Supply of elasticity 1 through (20, 60) is the straight line Qs = 3P, so the case has a closed
// form: 100 − 2(ps + 5) = 3ps gives ps = 18, pb = 23, Q = 54 (computed here by hand).
const tax: PolicyInputs = {
  kind: 'unit-tax',
  amount: 5,
  buyerPercent: 50,
  supplyElasticity: 1,
  marketPrice: 20,
};

describe('simulatePolicy', () => {
  const ensemble = curveEnsemble(linearDescription(), 0.95);

  it('moves the market of Q = 100 − 2P and Qs = 3P under a tax of 5 as the algebra says', () => {
    const result = simulatePolicy(ensemble, tax);
    if (!result.ok) throw new Error(result.message);
    const f = result.figures;
    near(f.quantityBefore.estimate, 60); // Q(20) = 60, CHECKS.md §8
    near(f.buyerPrice.estimate, 23); // computed here by hand
    near(f.sellerPrice.estimate, 18);
    near(f.quantity.estimate, 54);
    near(f.governmentRevenue.estimate, 270); // 5 × 54
    near(f.buyerShare.estimate, 0.6); // (23 − 20)/5
    near(f.sellerShare.estimate, 0.4);
    near(f.deadweightLoss.estimate, 15); // ½ · 5 · (60 − 54), Harberger triangle
  });

  it('gives every figure an interval around its estimate from the fit’s covariance', () => {
    const result = simulatePolicy(ensemble, tax);
    if (!result.ok) throw new Error(result.message);
    for (const figure of Object.values(result.figures)) {
      expect(figure.low).not.toBeNull();
      expect(figure.low!).toBeLessThanOrEqual(figure.estimate + 1e-9);
      expect(figure.high!).toBeGreaterThanOrEqual(figure.estimate - 1e-9);
    }
    // The quantity today depends on the curve, so its interval has width; the tax does not.
    expect(
      result.figures.quantityBefore.high! - result.figures.quantityBefore.low!,
    ).toBeGreaterThan(0.5);
  });

  it('collapses the intervals when the curve is known exactly', () => {
    const exact = curveEnsemble(linearDescription(zeroCovariance), 0.95);
    const result = simulatePolicy(exact, tax);
    if (!result.ok) throw new Error(result.message);
    near(result.figures.quantity.low!, 54);
    near(result.figures.quantity.high!, 54);
  });

  it('shows a subsidy’s spending as a positive cost with its interval turned round', () => {
    const result = simulatePolicy(ensemble, { ...tax, kind: 'unit-subsidy' });
    if (!result.ok) throw new Error(result.message);
    // 100 − 2(ps − 5) = 3ps gives ps = 22, pb = 17, Q = 66, spending 5 × 66 (by hand).
    near(result.figures.governmentRevenue.estimate, -330);
    const cost = policyFigureLines(result.figures, 'unit-subsidy', 'quantity').find(
      (line) => line.key === 'governmentRevenue',
    )!;
    expect(cost.label).toBe('Subsidy cost');
    near(cost.figure.estimate, 330);
    expect(cost.figure.low).toBe(-result.figures.governmentRevenue.high!);
    near(result.figures.deadweightLoss.estimate, 15); // ½ · 5 · (66 − 60)
  });

  it('solves a co-payment where buyers pay half the seller’s price', () => {
    const result = simulatePolicy(ensemble, { ...tax, kind: 'co-payment', buyerPercent: 50 });
    if (!result.ok) throw new Error(result.message);
    // 100 − 2·(ps/2) = 3ps gives ps = 25, pb = 12.5, Q = 75 (computed here by hand).
    near(result.figures.sellerPrice.estimate, 25);
    near(result.figures.buyerPrice.estimate, 12.5);
    near(result.figures.quantity.estimate, 75);
  });

  it('takes the co-payment share in percent: 40 means buyers pay 40 % of the seller’s price', () => {
    const result = simulatePolicy(ensemble, { ...tax, kind: 'co-payment', buyerPercent: 40 });
    if (!result.ok) throw new Error(result.message);
    // 100 − 2·(0.4·ps) = 3ps gives ps = 100/3.8, pb = 0.4·ps (computed here by hand).
    near(result.figures.sellerPrice.estimate, 100 / 3.8);
    near(result.figures.buyerPrice.estimate, 40 / 3.8);
  });

  it('asks for the co-payment share in percent when it is out of range', () => {
    for (const buyerPercent of [0, 100, 140, Number.NaN]) {
      expect(simulatePolicy(ensemble, { ...tax, kind: 'co-payment', buyerPercent })).toEqual({
        ok: false,
        field: 'buyerPercent',
        message: 'Enter the buyer’s share in percent, above 0 and below 100 (say 40).',
      });
    }
  });

  it('names the input at fault instead of computing with it', () => {
    expect(simulatePolicy(ensemble, { ...tax, amount: 0 })).toMatchObject({
      ok: false,
      field: 'amount',
    });
    expect(
      simulatePolicy(ensemble, { ...tax, kind: 'co-payment', buyerPercent: 120 }),
    ).toMatchObject({ ok: false, field: 'buyerPercent' });
    expect(simulatePolicy(ensemble, { ...tax, supplyElasticity: -1 })).toMatchObject({
      ok: false,
      field: 'supplyElasticity',
    });
    expect(simulatePolicy(ensemble, { ...tax, marketPrice: Number.NaN })).toMatchObject({
      ok: false,
      field: 'marketPrice',
    });
  });

  it('turns an engine refusal into a sentence: nobody buys above the choke price of 50', () => {
    const result = simulatePolicy(ensemble, { ...tax, marketPrice: 60 });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.message).toMatch(/^Supply elasticity, price and quantity must be > 0\.$/);
  });
});
