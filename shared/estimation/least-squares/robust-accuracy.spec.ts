import {
  multiplePrecisionFit,
  type ReferenceFit,
  type ReferenceProblem,
} from '../../../tests/fixtures/near-collinear/multiple-precision-fit';
import {
  nearCollinearDesign,
  type NearCollinearDesign,
} from '../../../tests/fixtures/near-collinear/near-collinear-design';
import { logRelativeError } from '../../../tests/fixtures/strd/load-strd-set';
import { tQuantile } from '../distributions/student-t';
import type { StandardErrorSpec } from './coefficient-covariance';
import { fitInstrumentalModel } from './fit-instrumental-model';
import { fitLinearModel } from './fit-linear-model';
import { fixedEffectColumns } from './fixed-effect-columns';
import type { LinearFit } from './linear-fit';
import type { NamedColumn } from './named-column';

// Expected values: exact least squares computed in the test in 50-digit decimal arithmetic
// (decimal.js) from the same float64 data; see multiple-precision-fit.ts.
const REQUIRED_DIGITS = 9;
const ROWS = 240;
/**
 * Price gaps giving scaled condition numbers from about 1e2 and 3e3 (the float64 QR path) to
 * 2e6 and 1e7 (the exact path), asserted below for the designs without instruments.
 */
const CASES = [
  { seed: 41, gap: 0.05, condition: [30, 600] },
  { seed: 31, gap: 2e-3, condition: [500, 1e4] },
  { seed: 11, gap: 1.75e-6, condition: [1.5e6, 5e6] },
  { seed: 12, gap: 1.75e-6, condition: [1.5e6, 5e6] },
  { seed: 21, gap: 3.5e-7, condition: [8e6, 3e7] },
  { seed: 22, gap: 3.5e-7, condition: [8e6, 3e7] },
] as const;
const ESTIMATORS = ['least squares', 'weighted', 'fixed effects', 'two-stage'] as const;
type Estimator = (typeof ESTIMATORS)[number];
type ErrorType = 'classical' | 'hc1' | 'cluster';

const worst: Record<string, number> = {};

interface Model {
  readonly regressors: NamedColumn[];
  readonly weights: number[] | null;
  readonly instrumented: boolean;
}

function modelOf(design: NearCollinearDesign, estimator: Estimator): Model {
  const regressors: NamedColumn[] = [
    { name: 'ln p', values: design.lnPrice },
    { name: 'ln p2', values: design.lnOtherPrice },
    { name: 'ln income', values: design.lnIncome },
  ];
  if (estimator === 'fixed effects' || estimator === 'two-stage') {
    const regions = fixedEffectColumns({ name: 'region', values: design.regions }, design.n, true);
    regressors.push(...regions.columns);
  }
  return {
    regressors,
    weights: estimator === 'least squares' ? null : design.weights,
    instrumented: estimator === 'two-stage',
  };
}

function engineFit(design: NearCollinearDesign, model: Model, errors: ErrorType): LinearFit {
  const standardErrors: StandardErrorSpec =
    errors === 'cluster'
      ? { type: 'cluster', clusters: { name: 'market', values: design.markets } }
      : { type: errors };
  const response = { name: 'ln q', values: design.lnQty };
  const weights = model.weights ? { name: 'weight', values: model.weights } : undefined;
  if (!model.instrumented) {
    return fitLinearModel({ response, regressors: model.regressors, weights, standardErrors });
  }
  return fitInstrumentalModel({
    response,
    exogenous: model.regressors.slice(1),
    endogenous: model.regressors.slice(0, 1),
    instruments: [{ name: 'cost', values: design.cost }],
    weights,
    standardErrors,
  });
}

function referenceOf(design: NearCollinearDesign, model: Model): ReferenceFit {
  const ones = design.lnQty.map(() => 1);
  const values = model.regressors.map((c) => Array.from(c.values));
  // The engine orders a two-stage design exogenous first, endogenous last.
  const columns = model.instrumented ? [ones, ...values.slice(1), values[0]] : [ones, ...values];
  const problem: ReferenceProblem = {
    columns,
    y: design.lnQty,
    weights: model.weights,
    clusters: design.markets,
    instrumental: model.instrumented
      ? { columns: [ones, ...values.slice(1), design.cost], endogenous: [columns.length - 1] }
      : undefined,
  };
  return multiplePrecisionFit(problem);
}

function record(key: string, digits: number): void {
  worst[key] = Math.min(worst[key] ?? Infinity, digits);
}

describe('robust standard errors on near-collinear demand designs', () => {
  afterAll(() => {
    const rows = Object.entries(worst).map(
      ([key, digits]) => `${key.padEnd(44)} ${digits.toFixed(1)}`,
    );
    console.log(`worst matching digits over the cases (LRE, capped at 15):\n${rows.join('\n')}`);
  });

  describe.each(CASES)('seed $seed, price gap $gap', ({ seed, gap, condition }) => {
    const design = nearCollinearDesign(seed, ROWS, gap);

    it.each(ESTIMATORS)(
      '%s: coefficients, classical, HC1 and cluster errors to 9 digits',
      (estimator) => {
        const model = modelOf(design, estimator);
        const reference = referenceOf(design, model);
        const digits: number[] = [];
        for (const errors of ['classical', 'hc1', 'cluster'] as const) {
          const fit = engineFit(design, model, errors);
          if (estimator !== 'two-stage') {
            expect(fit.conditionNumber).toBeGreaterThan(condition[0]);
            expect(fit.conditionNumber).toBeLessThan(condition[1]);
          }
          const expected = errors === 'cluster' ? reference.cluster! : reference[errors];
          const t = tQuantile(0.975, fit.standardErrors.df);
          fit.coefficients.forEach((row, j) => {
            const estimate = logRelativeError(row.estimate, reference.estimates[j]);
            const se = logRelativeError(row.stdError, expected[j]);
            const high = logRelativeError(row.ciHigh, reference.estimates[j] + t * expected[j]);
            const low = logRelativeError(row.ciLow, reference.estimates[j] - t * expected[j]);
            record(`${estimator}: coefficients`, estimate);
            record(`${estimator}: ${errors} errors`, se);
            record(`${estimator}: ${errors} interval ends`, Math.min(high, low));
            digits.push(estimate, se, high, low);
          });
        }
        // Every coefficient, standard error and interval end against the 50-digit reference.
        expect(Math.min(...digits)).toBeGreaterThanOrEqual(REQUIRED_DIGITS);
      },
    );
  });
});
