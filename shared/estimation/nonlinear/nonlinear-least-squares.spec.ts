import { readFileSync } from 'node:fs';
import { EstimationError } from '../estimation-error';
import { fitNonlinearLeastSquares, type NonlinearModel } from './nonlinear-least-squares';
import { refusalOf } from '../../../tests/support/estimation-refusal';

interface NistNonlinearSet {
  name: string;
  x: number[];
  y: number[];
  start1: number[];
  start2: number[];
  certified: {
    parameters: number[];
    standardErrors: number[];
    residualSumOfSquares: number;
    residualSD: number;
  };
}

const loadSet = (name: string): NistNonlinearSet =>
  JSON.parse(
    readFileSync(new URL(`../../../tests/fixtures/strd-nls/${name}.json`, import.meta.url), 'utf8'),
  ) as NistNonlinearSet;

/** y = b1 / (1 + exp(b2 − b3·x)), the model of NIST Rat42. */
const rat42Model: NonlinearModel = {
  parameterNames: ['b1', 'b2', 'b3'],
  value: ([b1, b2, b3], x) => b1 / (1 + Math.exp(b2 - b3 * x)),
  gradient: ([b1, b2, b3], x) => {
    const e = Math.exp(b2 - b3 * x);
    const d = 1 + e;
    return [1 / d, (-b1 * e) / (d * d), (b1 * x * e) / (d * d)];
  },
};

/** y = b1·(1 − exp(−b2·x)), the model of NIST Misra1a. */
const misra1aModel: NonlinearModel = {
  parameterNames: ['b1', 'b2'],
  value: ([b1, b2], x) => b1 * (1 - Math.exp(-b2 * x)),
  gradient: ([b1, b2], x) => [1 - Math.exp(-b2 * x), b1 * x * Math.exp(-b2 * x)],
};

const relativeError = (est: number, cert: number): number => Math.abs(est - cert) / Math.abs(cert);

describe('fitNonlinearLeastSquares on NIST StRD nonlinear sets', () => {
  const cases = [
    { name: 'Rat42', model: rat42Model },
    { name: 'Misra1a', model: misra1aModel },
  ];
  for (const { name, model } of cases) {
    for (const startKey of ['start1', 'start2'] as const) {
      it(`matches the certified values of ${name} from ${startKey}`, () => {
        const set = loadSet(name);
        const fit = fitNonlinearLeastSquares({ model, x: set.x, y: set.y, start: set[startKey] });
        // Expected: NIST StRD Nonlinear Regression, certified values (11 digits).
        // Tolerance CHECKS.md §2: parameters 1e-6, SE 1e-6, RSS 1e-8 relative.
        fit.coefficients.forEach((row, j) => {
          expect(relativeError(row.estimate, set.certified.parameters[j])).toBeLessThan(1e-6);
          expect(relativeError(row.stdError, set.certified.standardErrors[j])).toBeLessThan(1e-6);
        });
        expect(relativeError(fit.rss, set.certified.residualSumOfSquares)).toBeLessThan(1e-8);
        expect(relativeError(fit.residualSD, set.certified.residualSD)).toBeLessThan(1e-8);
        expect(fit.n).toBe(set.x.length);
      });
    }
  }

  it('reaches the same solution with a central-difference Jacobian', () => {
    const set = loadSet('Rat42');
    const numeric: NonlinearModel = {
      parameterNames: rat42Model.parameterNames,
      value: rat42Model.value,
    };
    const fit = fitNonlinearLeastSquares({ model: numeric, x: set.x, y: set.y, start: set.start2 });
    // NIST StRD Rat42, certified values; looser because the Jacobian is approximate.
    fit.coefficients.forEach((row, j) =>
      expect(relativeError(row.estimate, set.certified.parameters[j])).toBeLessThan(1e-6),
    );
  });
});

describe('fitNonlinearLeastSquares refusals', () => {
  it('refuses more parameters than observations', () => {
    expect(
      refusalOf(() =>
        fitNonlinearLeastSquares({
          model: rat42Model,
          x: [1, 2, 3],
          y: [1, 2, 3],
          start: [1, 1, 1],
        }),
      ),
    ).toMatchObject({ code: 'too-few-observations', field: 'y' });
  });

  it('refuses a NaN in y and names the position', () => {
    const fit = () =>
      fitNonlinearLeastSquares({
        model: misra1aModel,
        x: [1, 2, 3, 4],
        y: [1, NaN, 3, 4],
        start: [1, 1],
      });
    expect(fit).toThrow(EstimationError);
    expect(refusalOf(fit)).toMatchObject({ code: 'invalid-value', field: 'y' });
  });

  it('refuses a start vector of the wrong length', () => {
    expect(
      refusalOf(() =>
        fitNonlinearLeastSquares({ model: misra1aModel, x: [1, 2, 3], y: [1, 2, 3], start: [1] }),
      ),
    ).toMatchObject({ code: 'invalid-value', field: 'start' });
  });

  it('says not-converged when the iteration budget is too small', () => {
    const set = loadSet('Rat42');
    expect(
      refusalOf(() =>
        fitNonlinearLeastSquares({
          model: rat42Model,
          x: set.x,
          y: set.y,
          start: set.start1,
          maxIterations: 2,
        }),
      ),
    ).toMatchObject({ code: 'not-converged' });
  });
});
