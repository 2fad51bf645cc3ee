import { elasticityWelfare as ew } from '../../../tests/fixtures/checks/elasticity-welfare';
import { arcElasticity } from './arc-elasticity';
import { consumerSurplus } from './consumer-surplus';
import type { DemandCurve } from './demand-curve';
import { inverseElasticityPrice, lernerIndex, optimalPrice } from './optimal-price';
import { marginalRevenue, pointElasticity } from './point-elasticity';
import { constantElasticityDemand, linearDemand, logisticShareDemand } from './standard-curves';
import { refusalOf } from '../../../tests/support/estimation-refusal';
import { empiricalWtpCurve } from '../willingness-to-pay/open-ended-wtp';

const near = (actual: number, expected: number, tol: number = ew.tolerance) =>
  expect(Math.abs(actual - expected)).toBeLessThan(tol);

/** The same linear curve with no closed form and no slope: forces the numerical paths. */
const opaqueLinear: DemandCurve = {
  description: 'Q = 100 − 2P (numerical)',
  quantity: (p) => Math.max(0, 100 - 2 * p),
  priceRange: { min: 0, max: 50 },
};

describe('elasticity and welfare on a linear demand Q = 100 − 2P (CHECKS.md §8)', () => {
  const linear = linearDemand(ew.linear.intercept, ew.linear.slope);

  it('gives Q = 60 and point elasticity −2/3 at P = 20', () => {
    // CHECKS.md §8, textbook: ε = −bP/Q, tolerance 1e-12.
    expect(linear.quantity(20)).toBe(ew.linear.quantity);
    near(pointElasticity(linear, 20), ew.linear.elasticity, ew.elasticityTolerance);
    near(pointElasticity(opaqueLinear, 20), ew.linear.elasticity, 1e-9);
  });

  it('maximises revenue at P = a/2b = 25, Q = 50, where ε = −1 and marginal revenue is 0', () => {
    // CHECKS.md §8, textbook, exact.
    expect(optimalPrice(linear)).toBe(ew.linear.revenueMaxPrice);
    expect(linear.quantity(25)).toBe(ew.linear.revenueMaxQuantity);
    expect(pointElasticity(linear, 25)).toBe(-1);
    expect(marginalRevenue(linear, 25)).toBe(0);
    near(optimalPrice(opaqueLinear), 25, 1e-8);
  });

  it('gives consumer surplus ½(a/b − P)·Q = 900 at P = 20', () => {
    // CHECKS.md §8, textbook, exact; the quadrature path agrees (Simpson is exact for a line).
    expect(consumerSurplus(linear, 20)).toBe(ew.linear.consumerSurplus);
    near(consumerSurplus(opaqueLinear, 20), 900);
  });

  it('puts the profit-maximising price at (a/b + c)/2 for a unit cost', () => {
    // Closed form of max (P − c)(a − bP), common practice; numerical path as a second route.
    expect(optimalPrice(linear, 10)).toBe(30);
    near(optimalPrice(opaqueLinear, 10), 30, 1e-8);
  });
});

describe('constant-elasticity demand (CHECKS.md §8)', () => {
  const ce = constantElasticityDemand(ew.logLog.scale, ew.logLog.elasticity, {
    min: 0.5,
    max: 100,
  });

  it('has elasticity −1.5 at every price, by closed form and by numerical slope', () => {
    // CHECKS.md §8, textbook, tolerance 1e-9.
    for (const p of [1, 5, 40]) {
      expect(pointElasticity(ce, p)).toBe(-1.5);
      const numeric: DemandCurve = { description: 'numerical', quantity: ce.quantity };
      near(pointElasticity(numeric, p), -1.5, ew.logLog.tolerance);
    }
  });

  it('gives consumer surplus A·P^(ε+1)/(−(ε+1))', () => {
    // Closed-form integral, computed here: 50·4^(−0.5)/0.5 = 50.
    expect(consumerSurplus(ce, 4)).toBe(50);
  });

  it('refuses a revenue maximum: revenue falls at every price when ε < −1', () => {
    expect(refusalOf(() => optimalPrice(ce))).toMatchObject({ code: 'no-interior-maximum' });
  });
});

describe('arc elasticity and the inverse-elasticity rule (CHECKS.md §8)', () => {
  it('gives the midpoint elasticity from (10, 100) to (12, 80)', () => {
    // CHECKS.md §8, Allen (1934, from memory): (−20/90)/(2/11) = −1.222222, tolerance 1e-12.
    near(arcElasticity(10, 100, 12, 80), ew.arc.elasticity, ew.elasticityTolerance);
    near(arcElasticity(10, 100, 12, 80), ew.arc.printed, 1e-6);
    // The midpoint formula is symmetric in direction.
    near(arcElasticity(12, 80, 10, 100), ew.arc.elasticity, ew.elasticityTolerance);
  });

  it('gives the Lerner index 1/3 and price 15 at ε = −3, MC = 10', () => {
    // CHECKS.md §8, Lerner (1934), exact.
    near(lernerIndex(ew.lerner.elasticity), ew.lerner.index, 1e-15);
    near(
      inverseElasticityPrice(ew.lerner.marginalCost, ew.lerner.elasticity),
      ew.lerner.price,
      1e-12,
    );
    // The closed-form optimum of a constant-elasticity curve uses the same rule.
    near(optimalPrice(constantElasticityDemand(1000, -3), 10), 15, 1e-12);
  });

  it('refuses the rule for inelastic demand and the arc elasticity of two zero quantities', () => {
    expect(refusalOf(() => inverseElasticityPrice(10, -0.5))).toMatchObject({
      field: 'elasticity',
    });
    expect(refusalOf(() => arcElasticity(1, 0, 2, 0))).toMatchObject({
      code: 'undefined-elasticity',
    });
  });
});

describe('numerical paths on a logistic share curve', () => {
  const a = 6.0214009256;
  const b = -0.3827271092;
  const curve = logisticShareDemand(a, b, { min: 0, max: 200 });

  it('integrates the consumer surplus to the closed form softplus(a + bP)/(−b)', () => {
    // ∫_P^∞ 1/(1 + e^−(a+bx)) dx = ln(1 + e^(a+bP))/(−b), computed here.
    const p = 12;
    const exact = Math.log1p(Math.exp(a + b * p)) / -b;
    near(consumerSurplus(curve, p), exact, 1e-9);
  });

  it('finds the revenue maximum where the elasticity is −1', () => {
    // CHECKS.md §5: 12.3071781027 by Newton–Raphson.
    const p = optimalPrice(curve);
    near(p, 12.3071781027, 1e-8);
    near(pointElasticity(curve, p), -1, 1e-8);
  });

  it('refuses numerics without a price range and slopes of a step function', () => {
    const noRange: DemandCurve = { description: 'no range', quantity: (p) => 10 - p };
    expect(refusalOf(() => optimalPrice(noRange))).toMatchObject({ code: 'missing-price-range' });
    const step: DemandCurve = {
      description: 'step',
      quantity: (p) => (p < 5 ? 1 : 0),
      discrete: true,
    };
    expect(refusalOf(() => pointElasticity(step, 2))).toMatchObject({ code: 'not-differentiable' });
  });
});

describe('optimal price on an empirical (step) WTP curve', () => {
  // Five stated amounts, equal weights: 3 at 10, one at 20, one at 30.
  const curve = empiricalWtpCurve([10, 10, 10, 20, 30], [1, 1, 1, 1, 1]);

  /** A second reading: (P − c)·Q(P) on a fine grid that contains every amount. */
  function bruteForce(unitCost: number): number {
    let best = 0;
    let bestValue = 0;
    for (let k = 0; k <= 40_000; k++) {
      const p = k / 1000;
      const value = (p - unitCost) * curve.quantity(p);
      if (value > bestValue + 1e-12) [best, bestValue] = [p, value];
    }
    return best;
  }

  it('finds the best stated amount, as a search over every price does', () => {
    // Revenue: 10 × 1 = 10, 20 × 0.4 = 8, 30 × 0.2 = 6. At unit cost 5: 5, 6 and 5.
    expect(optimalPrice(curve)).toBe(10);
    expect(optimalPrice(curve, 5)).toBe(20);
    expect(bruteForce(0)).toBe(10);
    expect(bruteForce(5)).toBe(20);
  });

  it('has no optimum when no stated amount is above the unit cost', () => {
    expect(refusalOf(() => optimalPrice(curve, 30))).toMatchObject({
      code: 'no-interior-maximum',
    });
  });
});
