import { fitBinomialLogit } from './binomial-logit';
import { mulberry32 } from '../random/mulberry32';

describe('maximiseLogLikelihood near the maximum', () => {
  it('converges on a large ladder whose final likelihood gains are below rounding noise', () => {
    // 240 respondents answering 7 ladder prices from a logistic WTP (median 1500, scale 300):
    // invented data of the kind that once made the search creep about the maximum and give up.
    const uniform = mulberry32(1);
    const x: number[] = [];
    const y: number[] = [];
    for (let r = 0; r < 240; r++) {
      const u = Math.min(Math.max(uniform(), 1e-9), 1 - 1e-9);
      const wtp = 1500 + 300 * Math.log(u / (1 - u));
      for (const price of [800, 1100, 1400, 1700, 2000, 2300, 2600]) {
        x.push(price);
        y.push(wtp >= price ? 1 : 0);
      }
    }
    const fit = fitBinomialLogit({ x, y }, 'price');
    // At the maximum the score Σ(y − p)·(1, x) vanishes (first-order condition, common practice).
    const p = x.map((xi) => 1 / (1 + Math.exp(-(fit.intercept + fit.slope * xi))));
    const score = [0, 1].map((k) => x.reduce((s, xi, i) => s + (y[i] - p[i]) * (k ? xi : 1), 0));
    expect(Math.abs(score[0])).toBeLessThan(1e-6);
    expect(Math.abs(score[1])).toBeLessThan(1e-3);
    // The median −a/b lies near the 1500 the data were drawn from (invented truth).
    expect(-fit.intercept / fit.slope).toBeGreaterThan(1350);
    expect(-fit.intercept / fit.slope).toBeLessThan(1650);
  });
});
