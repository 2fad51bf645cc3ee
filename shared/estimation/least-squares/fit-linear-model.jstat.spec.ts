import jStat from 'jstat';
import { gaussian } from '../random/gaussian';
import { mulberry32 } from '../random/mulberry32';
import { fitLinearModel } from './fit-linear-model';

// Second implementation: jStat 1.9.6 `models.ols` (normal equations, independent code) on
// seeded, well-conditioned random designs. Agreement required: 1e-8 relative.
describe('fitLinearModel against jStat models.ols', () => {
  it.each([1, 2, 3, 4, 5])('agrees on coefficients, SEs and R² for seed %i', (seed) => {
    const uniform = mulberry32(seed);
    const normal = gaussian(uniform);
    const n = 60 + 40 * seed;
    const k = 1 + seed;
    const columns = Array.from({ length: k }, () =>
      Array.from({ length: n }, () => 10 * uniform()),
    );
    const y = Array.from(
      { length: n },
      (_, i) => columns.reduce((s, c, j) => s + (j % 2 ? -1 : 2) * c[i], 5) + normal(),
    );
    const ours = fitLinearModel({
      response: { name: 'y', values: y },
      regressors: columns.map((values, j) => ({ name: `x${j + 1}`, values })),
    });
    const theirs = jStat.models.ols(
      y,
      y.map((_, i) => [1, ...columns.map((c) => c[i])]),
    );
    const relative = (a: number, b: number): number => Math.abs(a - b) / Math.abs(b);
    ours.coefficients.forEach((row, j) => {
      expect(relative(row.estimate, theirs.coef[j])).toBeLessThan(1e-8);
      expect(relative(row.stdError, theirs.t.se[j])).toBeLessThan(1e-8);
    });
    expect(relative(ours.rSquared, theirs.R2)).toBeLessThan(1e-8);
  });
});
