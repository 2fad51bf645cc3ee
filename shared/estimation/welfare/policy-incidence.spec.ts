import { elasticityWelfare as ew } from '../../../tests/fixtures/checks/elasticity-welfare';
import type { DemandCurve } from './demand-curve';
import { marketEquilibrium } from './market-equilibrium';
import { policyIncidence } from './policy-incidence';
import { linearDemand } from './standard-curves';
import { constantElasticitySupply, linearSupply } from './supply-curve';
import { refusalOf } from '../../../tests/support/estimation-refusal';

const t = ew.tax;
const demand = linearDemand(t.demand.intercept, t.demand.slope);
const supply = linearSupply(t.supply.intercept, t.supply.slope);
const near = (actual: number, expected: number, tol: number = ew.tolerance) =>
  expect(Math.abs(actual - expected)).toBeLessThan(tol);

describe('policyIncidence of a per-unit tax (CHECKS.md §8)', () => {
  const result = policyIncidence(demand, supply, { kind: 'unit-tax', amount: t.tax });

  it('moves the market from (20, 60) to buyer price 22, seller price 19, quantity 56', () => {
    // CHECKS.md §8, textbook, exact.
    expect(result.before).toEqual(t.before);
    near(result.buyerPrice, t.after.buyerPrice);
    near(result.sellerPrice, t.after.sellerPrice);
    near(result.quantity, t.after.quantity);
  });

  it('puts 2/3 of the tax on buyers, as εs/(εs − εd) also says', () => {
    // CHECKS.md §8, textbook, exact.
    near(result.buyerShare, t.buyerShare);
    near(result.sellerShare, 1 - t.buyerShare);
    near(result.buyerShareByElasticities, t.buyerShare);
  });

  it('raises revenue 168 with a deadweight loss ½·t·ΔQ = 6', () => {
    // CHECKS.md §8, Harberger triangle (from memory), exact.
    near(result.governmentRevenue, t.revenue);
    near(result.deadweightLoss, t.deadweightLoss);
  });

  it('gives the same answer through the numerical path', () => {
    const opaque: DemandCurve = {
      description: 'numerical',
      quantity: demand.quantity,
      priceRange: { min: 0, max: 50 },
    };
    const numeric = policyIncidence(opaque, supply, { kind: 'unit-tax', amount: t.tax });
    near(numeric.buyerPrice, 22, 1e-9);
    near(numeric.deadweightLoss, 6, 1e-8);
  });
});

describe('policyIncidence of a subsidy and a co-payment', () => {
  it('splits a per-unit subsidy of 3: buyers 18, sellers 21, quantity 64, spending 192, loss 6', () => {
    // Computed here by hand: 100 − 2(ps − 3) = −20 + 4ps.
    const r = policyIncidence(demand, supply, { kind: 'unit-subsidy', amount: 3 });
    near(r.buyerPrice, 18);
    near(r.sellerPrice, 21);
    near(r.quantity, 64);
    near(r.governmentRevenue, -192);
    near(r.consumerSurplusChange, 124);
    near(r.producerSurplusChange, 62);
    near(r.deadweightLoss, 6);
  });

  it('solves a co-payment where buyers pay half the seller price', () => {
    // Computed here by hand: 100 − 2·(ps/2) = −20 + 4ps → ps = 24, pb = 12, Q = 76; loss ½·12·16 = 96.
    const r = policyIncidence(demand, supply, { kind: 'co-payment', buyerShare: 0.5 });
    near(r.sellerPrice, 24);
    near(r.buyerPrice, 12);
    near(r.quantity, 76);
    near(r.governmentRevenue, -912);
    near(r.deadweightLoss, 96);
  });

  it('refuses a co-payment share outside (0, 1) and a non-positive tax', () => {
    expect(
      refusalOf(() => policyIncidence(demand, supply, { kind: 'co-payment', buyerShare: 1.2 })),
    ).toMatchObject({ code: 'invalid-value', field: 'buyerShare' });
    expect(
      refusalOf(() => policyIncidence(demand, supply, { kind: 'unit-tax', amount: NaN })),
    ).toMatchObject({ code: 'invalid-value', field: 'amount' });
  });
});

describe('marketEquilibrium against a constant-elasticity supply', () => {
  it('keeps the equilibrium at the point the supply curve was drawn through', () => {
    // Supply of elasticity 0.8 through (20, 60), which lies on the demand curve: computed here.
    const ceSupply = constantElasticitySupply(20, 60, 0.8);
    const eq = marketEquilibrium(demand, ceSupply);
    near(eq.price, 20, 1e-10);
    near(eq.quantity, 60, 1e-9);
    const r = policyIncidence(demand, ceSupply, { kind: 'unit-tax', amount: 3 });
    // Small-wedge approximation εs/(εs − εd) = 0.8/(0.8 + 2/3) at the old equilibrium.
    near(r.buyerShareByElasticities, 0.8 / (0.8 + 2 / 3), 1e-12);
    expect(Math.abs(r.buyerShare - r.buyerShareByElasticities)).toBeLessThan(0.02);
    expect(r.deadweightLoss).toBeGreaterThan(0);
  });
});
