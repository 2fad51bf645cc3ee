import { fitLinearModel } from './fit-linear-model';

// Small example with exact numbers: x = [1, 2, 3, 4], y = [1, 3, 2, 5], intercept.
// Computed here by hand, formula common practice (White sandwich with the HC1 factor n/(n − k);
// cluster sandwich with G/(G − 1)·(n − 1)/(n − k)):
//   XᵀX = [[4, 10], [10, 30]], (XᵀX)⁻¹ = [[1.5, −0.5], [−0.5, 0.2]], Xᵀy = [11, 33],
//   β = (0, 1.1), residuals e = (−0.1, 0.8, −1.3, 0.6).
const x = [1, 2, 3, 4];
const y = [1, 3, 2, 5];
const bread = [
  [1.5, -0.5],
  [-0.5, 0.2],
];
const residuals = [-0.1, 0.8, -1.3, 0.6];

function sandwich(meat: number[][], factor: number): number[][] {
  const bm = bread.map((row) => [0, 1].map((j) => row[0] * meat[0][j] + row[1] * meat[1][j]));
  return bm.map((row) => [0, 1].map((j) => factor * (row[0] * bread[0][j] + row[1] * bread[1][j])));
}

const outer = (s: number[]): number[][] => s.map((a) => s.map((b) => a * b));
const add = (a: number[][], b: number[][]): number[][] =>
  a.map((row, i) => row.map((v, j) => v + b[i][j]));

describe('robust standard errors', () => {
  it('computes HC1 as (XᵀX)⁻¹·Σeᵢ²xᵢxᵢᵀ·(XᵀX)⁻¹·n/(n − k)', () => {
    // meat = Σ eᵢ²·[1, xᵢ][1, xᵢ]ᵀ, by hand from the residuals above
    const meat = x.map((xi, i) => outer([residuals[i], residuals[i] * xi])).reduce(add);
    const expected = sandwich(meat, 4 / 2);
    const fit = fitLinearModel({
      response: { name: 'y', values: y },
      regressors: [{ name: 'x', values: x }],
      standardErrors: { type: 'hc1' },
    });
    expect(fit.coefficients[0].estimate).toBeCloseTo(0, 14);
    expect(fit.coefficients[1].estimate).toBeCloseTo(1.1, 14);
    fit.covariance.forEach((row, i) =>
      row.forEach((v, j) => expect(v).toBeCloseTo(expected[i][j], 13)),
    );
    expect(fit.coefficients[1].stdError).toBeCloseTo(Math.sqrt(expected[1][1]), 13);
    expect(fit.standardErrors).toMatchObject({ type: 'hc1', smallSampleFactor: 2, df: 2 });
  });

  it('computes cluster SEs from cluster score sums with G/(G − 1)·(n − 1)/(n − k)', () => {
    // clusters {1, 2} and {3, 4}: s_g = Σ_{i∈g} eᵢ·[1, xᵢ]
    const scoreA = [residuals[0] + residuals[1], residuals[0] * 1 + residuals[1] * 2];
    const scoreB = [residuals[2] + residuals[3], residuals[2] * 3 + residuals[3] * 4];
    const factor = (2 / 1) * (3 / 2);
    const expected = sandwich(add(outer(scoreA), outer(scoreB)), factor);
    const fit = fitLinearModel({
      response: { name: 'y', values: y },
      regressors: [{ name: 'x', values: x }],
      standardErrors: { type: 'cluster', clusters: { name: 'site', values: ['a', 'a', 'b', 'b'] } },
    });
    fit.covariance.forEach((row, i) =>
      row.forEach((v, j) => expect(v).toBeCloseTo(expected[i][j], 13)),
    );
    expect(fit.standardErrors).toMatchObject({
      type: 'cluster',
      clusters: 2,
      df: 1,
      clusterColumn: 'site',
    });
    expect(fit.standardErrors.smallSampleFactor).toBeCloseTo(3, 14);
  });

  it('equals HC1 when every observation is its own cluster (G = n makes the factors equal)', () => {
    const data = {
      response: { name: 'y', values: [3, 1, 4, 1, 5, 9, 2, 6] },
      regressors: [{ name: 'x', values: [2, 7, 1, 8, 2, 8, 1, 8] }],
    };
    const hc1 = fitLinearModel({ ...data, standardErrors: { type: 'hc1' } });
    const singletons = fitLinearModel({
      ...data,
      standardErrors: {
        type: 'cluster',
        clusters: { name: 'id', values: [1, 2, 3, 4, 5, 6, 7, 8] },
      },
    });
    hc1.covariance.forEach((row, i) =>
      row.forEach((v, j) => expect(singletons.covariance[i][j]).toBeCloseTo(v, 13)),
    );
  });

  it('does not depend on the order of the rows', () => {
    const values = {
      y: [3, 1, 4, 1, 5, 9, 2, 6],
      x: [2, 7, 1, 8, 2, 8, 1, 8],
      g: ['a', 'b', 'a', 'c', 'b', 'c', 'a', 'b'],
    };
    const order = [7, 2, 5, 0, 3, 6, 1, 4];
    const fit = (pick: (v: (number | string)[]) => (number | string)[]) =>
      fitLinearModel({
        response: { name: 'y', values: pick(values.y) as number[] },
        regressors: [{ name: 'x', values: pick(values.x) as number[] }],
        standardErrors: { type: 'cluster', clusters: { name: 'g', values: pick(values.g) } },
      });
    const original = fit((v) => v);
    const shuffled = fit((v) => order.map((i) => v[i]));
    original.coefficients.forEach((row, j) =>
      expect(shuffled.coefficients[j].stdError).toBeCloseTo(row.stdError, 12),
    );
  });

  it('uses a robust Wald F and G − 1 degrees of freedom for cluster intervals', () => {
    const fit = fitLinearModel({
      response: { name: 'y', values: [3, 1, 4, 1, 5, 9, 2, 6, 5, 3] },
      regressors: [{ name: 'x', values: [2, 7, 1, 8, 2, 8, 1, 8, 2, 8] }],
      standardErrors: {
        type: 'cluster',
        clusters: { name: 'g', values: [1, 1, 2, 2, 3, 3, 4, 4, 5, 5] },
      },
    });
    const slope = fit.coefficients[1];
    expect(fit.fTest).toBe('wald');
    expect(fit.fDf).toEqual([1, 4]);
    // With one restriction the Wald F is the squared t statistic (common practice identity).
    expect(fit.fStatistic!).toBeCloseTo(slope.tStatistic! ** 2, 10);
    // t(0.975, 4) = 2.7764451051977987 (stdlib; the tabled value is 2.776)
    expect((slope.ciHigh - slope.estimate) / slope.stdError).toBeCloseTo(2.7764451051977987, 10);
  });
});
