import { sql, type SQL } from 'drizzle-orm';
import { Rational } from '@shared/estimation/exact/rational';
import { InputProblem } from './input-problem';
import type { SqlRunner } from './in-database-model-spec';
import type { ResolvedModel } from './model-source';

/**
 * A float8 value as an exact PostgreSQL numeric: its shortest round-trip decimal (how
 * PostgreSQL prints a float8), which reads back as the same float8. Sums and products of
 * numerics are exact, so nothing is rounded after this.
 */
function numeric(value: SQL): SQL {
  return sql`(${value})::text::numeric`;
}

/** The terms z = [1, x…, y] as numeric columns z0…, with the weight w and cluster id g. */
function numericRows(model: ResolvedModel): SQL {
  const terms = [...model.regressors, model.response].map(
    (t, j) => sql`${numeric(t.value)} AS ${sql.raw(`z${j + 1}`)}`,
  );
  const extra = [
    ...(model.weights ? [sql`${numeric(model.weights.value)} AS w`] : []),
    ...(model.cluster ? [sql`${model.cluster.value} AS g`] : []),
  ];
  return sql`(SELECT 1::numeric AS z0, ${sql.join([...terms, ...extra], sql`, `)}
    FROM ${model.from} OFFSET NULL) AS exact_rows`;
}

function readExact(row: Record<string, unknown>, key: string): Rational {
  const value = row[key];
  if (typeof value !== 'string' && typeof value !== 'number') {
    throw new InputProblem('a numeric sum is NULL');
  }
  return Rational.fromDecimal(String(value));
}

/**
 * Σ w·z·zᵀ over z = [1, x…, y] in numeric, exactly (w = 1 unweighted): entry [0][0] is n or Σw.
 */
export async function exactMoments(runner: SqlRunner, model: ResolvedModel): Promise<Rational[][]> {
  const m = model.regressors.length + 2;
  const weight = model.weights ? sql`w * ` : sql``;
  const items: SQL[] = [];
  for (let a = 0; a < m; a++) {
    for (let b = a; b < m; b++) {
      items.push(sql`sum(${weight}${sql.raw(`z${a} * z${b}`)}) AS ${sql.raw(`p${a}_${b}`)}`);
    }
  }
  const row = (
    await runner.execute(sql`SELECT ${sql.join(items, sql`, `)} FROM ${numericRows(model)}`)
  ).rows[0];
  return Array.from({ length: m }, (_, a) =>
    Array.from({ length: m }, (_, b) => readExact(row, `p${Math.min(a, b)}_${Math.max(a, b)}`)),
  );
}

/**
 * The meat Σ_g s_g·s_gᵀ in numeric, exactly, with s = w·e·z over the model's coefficient
 * columns (z0 = 1 only with an intercept) and e = y − Σβⱼzⱼ from `coefficients` given as
 * decimal strings (per row for HC1, totalled per cluster id for cluster-robust errors).
 */
export async function exactMeat(
  runner: SqlRunner,
  model: ResolvedModel,
  coefficients: readonly string[],
): Promise<{ meat: Rational[][]; clusters: number | null; missingCluster: boolean }> {
  const k = model.regressors.length;
  const columns = [...(model.intercept ? [0] : []), ...Array.from({ length: k }, (_, j) => j + 1)];
  for (const value of coefficients) {
    if (!/^-?\d+e-?\d+$/.test(value)) throw new Error(`not a decimal coefficient: ${value}`);
  }
  const fitted = columns.map((c, j) => sql` - ${sql.raw(`(${coefficients[j]})::numeric * z${c}`)}`);
  const residual = sql`${sql.raw(`z${k + 1}`)}${sql.join(fitted)}`;
  const score = model.weights ? sql`w * (${residual})` : sql`(${residual})`;
  const scores = columns.map((c, a) => sql`${score} * ${sql.raw(`z${c} AS s${a}`)}`);
  const p = columns.length;
  const products: SQL[] = [];
  for (let a = 0; a < p; a++) {
    for (let b = a; b < p; b++) {
      products.push(sql`sum(${sql.raw(`s${a} * s${b}`)}) AS ${sql.raw(`m${a}_${b}`)}`);
    }
  }
  const scored = sql`(SELECT ${sql.join(scores, sql`, `)}${model.cluster ? sql`, g` : sql``}
    FROM ${numericRows(model)} OFFSET NULL) AS scored`;
  const totals = Array.from({ length: p }, (_, a) => sql.raw(`sum(s${a}) AS s${a}`));
  const query = model.cluster
    ? sql`SELECT count(*) AS groups, bool_or(missing) AS missing, ${sql.join(products, sql`, `)}
        FROM (SELECT g IS NULL AS missing, ${sql.join(totals, sql`, `)} FROM ${scored} GROUP BY g)
        AS clusters`
    : sql`SELECT ${sql.join(products, sql`, `)} FROM ${scored}`;
  const row = (await runner.execute(query)).rows[0];
  const meat = Array.from({ length: p }, (_, a) =>
    Array.from({ length: p }, (_, b) => readExact(row, `m${Math.min(a, b)}_${Math.max(a, b)}`)),
  );
  return {
    meat,
    clusters: model.cluster ? Number(row['groups']) : null,
    missingCluster: row['missing'] === true,
  };
}
