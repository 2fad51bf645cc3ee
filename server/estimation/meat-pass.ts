import { sql, type SQL } from 'drizzle-orm';
import { EstimationError } from '@shared/estimation/estimation-error';
import { InputProblem } from './input-problem';
import type { SqlRunner } from './in-database-model-spec';
import type { ResolvedModel } from './model-source';
import { readSymmetricSums, symmetricSumsSelect } from './symmetric-sums';

/** What the second pass needs from the first: the fitted line in the shifted coordinates. */
export interface MeatInput {
  /** Origin of each term (regressors, then the response); zeros without an intercept. */
  readonly origin: readonly number[];
  /** Intercept (0 without one) and slopes of v = a + Σ bⱼuⱼ in those coordinates. */
  readonly intercept: number;
  readonly slopes: readonly number[];
}

/** Σ sₐs_b over rows (HC1) or over cluster score totals (cluster-robust). */
export interface Meat {
  readonly matrix: number[][];
  /** Number of clusters, for cluster-robust errors. */
  readonly clusters: number | null;
}

/**
 * The second pass: the residual e = v − a − Σ bⱼuⱼ is computed in SQL from the first pass's
 * coefficients, and the meat of the sandwich is summed where the rows are — the scores
 * s = w·e·z (z = [1, u…], w = 1 unweighted) per row for HC1, or first totalled per cluster
 * (GROUP BY) and then multiplied out for cluster-robust errors. Only sums leave the database.
 * `rows` is the first pass's row count: the fit session reads one snapshot, and the first pass
 * refused any NULL, so these aggregates see the same rows.
 */
export async function meatPass(
  runner: SqlRunner,
  model: ResolvedModel,
  input: MeatInput,
  rows: number,
): Promise<Meat> {
  const scores = scoreRows(model, input);
  const p = model.regressors.length + (model.intercept ? 1 : 0);
  const refs = Array.from({ length: p }, (_, a) => sql.raw(`s${a}`));
  if (!model.cluster) {
    const row = (await runner.execute(sql`SELECT ${symmetricSumsSelect(refs)} FROM ${scores}`))
      .rows[0];
    return { matrix: meatMatrix(row, p, rows), clusters: null };
  }
  const totals = refs.map((s) => sql`sum(${s}) AS ${s}`);
  const row = (
    await runner.execute(sql`SELECT count(*) AS groups, bool_or(missing) AS missing,
      ${symmetricSumsSelect(refs)}
      FROM (SELECT g IS NULL AS missing, ${sql.join(totals, sql`, `)}
            FROM ${scores} GROUP BY g) AS clusters`)
  ).rows[0];
  if (row['missing'] === true) throw new InputProblem('a cluster label is NULL');
  const clusters = Number(row['groups']);
  if (clusters < 2) {
    throw new EstimationError(
      'too-few-clusters',
      `cluster-robust standard errors need at least 2 clusters; column ` +
        `${model.cluster.column} has ${clusters}`,
      model.cluster.column,
    );
  }
  return { matrix: meatMatrix(row, p, clusters), clusters };
}

/**
 * One fenced level (see momentPass) holding, per row, the shifted regressors u and the residual
 * e = y − a′ − Σ bⱼxⱼ with the shifts folded into a′ = a + d − Σ bⱼcⱼ (half the arithmetic of
 * shifting every term again; e keeps its digits, as its terms are of the size of y), beside the
 * columns the scores need (w, the cluster id g).
 */
function residualRows(model: ResolvedModel, input: MeatInput): SQL {
  const k = model.regressors.length;
  const shifted = model.regressors.map(
    (t, j) => sql`${t.value} - ${input.origin[j]}::float8 AS ${sql.raw(`u${j}`)}`,
  );
  const folded = input.slopes.reduce(
    (a, b, j) => a - b * input.origin[j],
    input.intercept + input.origin[k],
  );
  const fitted = model.regressors.map((t, j) => sql` - ${input.slopes[j]}::float8 * ${t.value}`);
  const residual = sql`${model.response.value} - ${folded}::float8${sql.join(fitted)} AS e`;
  const extra = [
    ...(model.weights ? [sql`${model.weights.value} AS w`] : []),
    ...(model.cluster ? [sql`${model.cluster.value} AS g`] : []),
  ];
  return sql`(SELECT ${sql.join([residual, ...shifted, ...extra], sql`, `)}
    FROM ${model.from} OFFSET NULL) AS residuals`;
}

/** A second level: the scores sₐ = w·e·zₐ with z = [1, u…] (w = 1 unweighted). */
function scoreRows(model: ResolvedModel, input: MeatInput): SQL {
  const score = model.weights ? sql`w * e` : sql`e`;
  const regressors = Array.from({ length: model.regressors.length }, (_, j) => sql.raw(`u${j}`));
  const design = [
    ...(model.intercept ? [score] : []),
    ...regressors.map((u) => sql`${score} * ${u}`),
  ];
  const named = design.map((s, a) => sql`${s} AS ${sql.raw(`s${a}`)}`);
  const carried = model.cluster ? [sql.raw('g')] : [];
  return sql`(SELECT ${sql.join([...named, ...carried], sql`, `)}
    FROM ${residualRows(model, input)} OFFSET NULL) AS scores`;
}

/**
 * Σwᵢeᵢ² computed from the residuals themselves: when R² is within 1e-3 of 1 the one-pass
 * RSS = Syy − bᵀSxy has lost that many digits to cancellation (NIST's Norris: SE to 10 digits
 * instead of 14), and this pass restores them.
 */
export async function residualSquares(
  runner: SqlRunner,
  model: ResolvedModel,
  input: MeatInput,
): Promise<number> {
  const square = model.weights ? sql`w * e * e` : sql`e * e`;
  const row = (
    await runner.execute(sql`SELECT sum(${square}) AS rss FROM ${residualRows(model, input)}`)
  ).rows[0];
  return Number(row['rss']);
}

function meatMatrix(row: Record<string, unknown>, p: number, rows: number): number[][] {
  const sums = readSymmetricSums(row, p, rows);
  if (!sums) throw new InputProblem('a score sum is not finite');
  return sums.products.map((r) => r.map((v) => v.toNumber()));
}
