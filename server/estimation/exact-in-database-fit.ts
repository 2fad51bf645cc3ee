import { EstimationError } from '@shared/estimation/estimation-error';
import { exactLinearSolve } from '@shared/estimation/exact/exact-linear-solve';
import { fractionToNumber, gcd, Rational } from '@shared/estimation/exact/rational';
import type { LinearFit, StandardErrorSummary } from '@shared/estimation/least-squares/linear-fit';
import { INTERCEPT_TERM } from '@shared/estimation/least-squares/weighted-design';
import { scaledCondition } from './float-sums-conditioning';
import { inDatabaseFitReport } from './in-database-fit-report';
import type { InDatabaseModelSpec, SqlRunner } from './in-database-model-spec';
import { InputProblem } from './input-problem';
import type { ResolvedModel } from './model-source';
import { exactMeat, exactMoments } from './numeric-sums';

/** Significant digits of the coefficients sent back for the residuals: far past float64's 17. */
const COEFFICIENT_DIGITS = 60;

/**
 * The fit for designs whose float8 sums cannot carry 9 digits of every figure: the sums of
 * products are taken in PostgreSQL numeric, which adds and multiplies exactly, the normal
 * equations are solved exactly, and for robust errors a second numeric pass sums the meat
 * from residuals of the exact coefficients (to 60 digits). The sandwich is then formed
 * exactly, so coefficients, classical, HC1 and cluster errors are exact for the stored values
 * and rounded once. Slower than the float8 passes, so taken only when they fall short.
 */
export async function exactInDatabaseFit(
  tx: SqlRunner,
  model: ResolvedModel,
  spec: InDatabaseModelSpec,
  n: number,
): Promise<LinearFit> {
  const sums = await exactMoments(tx, model);
  const k = model.regressors.length;
  const columns = [...(model.intercept ? [0] : []), ...Array.from({ length: k }, (_, j) => j + 1)];
  const terms = [
    ...(model.intercept ? [INTERCEPT_TERM] : []),
    ...model.regressors.map((r) => r.name),
  ];
  const y = k + 1;
  const gram = columns.map((a) => columns.map((b) => sums[a][b]));
  const cross = columns.map((a) => sums[a][y]);
  const solved = exactLinearSolve(gram, cross, terms);
  const den = solved.denominator;
  const conditionNumber = Math.sqrt(
    scaledCondition(
      gram.map((row) => row.map((v) => v.toNumber())),
      solved.inverse.map((row) => row.map((v) => fractionToNumber(v, den))),
    ),
  );
  const beta = solved.solution.map((value) => Rational.of(value, den));
  const rss = beta.reduce((total, b, j) => total.sub(b.mul(cross[j])), sums[y][y]).toNumber();
  const tss = model.intercept
    ? sums[y][y].sub(sums[0][y].mul(sums[0][y]).div(sums[0][0])).toNumber()
    : sums[y][y].toNumber();
  const p = columns.length;
  const type = spec.standardErrors?.type ?? 'classical';
  let covariance: number[][];
  let summary: StandardErrorSummary;
  if (type === 'classical') {
    const s2 = rss / (n - p);
    covariance = solved.inverse.map((row) => row.map((v) => fractionToNumber(v, den) * s2));
    summary = { type: 'classical', smallSampleFactor: 1, df: n - p };
  } else {
    const coefficients = solved.solution.map((value) => decimalString(value, den));
    const { meat, clusters, missingCluster } = await exactMeat(tx, model, coefficients);
    if (missingCluster) throw new InputProblem('a cluster label is NULL');
    if (clusters !== null && clusters < 2) {
      throw new EstimationError(
        'too-few-clusters',
        `cluster-robust standard errors need at least 2 clusters; column ` +
          `${model.cluster!.column} has ${clusters}`,
        model.cluster!.column,
      );
    }
    const factor =
      clusters === null ? n / (n - p) : (clusters / (clusters - 1)) * ((n - 1) / (n - p));
    covariance = sandwich(solved.inverse, den, meat).map((row) => row.map((v) => v * factor));
    summary =
      clusters === null
        ? { type: 'hc1', smallSampleFactor: factor, df: n - p }
        : {
            type: 'cluster',
            smallSampleFactor: factor,
            df: clusters - 1,
            clusterColumn: model.cluster!.column,
            clusters,
          };
  }
  const fit = inDatabaseFitReport({
    terms,
    response: model.response.name,
    n,
    intercept: model.intercept,
    weighted: model.weights !== null,
    estimates: solved.solution.map((value) => fractionToNumber(value, den)),
    covariance,
    summary,
    residualSumOfSquares: rss,
    totalSumOfSquares: tss,
    conditionNumber,
    confidenceLevel: spec.confidenceLevel ?? 0.95,
  });
  return {
    ...fit,
    assumptions: fit.assumptions.map((note) =>
      note.startsWith('in-database fit')
        ? 'in-database fit: the design is too ill-conditioned for float8 sums, so PostgreSQL ' +
          'summed the products in exact numeric arithmetic and they were solved exactly; the ' +
          'rows never left the database'
        : note,
    ),
  };
}

/** (I/d)·M·(I/d) for the exact inverse I/d and the exact meat M, each entry rounded once. */
function sandwich(inverse: bigint[][], den: bigint, meat: Rational[][]): number[][] {
  const common = meat.flat().reduce((l, v) => (l / gcd(l, v.den)) * v.den, 1n);
  const m = meat.map((row) => row.map((v) => v.num * (common / v.den)));
  const left = inverse.map((row) =>
    m[0].map((_, b) => row.reduce((sum, value, c) => sum + value * m[c][b], 0n)),
  );
  const scale = den * den * common;
  return left.map((row) =>
    inverse.map((other) =>
      fractionToNumber(
        row.reduce((sum, value, c) => sum + value * other[c], 0n),
        scale,
      ),
    ),
  );
}

/** num/den as a decimal string of COEFFICIENT_DIGITS significant digits (for SQL numeric). */
function decimalString(num: bigint, den: bigint): string {
  const negative = num < 0n !== den < 0n;
  const n = num < 0n ? -num : num;
  const d = den < 0n ? -den : den;
  if (n === 0n) return '0';
  const shift = COEFFICIENT_DIGITS - (n.toString().length - d.toString().length);
  const scaled = shift >= 0 ? (n * 10n ** BigInt(shift)) / d : n / (d * 10n ** BigInt(-shift));
  return `${negative ? '-' : ''}${scaled}e${-shift}`;
}
