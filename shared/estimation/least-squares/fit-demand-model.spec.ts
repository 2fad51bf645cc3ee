import { fitDemandModel } from './fit-demand-model';

const prices = [10, 12, 14, 16, 18, 20, 22, 24, 26, 28, 30];

describe('fitDemandModel', () => {
  it('recovers own, income and cross elasticities of an exact constant-elasticity curve', () => {
    // Constructed here: q = 50·p^−1.4·income^0.6·other^0.3 with no noise, so log-log OLS is exact.
    const income = prices.map((_, i) => 100 + 37 * ((i * 7) % 11));
    const other = prices.map((_, i) => 5 + ((i * 5) % 11));
    const quantity = prices.map((p, i) => 50 * p ** -1.4 * income[i] ** 0.6 * other[i] ** 0.3);
    const fit = fitDemandModel({
      form: 'loglog',
      quantity: { name: 'units', values: quantity },
      price: { name: 'price', values: prices },
      covariates: [
        { name: 'income', values: income, role: 'income' },
        { name: 'rival_price', values: other, role: 'cross-price' },
      ],
    });
    const byKind = Object.fromEntries(fit.elasticities.map((e) => [e.kind, e]));
    expect(byKind['own-price'].estimate).toBeCloseTo(-1.4, 10);
    expect(byKind['income'].estimate).toBeCloseTo(0.6, 10);
    expect(byKind['cross-price'].estimate).toBeCloseTo(0.3, 10);
    expect(byKind['own-price'].method).toBe('coefficient');
    expect(fit.loggedColumns).toEqual(['units', 'price', 'income', 'rival_price']);
    expect(fit.coefficients.map((c) => c.term)).toEqual([
      '(intercept)',
      'price',
      'income',
      'rival_price',
    ]);
  });

  it('gives the textbook point elasticity on a linear curve (CHECKS.md §8, published)', () => {
    // Q = 100 − 2P at P = 20: Q = 60, ε = −bP/Q = −0.666667 (CHECKS.md §8, textbook).
    const quantity = prices.map((p) => 100 - 2 * p);
    const fit = fitDemandModel({
      form: 'linear',
      quantity: { name: 'q', values: quantity },
      price: { name: 'p', values: prices },
      evaluateAt: { price: 20 },
    });
    const own = fit.elasticities[0];
    expect(own.estimate).toBeCloseTo(-2 / 3, 12);
    expect(own.atQuantity).toBeCloseTo(60, 12);
    expect(own.atValue).toBe(20);
  });

  it('gives β·p on a semi-log curve (ln q = 5 − 0.05p at p = 20: ε = −1, constructed here)', () => {
    const quantity = prices.map((p) => Math.exp(5 - 0.05 * p));
    const fit = fitDemandModel({
      form: 'semilog',
      quantity: { name: 'q', values: quantity },
      price: { name: 'p', values: prices },
      evaluateAt: { price: 20 },
    });
    expect(fit.elasticities[0].estimate).toBeCloseTo(-1, 12);
    expect(fit.elasticities[0].method).toBe('delta');
  });

  it('evaluates a linear elasticity at the means by the delta method, including the uncertainty of q̂', () => {
    const quantity = [82, 74, 75, 69, 62, 63, 55, 50, 49, 41, 42];
    const fit = fitDemandModel({
      form: 'linear',
      quantity: { name: 'q', values: quantity },
      price: { name: 'p', values: prices },
    });
    const [a, b] = fit.coefficients.map((c) => c.estimate);
    const meanP = prices.reduce((s, p) => s + p, 0) / prices.length;
    const meanQ = quantity.reduce((s, q) => s + q, 0) / quantity.length;
    const own = fit.elasticities[0];
    // OLS with an intercept passes through the means, so q̂(p̄) = q̄ (common practice).
    expect(own.atQuantity).toBeCloseTo(meanQ, 10);
    expect(own.estimate).toBeCloseTo((b * meanP) / meanQ, 12);
    // Delta method written out here: ε(a, b) = b·p̄/(a + b·p̄), gradient by central differences.
    const epsilon = (ai: number, bi: number): number => (bi * meanP) / (ai + bi * meanP);
    const h = 1e-6;
    const gradient = [
      (epsilon(a + h, b) - epsilon(a - h, b)) / (2 * h),
      (epsilon(a, b + h) - epsilon(a, b - h)) / (2 * h),
    ];
    const variance = gradient.reduce(
      (s, gi, i) => s + gi * gradient.reduce((t, gj, j) => t + fit.covariance[i][j] * gj, 0),
      0,
    );
    expect(own.stdError).toBeCloseTo(Math.sqrt(variance), 7);
    // Holding a stated quantity fixed leaves only the slope's uncertainty: SE = SE(b)·p/q.
    const fixed = fitDemandModel({
      form: 'linear',
      quantity: { name: 'q', values: quantity },
      price: { name: 'p', values: prices },
      evaluateAt: { price: meanP, quantity: meanQ },
    });
    expect(fixed.elasticities[0].stdError).toBeCloseTo(
      (fit.coefficients[1].stdError * meanP) / meanQ,
      12,
    );
  });

  it('adds region fixed effects as dummies, dropping the base level', () => {
    const regions = prices.map((_, i) => ['north', 'south', 'east'][i % 3]);
    const shift: Record<string, number> = { east: 0, north: 0.3, south: -0.2 };
    const quantity = prices.map((p, i) => Math.exp(4 + shift[regions[i]]) * p ** -1.1);
    const fit = fitDemandModel({
      form: 'loglog',
      quantity: { name: 'q', values: quantity },
      price: { name: 'p', values: prices },
      fixedEffects: [{ name: 'region', values: regions }],
    });
    expect(fit.fixedEffectBases).toEqual({ region: 'east' });
    const estimate = (term: string): number =>
      fit.coefficients.find((c) => c.term === term)!.estimate;
    expect(estimate('region=north')).toBeCloseTo(0.3, 10);
    expect(estimate('region=south')).toBeCloseTo(-0.2, 10);
    expect(estimate('p')).toBeCloseTo(-1.1, 10);
    expect(fit.elasticities.map((e) => e.term)).toEqual(['p']);
  });
});
