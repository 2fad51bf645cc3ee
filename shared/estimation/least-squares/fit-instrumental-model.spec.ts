import { gaussian } from '../random/gaussian';
import { mulberry32 } from '../random/mulberry32';
import { fitDemandModel } from './fit-demand-model';
import { fitInstrumentalModel } from './fit-instrumental-model';
import { fitLinearModel } from './fit-linear-model';
import { refusalOf } from '../../../tests/support/estimation-refusal';

/**
 * A simulated market (seeded), constructed here: demand q = 20 − 1.5·p + u, supply
 * p = 2 + 0.2·q + 0.8·z + v with a cost shifter z. In equilibrium p = (6 + 0.2u + 0.8z + v)/1.3,
 * so the price is correlated with the demand shock u and OLS is biased towards zero.
 */
function simulatedMarket(seed: number, n: number) {
  const normal = gaussian(mulberry32(seed));
  const z = Array.from({ length: n }, () => normal());
  const u = Array.from({ length: n }, () => normal());
  const v = Array.from({ length: n }, () => 0.5 * normal());
  const p = z.map((zi, i) => (6 + 0.2 * u[i] + 0.8 * zi + v[i]) / 1.3);
  const q = p.map((pi, i) => 20 - 1.5 * pi + u[i]);
  return { z, p, q };
}

const TRUE_SLOPE = -1.5;

describe('two-stage least squares', () => {
  const { z, p, q } = simulatedMarket(7, 500);
  const spec = {
    response: { name: 'q', values: q },
    exogenous: [],
    endogenous: [{ name: 'p', values: p }],
    instruments: [{ name: 'cost', values: z }],
  };

  it('recovers the demand slope within its interval where OLS is biased', () => {
    const ols = fitLinearModel({ response: spec.response, regressors: spec.endogenous });
    const iv = fitInstrumentalModel(spec);
    const olsSlope = ols.coefficients[1];
    const ivSlope = iv.coefficients.find((c) => c.term === 'p')!;
    expect(olsSlope.ciLow).toBeGreaterThan(TRUE_SLOPE); // OLS interval misses the truth
    expect(ivSlope.ciLow).toBeLessThanOrEqual(TRUE_SLOPE);
    expect(ivSlope.ciHigh).toBeGreaterThanOrEqual(TRUE_SLOPE);
    expect(iv.firstStages[0].fStatistic!).toBeGreaterThan(10);
    expect(iv.fTest).toBe('wald');
  });

  it('equals the just-identified closed form and its SE from structural residuals (common practice)', () => {
    const n = q.length;
    const mean = (a: number[]): number => a.reduce((s, x) => s + x, 0) / n;
    const cov = (a: number[], b: number[]): number => {
      const ma = mean(a);
      const mb = mean(b);
      return a.reduce((s, x, i) => s + (x - ma) * (b[i] - mb), 0);
    };
    // β_IV = cov(z, q)/cov(z, p); α = q̄ − β·p̄
    const slope = cov(z, q) / cov(z, p);
    const intercept = mean(q) - slope * mean(p);
    // σ² from structural residuals q − α − βp (actual p); Var β = σ² / Σ(p̂ − p̄)², p̂ the first-stage fit
    const residuals = q.map((qi, i) => qi - intercept - slope * p[i]);
    const sigma2 = residuals.reduce((s, e) => s + e * e, 0) / (n - 2);
    const firstSlope = cov(z, p) / cov(z, z);
    const fittedSpread = firstSlope ** 2 * cov(z, z);
    const iv = fitInstrumentalModel(spec);
    const row = iv.coefficients.find((c) => c.term === 'p')!;
    expect(row.estimate).toBeCloseTo(slope, 10);
    expect(iv.coefficients[0].estimate).toBeCloseTo(intercept, 9);
    expect(row.stdError / Math.sqrt(sigma2 / fittedSpread)).toBeCloseTo(1, 10);
    // The first-stage F for one instrument is its squared t statistic.
    const first = fitLinearModel({
      response: { name: 'p', values: p },
      regressors: [{ name: 'cost', values: z }],
    });
    expect(iv.firstStages[0].fStatistic!).toBeCloseTo(first.coefficients[1].tStatistic! ** 2, 8);
  });

  it('runs through fitDemandModel with an instrument for the price', () => {
    const fit = fitDemandModel({
      form: 'linear',
      quantity: { name: 'q', values: q },
      price: { name: 'p', values: p },
      instruments: [{ name: 'cost', values: z }],
      standardErrors: { type: 'hc1' },
    });
    expect(fit.endogenous).toEqual(['p']);
    expect(fit.firstStages?.[0].endogenous).toBe('p');
    const slope = fit.coefficients.find((c) => c.term === 'p')!;
    expect(slope.ciLow).toBeLessThanOrEqual(TRUE_SLOPE);
    expect(slope.ciHigh).toBeGreaterThanOrEqual(TRUE_SLOPE);
    expect(fit.elasticities[0].kind).toBe('own-price');
  });

  it('refuses fewer instruments than endogenous regressors', () => {
    expect(refusalOf(() => fitInstrumentalModel({ ...spec, instruments: [] }))).toMatchObject({
      code: 'under-identified',
      field: 'instruments',
    });
  });
});
