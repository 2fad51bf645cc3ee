import {
  loadStrdSet,
  logRelativeError,
  STRD_SET_NAMES,
  strdRegressors,
} from '../../../tests/fixtures/strd/load-strd-set';
import { fitLinearModel } from './fit-linear-model';

// Expected values: NIST StRD linear least squares, certified values (published, 15 digits),
// copied to tests/fixtures/strd. Bar: at least 9 matching significant digits (LRE ≥ 9), and 7
// for Filip: its x, given to 10 digits, is stored as the nearest float64 and its powers x²…x¹⁰
// rounded again, and on a design this ill-conditioned (scaled condition number ≈ 5.5e9) those
// roundings alone move the exact least-squares fit of the stored data in the 8th digit.
const REQUIRED_DIGITS = 9;
const FILIP_DIGITS = 7;
const accepted = [...STRD_SET_NAMES];
const required = (name: string) => (name === 'Filip' ? FILIP_DIGITS : REQUIRED_DIGITS);
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
    expect(beta).toBeGreaterThanOrEqual(required(name)); // NIST StRD certified coefficients
    expect(se).toBeGreaterThanOrEqual(required(name)); // NIST StRD certified standard errors
  });

  it.each(accepted)('matches the certified residual SD, R² and F of %s', (name) => {
    const { set, fit } = fitSet(name);
    const rsd = logRelativeError(fit.residualSD, set.certified.residualSD);
    const r2 = logRelativeError(fit.rSquared, set.certified.rSquared);
    Object.assign((reached[name] ??= {}), { residualSD: rsd.toFixed(1), rSquared: r2.toFixed(1) });
    expect(rsd).toBeGreaterThanOrEqual(required(name)); // NIST StRD certified residual SD
    expect(r2).toBeGreaterThanOrEqual(required(name)); // NIST StRD certified R² (uncentred for NoInt)
    if (set.certified.anova && fit.fStatistic !== null) {
      // NIST StRD certified ANOVA F
      expect(logRelativeError(fit.fStatistic, set.certified.anova.F)).toBeGreaterThanOrEqual(
        required(name),
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

  it('fits Filip exactly from its stored float64 data instead of refusing it', () => {
    // NIST StRD Filip: scaled condition number ≈ 5.5e9, above the float64 QR's limit of 1e8;
    // the design is small, so the engine solves it in exact rational arithmetic.
    const { fit } = fitSet('Filip');
    expect(fit.conditionNumber).toBeGreaterThan(1e9);
    expect(fit.coefficients).toHaveLength(11);
  });
});
