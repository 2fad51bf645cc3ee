import { linearDescription, zeroCovariance } from '../testing/linear-description';
import { curveEnsemble } from '@shared/analysis/curve-ensemble';
import { curveFigures, type FigureOutcome } from './curve-figures';
import { estimateOnEnsemble, type EstimatedFigure } from '@shared/analysis/estimated-figure';
import { FigureFormat } from './figure-format';
import { choleskyFactor, normalParameterDraws } from '@shared/analysis/parameter-draws';

const value = (outcome: FigureOutcome | null): EstimatedFigure => {
  if (!outcome?.ok) throw new Error('expected a figure');
  return outcome.figure;
};

describe('curveFigures on Q = 100 − 2P (CHECKS.md §8, textbook)', () => {
  const figures = curveFigures(curveEnsemble(linearDescription(), 0.95), 20, 10);

  it('gives quantity 60, elasticity −2/3 and consumer surplus 900 at P = 20', () => {
    expect(value(figures.quantityAtPrice).estimate).toBeCloseTo(60, 10);
    expect(value(figures.elasticityAtPrice).estimate).toBeCloseTo(-2 / 3, 10);
    expect(value(figures.consumerSurplusAtPrice).estimate).toBeCloseTo(900, 8); // ½ · 30 · 60
  });

  it('puts revenue at its maximum at 25 and profit, for a unit cost of 10, at 30', () => {
    expect(value(figures.revenueMaxPrice).estimate).toBeCloseTo(25, 8); // a/2b
    expect(value(figures.profitMaxPrice).estimate).toBeCloseTo(30, 8); // (a/b + c)/2
  });

  it('brackets each estimate with a simulation interval', () => {
    for (const outcome of [figures.elasticityAtPrice, figures.revenueMaxPrice]) {
      const f = value(outcome);
      expect(f.low!).toBeLessThan(f.estimate);
      expect(f.high!).toBeGreaterThan(f.estimate);
    }
  });

  it('asks nothing at a price that is not given, and no profit price without a cost', () => {
    const bare = curveFigures(curveEnsemble(linearDescription(), 0.95), null, null);
    expect(bare.elasticityAtPrice).toBeNull();
    expect(bare.profitMaxPrice).toBeNull();
  });

  it('says why a log-log curve has no revenue maximum', () => {
    const loglog = { ...linearDescription(), kind: 'loglog' as const, priceCoefficient: -1.4 };
    const outcome = curveFigures(curveEnsemble(loglog, 0.95), 2, null).revenueMaxPrice;
    expect(outcome).toMatchObject({ ok: false });
    if (!outcome.ok)
      expect(outcome.message).toMatch(
        /^No best price inside the curve's price range: demand is elastic .*Q = \S+·P\^−1\.4\)\.$/,
      );
    expect(
      value(curveFigures(curveEnsemble(loglog, 0.95), 2, null).elasticityAtPrice).estimate,
    ).toBe(-1.4);
  });
});

describe('simulation intervals', () => {
  it('draws parameters whose mean and covariance match the fit’s (common practice)', () => {
    const draws = normalParameterDraws(
      [100, -2],
      [
        [4, -0.15],
        [-0.15, 0.01],
      ],
      20000,
      7,
    );
    const mean = [0, 1].map((j) => draws.reduce((s, d) => s + d[j], 0) / draws.length);
    const cov01 = draws.reduce((s, d) => s + (d[0] - mean[0]) * (d[1] - mean[1]), 0) / draws.length;
    expect(Math.abs(mean[0] - 100)).toBeLessThan(0.05);
    expect(Math.abs(mean[1] + 2)).toBeLessThan(0.005);
    expect(Math.abs(cov01 + 0.15)).toBeLessThan(0.01);
  });

  it('factors a covariance so that L·Lᵀ gives it back, and tolerates a fixed parameter', () => {
    const l = choleskyFactor([
      [4, 2],
      [2, 5],
    ]);
    expect(l).toEqual([
      [2, 0],
      [1, 2],
    ]); // by hand
    expect(choleskyFactor(zeroCovariance)).toEqual(zeroCovariance);
  });

  it('withholds the interval when most simulated curves give no value', () => {
    const ensemble = curveEnsemble(linearDescription(), 0.95);
    let calls = 0;
    const figure = estimateOnEnsemble(ensemble, (c) => {
      calls += 1;
      if (calls > 1 && calls % 3 !== 0) throw new Error('no value');
      return c.quantity(20);
    });
    expect(figure.low).toBeNull();
    expect(figure.note).toMatch(/too few simulated curves/);
  });

  it('writes a figure with its interval in the study’s currency', () => {
    const format = new FigureFormat('USD', 'en-US');
    expect(format.figure({ estimate: 25, low: 24.5, high: 25.75, note: null }, 'price', 0.95)).toBe(
      '$25 (95 % interval $24.50 to $25.75)',
    );
    expect(format.value(-2 / 3, 'elasticity')).toBe('\u22120.67');
  });
});
