import { fitLinearModel } from './fit-linear-model';

describe('weighted least squares', () => {
  const x = [1, 2, 3, 4, 5, 6];
  const y = [2.1, 3.9, 6.2, 7.8, 10.1, 12.3];
  const w = [1, 3, 2, 1, 4, 2];

  it('equals ordinary least squares on rows repeated w times (integer weights, common practice)', () => {
    const weighted = fitLinearModel({
      response: { name: 'y', values: y },
      regressors: [{ name: 'x', values: x }],
      weights: { name: 'w', values: w },
    });
    const repeat = (values: number[]): number[] =>
      values.flatMap((v, i) => Array<number>(w[i]).fill(v));
    const repeated = fitLinearModel({
      response: { name: 'y', values: repeat(y) },
      regressors: [{ name: 'x', values: repeat(x) }],
    });
    weighted.coefficients.forEach((row, j) =>
      expect(row.estimate).toBeCloseTo(repeated.coefficients[j].estimate, 12),
    );
    expect(weighted.rSquared).toBeCloseTo(repeated.rSquared, 12);
    // Same weighted RSS; the residual df differ (n − k = 4 against Σw − k = 11).
    expect(weighted.residualSumOfSquares).toBeCloseTo(repeated.residualSumOfSquares, 12);
    expect(weighted.weighted).toBe(true);
    expect(weighted.n).toBe(6);
  });

  it('minimises Σwᵢeᵢ²: the weighted normal equations hold at the estimate', () => {
    const fit = fitLinearModel({
      response: { name: 'y', values: y },
      regressors: [{ name: 'x', values: x }],
      weights: { name: 'w', values: w },
    });
    const [a, b] = fit.coefficients.map((row) => row.estimate);
    const e = y.map((yi, i) => yi - a - b * x[i]);
    expect(e.reduce((s, ei, i) => s + w[i] * ei, 0)).toBeCloseTo(0, 12);
    expect(e.reduce((s, ei, i) => s + w[i] * ei * x[i], 0)).toBeCloseTo(0, 12);
  });
});
