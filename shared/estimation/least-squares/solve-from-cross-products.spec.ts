import {
  loadStrdSet,
  logRelativeError,
  STRD_SET_NAMES,
  strdRegressors,
  type StrdSet,
} from '../../../tests/fixtures/strd/load-strd-set';
import { Rational } from '../exact/rational';
import { mulberry32 } from '../random/mulberry32';
import { compensatedDot } from './compensated-dot';
import { fitLinearModel } from './fit-linear-model';
import { solveFromCrossProducts } from './solve-from-cross-products';
import { refusalOf } from '../../../tests/support/estimation-refusal';

/** An exact terminating decimal for a rational whose denominator is 2^a·5^b. */
function decimalString(value: Rational): string {
  let digits = 0n;
  let rest = value.den;
  while (rest % 10n === 0n || rest % 2n === 0n || rest % 5n === 0n) {
    rest /= rest % 10n === 0n ? 10n : rest % 2n === 0n ? 2n : 5n;
    digits++;
  }
  const scaled = (value.num * 10n ** digits) / value.den;
  const sign = scaled < 0n ? '-' : '';
  const text = (scaled < 0n ? -scaled : scaled).toString().padStart(Number(digits) + 1, '0');
  return `${sign}${text.slice(0, text.length - Number(digits))}.${text.slice(text.length - Number(digits))}0`;
}

/**
 * The raw sums Σzzᵀ over z = [1?, x…, y] computed exactly from the published decimal data, as
 * PostgreSQL `numeric` aggregates would return them (decimal strings). Polynomial columns are
 * powers of the exact decimal x, as SQL would compute them in numeric.
 */
function exactDecimalSums(set: StrdSet): string[][] {
  const exact = (v: number): Rational => Rational.fromDecimal(String(v));
  const regressors = set.X
    ? set.X[0].map((_, j) => set.X!.map((row) => exact(row[j])))
    : strdRegressors(set).map((_, j) =>
        set.x!.map((x) => {
          let power = Rational.ONE;
          for (let m = 0; m <= j; m++) power = power.mul(exact(x));
          return power;
        }),
      );
  const columns = [
    ...(set.intercept ? [set.y.map(() => Rational.ONE)] : []),
    ...regressors,
    set.y.map(exact),
  ];
  return columns.map((a) =>
    columns.map((b) => decimalString(a.reduce((sum, v, i) => sum.add(v.mul(b[i])), Rational.ZERO))),
  );
}

/** Centred sums rounded once to float64, with float64 means (a careful two-pass float8 query). */
function centredFloatSums(set: StrdSet): { crossProducts: number[][]; means: number[] } {
  const columns = [...strdRegressors(set).map((c) => c.values), set.y].map((c) =>
    c.map(Rational.fromNumber),
  );
  const n = Rational.of(BigInt(set.n));
  const means = columns.map((c) => c.reduce((s, v) => s.add(v), Rational.ZERO).div(n));
  const crossProducts = columns.map((a, i) =>
    columns.map((b, j) =>
      a
        .reduce((s, v, r) => s.add(v.sub(means[i]).mul(b[r].sub(means[j]))), Rational.ZERO)
        .toNumber(),
    ),
  );
  return { crossProducts, means: means.map((m) => m.toNumber()) };
}

const names = (set: StrdSet): string[] => strdRegressors(set).map((c) => c.name);
const reached: Record<string, string> = {};

describe('solveFromCrossProducts', () => {
  afterAll(() =>
    console.log(`LRE per NIST set from exact decimal sums:\n${JSON.stringify(reached, null, 1)}`),
  );

  it.each([...STRD_SET_NAMES])(
    'reproduces NIST %s from exact decimal sums (certified values)',
    (name) => {
      const set = loadStrdSet(name);
      const fit = solveFromCrossProducts({
        regressorNames: names(set),
        responseName: 'y',
        n: set.n,
        crossProducts: exactDecimalSums(set),
        intercept: set.intercept,
      });
      const c = set.certified;
      const digits = {
        beta: Math.min(
          ...c.coefficients.map((v, j) => logRelativeError(fit.coefficients[j].estimate, v)),
        ),
        se: Math.min(
          ...c.standardErrors.map((v, j) => logRelativeError(fit.coefficients[j].stdError, v)),
        ),
        rsd: logRelativeError(fit.residualSD, c.residualSD),
        r2: logRelativeError(fit.rSquared, c.rSquared),
      };
      reached[name] = Object.entries(digits)
        .map(([k, v]) => `${k} ${v.toFixed(1)}`)
        .join(', ');
      // NIST StRD certified values (published); exact sums make even Filip solvable.
      for (const value of Object.values(digits)) expect(value).toBeGreaterThanOrEqual(9);
    },
    20_000,
  );

  it.each(['Norris', 'Longley'])(
    'reaches 9 digits on %s from centred float64 sums with means',
    (name) => {
      const set = loadStrdSet(name);
      const fit = solveFromCrossProducts({
        regressorNames: names(set),
        responseName: 'y',
        n: set.n,
        ...centredFloatSums(set),
      });
      const c = set.certified;
      // NIST StRD certified coefficients and standard errors (published)
      c.coefficients.forEach((v, j) =>
        expect(logRelativeError(fit.coefficients[j].estimate, v)).toBeGreaterThanOrEqual(9),
      );
      c.standardErrors.forEach((v, j) =>
        expect(logRelativeError(fit.coefficients[j].stdError, v)).toBeGreaterThanOrEqual(9),
      );
    },
  );

  it.each([3, 30])(
    'agrees with fitLinearModel on random data with %i regressors (same estimator)',
    (k) => {
      const next = mulberry32(k);
      const n = 400;
      const regressors = Array.from({ length: k }, (_, j) => ({
        name: `x${j}`,
        values: Array.from({ length: n }, () => next() * (j + 1)),
      }));
      const slope = (j: number): number => (0.2 * (j - k / 2)) / k;
      const y = Array.from(
        { length: n },
        (_, i) => regressors.reduce((s, c, j) => s + slope(j) * c.values[i], 3) + next() - 0.5,
      );
      // Sums rounded once (double-double accumulation), as a careful float8 aggregate returns them.
      const all = [Array<number>(n).fill(1), ...regressors.map((c) => c.values), y];
      const crossProducts = all.map((a) => all.map((b) => compensatedDot(a, b)));
      const viaSums = solveFromCrossProducts({
        regressorNames: regressors.map((c) => c.name),
        responseName: 'y',
        n,
        crossProducts,
      });
      const direct = fitLinearModel({ response: { name: 'y', values: y }, regressors });
      viaSums.coefficients.forEach((row, j) => {
        expect(row.term).toBe(direct.coefficients[j].term);
        expect(Math.abs(row.estimate - direct.coefficients[j].estimate)).toBeLessThan(
          1e-9 * (1 + Math.abs(row.estimate)),
        );
        expect(Math.abs(row.stdError / direct.coefficients[j].stdError - 1)).toBeLessThan(1e-9);
      });
      expect(viaSums.rSquared).toBeCloseTo(direct.rSquared, 12);
      expect(Math.abs(viaSums.fStatistic! / direct.fStatistic! - 1)).toBeLessThan(1e-9);
      expect(viaSums.assumptions[0]).toContain(k <= 24 ? 'exactly' : 'in float64');
    },
  );

  it('refuses float64 sums of the Filip polynomial as ill-conditioned', () => {
    const set = loadStrdSet('Filip');
    const exactSums = exactDecimalSums(set).map((row) => row.map(Number));
    expect(
      refusalOf(() =>
        solveFromCrossProducts({
          regressorNames: names(set),
          responseName: 'y',
          n: set.n,
          crossProducts: exactSums,
        }),
      ),
    ).toMatchObject({ code: 'ill-conditioned' });
  });

  it('names a regressor that duplicates another', () => {
    // x = [1, 2, 3, 4] twice, y = [2, 3, 5, 4]: n, Σx, Σx², Σy, Σxy, Σy² by hand.
    const sums = [
      [4, 10, 10, 14],
      [10, 30, 30, 39],
      [10, 30, 30, 39],
      [14, 39, 39, 54],
    ];
    expect(
      refusalOf(() =>
        solveFromCrossProducts({
          regressorNames: ['price', 'price_copy'],
          responseName: 'q',
          n: 4,
          crossProducts: sums,
        }),
      ),
    ).toMatchObject({ code: 'singular-design', field: 'price_copy' });
  });

  it('refuses malformed sums with the field at fault', () => {
    const base = { regressorNames: ['x'], responseName: 'y', n: 3 };
    const good = [
      [3, 6, 9],
      [6, 14, 20],
      [9, 20, 29],
    ];
    expect(
      refusalOf(() =>
        solveFromCrossProducts({
          ...base,
          crossProducts: [
            [3, 6],
            [6, 14],
          ],
        }),
      ),
    ).toMatchObject({ code: 'invalid-value', field: 'crossProducts' });
    expect(
      refusalOf(() => solveFromCrossProducts({ ...base, n: 4, crossProducts: good })),
    ).toMatchObject({ code: 'invalid-value', field: 'crossProducts' });
    expect(
      refusalOf(() => solveFromCrossProducts({ ...base, n: 2, crossProducts: good })),
    ).toMatchObject({ code: 'too-few-observations', field: 'n' });
    expect(
      refusalOf(() =>
        solveFromCrossProducts({
          ...base,
          crossProducts: [
            ['3', '6', '9'],
            ['6', 'abc', '20'],
            ['9', '20', '29'],
          ],
        }),
      ),
    ).toMatchObject({ code: 'invalid-value', field: 'crossProducts' });
  });
});
