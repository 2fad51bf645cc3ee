import { mulberry32 } from '../random/mulberry32';
import { fitLinearModel } from './fit-linear-model';

// Requirement of the estimation engine: a fit of 10 000 rows × 8 columns takes well under a
// second (measured about 30–80 ms on a 2-core machine, including the double-double refinement).
describe('fitLinearModel speed', () => {
  it('fits 10 000 rows × 8 regressors with cluster-robust errors in under a second', () => {
    const next = mulberry32(99);
    const n = 10_000;
    const regressors = Array.from({ length: 8 }, (_, j) => ({
      name: `x${j}`,
      values: Array.from({ length: n }, () => next()),
    }));
    const y = Array.from(
      { length: n },
      (_, i) => regressors.reduce((s, c, j) => s + j * c.values[i], 1) + next(),
    );
    const sites = Array.from({ length: n }, (_, i) => `site${i % 40}`);
    const started = performance.now();
    const fit = fitLinearModel({
      response: { name: 'y', values: y },
      regressors,
      standardErrors: { type: 'cluster', clusters: { name: 'site', values: sites } },
    });
    const elapsed = performance.now() - started;
    expect(fit.n).toBe(n);
    expect(elapsed).toBeLessThan(1000);
  });
});
