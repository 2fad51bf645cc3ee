import { gaussian } from '../random/gaussian';
import { mulberry32 } from '../random/mulberry32';
import { fitDemandModel } from './fit-demand-model';

// Simulation check (seeded mulberry32 + Box–Muller): data from a known constant-elasticity
// demand ln q = 3 − 1.4·ln p + u, u ~ N(0, 0.25²). A 95 % t interval from the log-log fit
// should cover −1.4 in about 95 % of runs; with 400 runs the binomial SD is 1.1 points, so
// 93–97 % is the accepted band (common practice).
describe('log-log elasticity intervals', () => {
  it('cover the true elasticity −1.4 in 93–97 % of 400 seeded runs', () => {
    const uniform = mulberry32(20240601);
    const noise = gaussian(uniform);
    const runs = 400;
    let covered = 0;
    for (let run = 0; run < runs; run++) {
      const price = Array.from({ length: 40 }, () => 1 + 4 * uniform());
      const quantity = price.map((p) => Math.exp(3 - 1.4 * Math.log(p) + 0.25 * noise()));
      const fit = fitDemandModel({
        form: 'loglog',
        quantity: { name: 'q', values: quantity },
        price: { name: 'p', values: price },
      });
      const own = fit.elasticities[0];
      if (own.ciLow <= -1.4 && -1.4 <= own.ciHigh) covered++;
    }
    const coverage = covered / runs;
    expect(coverage).toBeGreaterThanOrEqual(0.93);
    expect(coverage).toBeLessThanOrEqual(0.97);
  });
});
