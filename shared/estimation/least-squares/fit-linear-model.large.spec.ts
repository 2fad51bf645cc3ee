import { fitLinearModel } from './fit-linear-model';
import { largeClusterDesign } from './large-cluster-design';

// Speed is measured by `npm run bench -- memory-fit`; this spec checks the same fit's behaviour.
describe('fitLinearModel on a large clustered design', () => {
  it('fits 10 000 rows × 8 regressors with cluster-robust errors and recovers the slopes', () => {
    const fit = fitLinearModel(largeClusterDesign(10_000));
    expect(fit.n).toBe(10_000);
    expect(fit.standardErrors.type).toBe('cluster');
    // The design draws y = 1 + Σ j·x_j + U(0,1): slope j for x_j, intercept 1.5 (noise mean).
    fit.coefficients.slice(1).forEach((row, j) => {
      expect(Math.abs(row.estimate - j)).toBeLessThan(6 * row.stdError);
    });
  });
});
