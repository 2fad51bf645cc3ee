import {
  loadStrdSet,
  logRelativeError,
  STRD_SET_NAMES,
  strdRegressors,
} from '../../../tests/fixtures/strd/load-strd-set';
import { EstimationError } from '../estimation-error';
import { fitLinearModel } from './fit-linear-model';

// Expected values: NIST StRD linear least squares, certified values (published, 15 digits),
// copied to tests/fixtures/strd. Bar: at least 9 matching significant digits (LRE ≥ 9).
const REQUIRED_DIGITS = 9;
const accepted = STRD_SET_NAMES.filter((name) => name !== 'Filip');
const reached: Record<string, Record<string, string>> = {};

function fitSet(name: string) {
  const set = loadStrdSet(name);
  const fit = fitLinearModel({
    response: { name: 'y', values: set.y },
    regressors: strdRegressors(set),
    intercept: set.intercept,
  });
  return { set, fit };
}

const worst = (digits: number[]): number => Math.min(...digits);

describe('fitLinearModel on the NIST StRD linear sets', () => {
  afterAll(() => {
    // The digits reached, for the record (LRE = matching significant digits, capped at 15).
    console.log(
      `LRE per NIST StRD set (min over parameters):\n${JSON.stringify(reached, null, 1)}`,
    );
  });

  it.each(accepted)('matches the certified coefficients and standard errors of %s', (name) => {
    const { set, fit } = fitSet(name);
    const beta = worst(
      set.certified.coefficients.map((c, j) => logRelativeError(fit.coefficients[j].estimate, c)),
    );
    const se = worst(
      set.certified.standardErrors.map((c, j) => logRelativeError(fit.coefficients[j].stdError, c)),
    );
    reached[name] = { beta: beta.toFixed(1), se: se.toFixed(1) };
    expect(fit.coefficients).toHaveLength(set.parameters);
    expect(beta).toBeGreaterThanOrEqual(REQUIRED_DIGITS); // NIST StRD certified coefficients
    expect(se).toBeGreaterThanOrEqual(REQUIRED_DIGITS); // NIST StRD certified standard errors
  });

  it.each(accepted)('matches the certified residual SD, R² and F of %s', (name) => {
    const { set, fit } = fitSet(name);
    const rsd = logRelativeError(fit.residualSD, set.certified.residualSD);
    const r2 = logRelativeError(fit.rSquared, set.certified.rSquared);
    Object.assign((reached[name] ??= {}), { residualSD: rsd.toFixed(1), rSquared: r2.toFixed(1) });
    expect(rsd).toBeGreaterThanOrEqual(REQUIRED_DIGITS); // NIST StRD certified residual SD
    expect(r2).toBeGreaterThanOrEqual(REQUIRED_DIGITS); // NIST StRD certified R² (uncentred for NoInt)
    if (set.certified.anova && fit.fStatistic !== null) {
      // NIST StRD certified ANOVA F
      expect(logRelativeError(fit.fStatistic, set.certified.anova.F)).toBeGreaterThanOrEqual(
        REQUIRED_DIGITS,
      );
    }
  });

  it('reports an uncentred R² without an intercept (NoInt1, NIST certified 0.999365492298663)', () => {
    const { fit } = fitSet('NoInt1');
    expect(fit.rSquaredKind).toBe('uncentred');
    expect(fit.rSquared).toBeCloseTo(0.999365492298663, 14);
  });

  it('gives standard errors of zero on the exact fit of Wampler1 (certified 0)', () => {
    const { fit } = fitSet('Wampler1');
    for (const row of fit.coefficients) expect(Math.abs(row.stdError)).toBeLessThan(1e-9);
    expect(fit.residualSD).toBeLessThan(1e-9);
  });

  it('refuses Filip as ill-conditioned rather than returning digits it cannot trust', () => {
    // NIST StRD Filip: x^1..x^10 built in float64 carry too little information (scaled condition
    // number ≈ 5e9); a float64 QR reaches only 7–8 digits (CHECKS.md §1).
    let error: unknown;
    try {
      fitSet('Filip');
    } catch (caught) {
      error = caught;
    }
    expect(error).toBeInstanceOf(EstimationError);
    expect((error as EstimationError).code).toBe('ill-conditioned');
    expect((error as EstimationError).message).toMatch(/condition number 5\.\d+e\+9/);
    reached['Filip'] = {
      result: "refused: EstimationError 'ill-conditioned' (scaled condition number ≈ 5.5e9)",
    };
  });
});
