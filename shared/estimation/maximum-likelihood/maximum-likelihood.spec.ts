import { fitBinomialLogit, logistic } from './binomial-logit';
import { maximiseLogLikelihood } from './newton-maximiser';
import { invertPositiveDefinite } from './small-matrix';

describe('invertPositiveDefinite', () => {
  it('inverts a 2×2 matrix and refuses a singular one', () => {
    // [[4, 2], [2, 3]]⁻¹ = [[3, −2], [−2, 4]]/8, computed here by hand.
    const inv = invertPositiveDefinite([
      [4, 2],
      [2, 3],
    ])!;
    expect(inv[0][0]).toBeCloseTo(3 / 8, 15);
    expect(inv[0][1]).toBeCloseTo(-2 / 8, 15);
    expect(inv[1][1]).toBeCloseTo(4 / 8, 15);
    expect(
      invertPositiveDefinite([
        [1, 1],
        [1, 1],
      ]),
    ).toBeUndefined();
  });
});

describe('maximiseLogLikelihood', () => {
  it('finds the maximum of a concave function from far away', () => {
    // −(a − 3)⁴ − (b + 1)² has its maximum at (3, −1) (computed here); Newton with halving gets there.
    const fit = maximiseLogLikelihood(
      ([a, b]) => ({
        value: -((a - 3) ** 4) - (b + 1) ** 2 - 1,
        gradient: [-4 * (a - 3) ** 3, -2 * (b + 1)],
        hessian: [
          [-12 * (a - 3) ** 2 - 1e-9, 0],
          [0, -2],
        ],
      }),
      [40, 30],
      'x',
    );
    expect(fit.params[0]).toBeCloseTo(3, 3);
    expect(fit.params[1]).toBeCloseTo(-1, 12);
  });
});

describe('fitBinomialLogit cluster-robust covariance', () => {
  // Two respondents, each with answers at three prices.
  const x = [1, 2, 3, 1, 2, 3, 1, 2, 3];
  const y = [1, 1, 0, 1, 0, 0, 1, 0, 1];
  const clusters = ['a', 'a', 'a', 'b', 'b', 'b', 'c', 'c', 'c'];
  const fit = fitBinomialLogit({ x, y, clusters });

  it('equals the sandwich H⁻¹(Σ_g s_g s_gᵀ)H⁻¹·G/(G − 1) written out by hand', () => {
    // Computed here by hand, formula common practice.
    const { intercept: a, slope: b } = fit;
    const p = x.map((xi) => logistic(a + b * xi));
    const info = [
      [
        p.reduce((s, pi) => s + pi * (1 - pi), 0),
        p.reduce((s, pi, i) => s + pi * (1 - pi) * x[i], 0),
      ],
      [0, p.reduce((s, pi, i) => s + pi * (1 - pi) * x[i] * x[i], 0)],
    ];
    info[1][0] = info[0][1];
    const det = info[0][0] * info[1][1] - info[0][1] ** 2;
    const bread = [
      [info[1][1] / det, -info[0][1] / det],
      [-info[0][1] / det, info[0][0] / det],
    ];
    const scores = ['a', 'b', 'c'].map((g) =>
      x.reduce(
        (s, xi, i) => (clusters[i] === g ? [s[0] + y[i] - p[i], s[1] + (y[i] - p[i]) * xi] : s),
        [0, 0],
      ),
    );
    const meat = [0, 1].map((j) =>
      [0, 1].map((k) => scores.reduce((s, sc) => s + sc[j] * sc[k], 0)),
    );
    const product = (m: number[][], n: number[][]) =>
      [0, 1].map((i) => [0, 1].map((j) => m[i][0] * n[0][j] + m[i][1] * n[1][j]));
    const expected = product(product(bread, meat), bread).map((row) => row.map((v) => (v * 3) / 2));
    for (const i of [0, 1]) {
      for (const j of [0, 1]) expect(fit.robustCovariance[i][j]).toBeCloseTo(expected[i][j], 10);
      for (const j of [0, 1]) expect(fit.modelCovariance[i][j]).toBeCloseTo(bread[i][j], 10);
    }
    expect(fit.clusterCount).toBe(3);
  });
});
