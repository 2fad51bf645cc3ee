import { sql, type SQL } from 'drizzle-orm';
import { EstimationError } from '@shared/estimation/estimation-error';
import { Rational } from '@shared/estimation/exact/rational';
import { InputProblem } from './input-problem';
import type { SqlRunner } from './in-database-model-spec';
import type { ModelVariable, ResolvedModel } from './model-source';
import { readSymmetricSums, symmetricSumsSelect, type SymmetricSums } from './symmetric-sums';

/** Rows read to choose the shifts: enough for a mean within a few percent of an SD. */
const SHIFT_SAMPLE_ROWS = 1000;

/** The sums of the first pass, exact, about a shift near each column's mean. */
export interface ShiftedSums {
  readonly n: number;
  /** The origin of each variable: regressors in order, then the response. */
  readonly shifts: readonly number[];
  /**
   * Σ z·zᵀ over z = [1, v₀ … v_k] with v = t − shift (each row times its weight when weighted),
   * so entry [0][0] is n, or Σw.
   */
  readonly products: Rational[][];
  readonly weighted: boolean;
}

/** The model's terms in fit order: regressors, then the response. */
function modelTerms(model: ResolvedModel): readonly ModelVariable[] {
  return [...model.regressors, model.response];
}

/**
 * The first pass: every sum the normal equations need, in ONE aggregate query. Products of
 * centred values lose no digits to cancellation, so each column is shifted by the mean of its
 * first rows (a cheap query) — near enough to the mean that Σ(x − c)(y − d) is as accurate as a
 * centred sum. Refuses an empty source with 'too-few-observations'; throws InputProblem when a
 * NULL, non-finite or non-positive weight reached the sums.
 */
export async function momentPass(runner: SqlRunner, model: ResolvedModel): Promise<ShiftedSums> {
  const shifts = await sampleMeans(runner, model);
  const terms = modelTerms(model);
  const shifted = terms.map((t, j) => sql`(${t.value} - ${shifts[j]}::float8)`);
  const weights = model.weights?.value;
  const atSource = model.aggregateAtSource;
  // At the source every aggregate carries its own expressions (a foreign server can compute
  // them); otherwise they read the columns of the fenced subquery below.
  const refs = atSource ? shifted : terms.map((_, j) => sql.raw(`v${j}`));
  const w = atSource && weights ? sql`(${weights})` : sql.raw('w');
  const r = atSource && weights ? sql`sqrt(${weights})` : sql.raw('r');
  const variables: SQL[] = weights ? [r, ...refs.map((v) => sql`${r} * ${v}`)] : refs;
  const weightColumns = weights ? [sql`${weights} AS w`, sql`sqrt(${weights}) AS r`] : [];
  // The paired aggregates skip a row with a NULL; this count finds one. IS NULL tests are
  // evaluated inline, and the count's transition runs only for such a row.
  const missing = [...refs, ...(weights ? [w] : [])].map((v) => sql`${v} IS NULL`);
  // OFFSET NULL keeps the subquery from being merged into the aggregates (each shifted value is
  // computed once per row, not once per sum) while leaving the scan free to run in parallel.
  const columns = [...weightColumns, ...shifted.map((v, j) => sql`${v} AS ${sql.raw(`v${j}`)}`)];
  const sumsOver = (source: SQL) => sql`SELECT count(*) AS rows,
    count(*) FILTER (WHERE ${sql.join(missing, sql` OR `)}) AS incomplete,
    ${weights ? sql`min(${w}) AS wmin, ` : sql``}
    ${symmetricSumsSelect(variables)}
    FROM ${source}`;
  let n = 0;
  let total: SymmetricSums | null = null;
  const sources = atSource
    ? await leafSources(runner, model)
    : [sql`(SELECT ${sql.join(columns, sql`, `)} FROM ${model.from} OFFSET NULL) AS shifted`];
  for (const source of sources) {
    const row = (await runner.execute(sumsOver(source))).rows[0];
    const rows = Number(row['rows']);
    if (rows === 0) continue;
    const sums = readSymmetricSums(row, variables.length, rows);
    if (!sums || Number(row['incomplete']) > 0 || (weights && !(Number(row['wmin']) > 0))) {
      throw new InputProblem('a NULL, non-finite or non-positive value reached the sums');
    }
    n += rows;
    total = total ? addSums(total, sums) : sums;
  }
  if (!total) throw new InputProblem('the source had no rows when the sums were taken');
  const products = weights ? total.products : withConstant(n, total.linear, total.products);
  return { n, shifts, products, weighted: weights !== undefined };
}

/**
 * The FROM items the sums run over at the source: each leaf partition of a partitioned table on
 * its own (a partition on another server then computes its own sums, which PostgreSQL does not
 * push down through the parent), or the source itself. Raw sums add exactly (as rationals).
 */
async function leafSources(runner: SqlRunner, model: ResolvedModel): Promise<SQL[]> {
  if (model.table === null) return [model.from];
  const leaves = await runner.execute(sql`SELECT relid::regclass::text AS name
    FROM pg_partition_tree(${model.table}::regclass) WHERE isleaf ORDER BY relid`);
  // A table that is not partitioned has no partition tree: it is its own one source.
  if (leaves.rows.length === 0) return [model.from];
  // regclass output is the catalog's own quoted, qualified name: safe to splice.
  return leaves.rows.map((row) => sql`${sql.raw(String(row['name']))} AS src`);
}

function addSums(a: SymmetricSums, b: SymmetricSums): SymmetricSums {
  return {
    linear: a.linear.map((v, i) => v.add(b.linear[i])),
    products: a.products.map((row, i) => row.map((v, j) => v.add(b.products[i][j]))),
  };
}

async function sampleMeans(runner: SqlRunner, model: ResolvedModel): Promise<number[]> {
  const terms = modelTerms(model);
  const columns = terms.map((t, j) => sql`${t.value} AS ${sql.raw(`t${j}`)}`);
  const means = terms.map((_, j) => sql.raw(`avg(t${j}) AS a${j}`));
  const row = (
    await runner.execute(sql`SELECT count(*) AS rows, ${sql.join(means, sql`, `)}
      FROM (SELECT ${sql.join(columns, sql`, `)} FROM ${model.from}
            LIMIT ${SHIFT_SAMPLE_ROWS}) AS sample`)
  ).rows[0];
  if (Number(row['rows']) === 0) {
    throw new EstimationError(
      'too-few-observations',
      `${model.label} has no rows to fit`,
      model.response.column,
    );
  }
  // A column that is NULL throughout the sample keeps origin 0; the full pass reports it.
  return terms.map((_, j) => {
    const mean = Number(row[`a${j}`]);
    return row[`a${j}`] === null || !Number.isFinite(mean) ? 0 : mean;
  });
}

function withConstant(n: number, linear: Rational[], products: Rational[][]): Rational[][] {
  const count = Rational.of(BigInt(n));
  return [[count, ...linear], ...products.map((row, a) => [linear[a], ...row])];
}
