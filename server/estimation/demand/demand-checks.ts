import { sql, type SQL } from 'drizzle-orm';
import { EstimationError } from '@shared/estimation/estimation-error';
import type { SqlRunner } from '../in-database-model-spec';
import type { InDatabaseDemandSpec } from './in-database-demand-spec';
import { maxFixedEffectLevels } from './in-database-demand-spec';

/** A model column with whether the form logs it. */
export interface ContinuousColumn {
  readonly column: string;
  readonly logged: boolean;
}

/** What the checking scan learned: the (weighted) means the elasticities and curve need. */
export interface ColumnMeans {
  /** Means of the untransformed continuous columns (price, covariates). */
  readonly raw: ReadonlyMap<string, number>;
  /** Means of the transformed regressors (logs, dummies) by term name. */
  readonly transformed: ReadonlyMap<string, number>;
}

const id = (name: string) => sql`src.${sql.identifier(name)}`;
const num = (name: string) => sql`${id(name)}::float8`;

/**
 * The levels of each fixed-effect grouping, in natural order (as the in-memory design sorts
 * them). Refuses a grouping with one level, or with more than the dummies allowed, or with an
 * empty value.
 */
export async function fixedEffectLevels(
  runner: SqlRunner,
  from: SQL,
  spec: InDatabaseDemandSpec,
): Promise<Map<string, string[]>> {
  const levels = new Map<string, string[]>();
  for (const column of spec.fixedEffects) {
    const rows = (
      await runner.execute(
        sql`SELECT DISTINCT ${id(column)}::text AS level FROM ${from}
            LIMIT ${maxFixedEffectLevels + 1}`,
      )
    ).rows.map((r) => r['level'] as string | null);
    if (rows.includes(null)) {
      throw new EstimationError(
        'invalid-value',
        `fixed-effect grouping ${column} is empty on some rows; every row needs a level`,
        `fixedEffects`,
      );
    }
    if (rows.length < 2) {
      throw new EstimationError(
        'single-level',
        `fixed-effect grouping ${column} has a single level (${rows[0] ?? 'none'}), so its ` +
          'effect cannot be told apart from the intercept; choose a grouping with two or more levels',
        'fixedEffects',
      );
    }
    if (rows.length > maxFixedEffectLevels) {
      throw new EstimationError(
        'too-many-levels',
        `fixed-effect grouping ${column} has more than ${maxFixedEffectLevels} levels; ` +
          'cluster the errors on it instead, or choose a coarser grouping',
        'fixedEffects',
      );
    }
    levels.set(
      column,
      (rows as string[]).sort((a, b) => a.localeCompare(b, undefined, { numeric: true })),
    );
  }
  return levels;
}

/**
 * One scan that checks every model column — no empty value, no value ≤ 0 under a log, the
 * price varies, no instrument equal to the price on every row — naming the first line at
 * fault, and computes the (weighted) means of the raw and transformed columns.
 */
export async function checkAndAverage(
  runner: SqlRunner,
  from: SQL,
  spec: InDatabaseDemandSpec,
  continuous: readonly ContinuousColumn[],
  dummies: readonly { name: string; column: string; level: string }[],
): Promise<ColumnMeans> {
  const line = spec.lineColumn ? id(spec.lineColumn) : sql`NULL::int`;
  const w = spec.weights ? num(spec.weights) : sql`1::float8`;
  const parts: SQL[] = [sql`count(*) AS rows`, sql`sum(${w}) AS wsum`];
  const checked = [
    { column: spec.quantity, logged: spec.form !== 'linear' },
    ...continuous,
    ...spec.instruments.map((column) => ({ column, logged: spec.form === 'loglog' })),
  ];
  checked.forEach(({ column, logged }, i) => {
    parts.push(sql`min(${line}) FILTER (WHERE ${id(column)} IS NULL) AS ${sql.raw(`nl${i}`)}`);
    parts.push(sql`count(*) FILTER (WHERE ${id(column)} IS NULL) AS ${sql.raw(`nc${i}`)}`);
    if (logged) {
      parts.push(sql`min(${line}) FILTER (WHERE ${num(column)} <= 0) AS ${sql.raw(`pl${i}`)}`);
      parts.push(sql`count(*) FILTER (WHERE ${num(column)} <= 0) AS ${sql.raw(`pc${i}`)}`);
    }
  });
  parts.push(sql`min(${num(spec.price)}) < max(${num(spec.price)}) AS varies`);
  spec.instruments.forEach((column, i) => {
    parts.push(
      sql`bool_and(${num(column)} IS NOT DISTINCT FROM ${num(spec.price)}) AS ${sql.raw(`same${i}`)}`,
    );
  });
  continuous.forEach(({ column, logged }, i) => {
    parts.push(sql`sum(${w} * ${num(column)}) AS ${sql.raw(`raw${i}`)}`);
    const value = logged
      ? sql`CASE WHEN ${num(column)} > 0 THEN ln(${num(column)}) END`
      : num(column);
    parts.push(sql`sum(${w} * ${value}) AS ${sql.raw(`tr${i}`)}`);
  });
  if (spec.weights) {
    parts.push(sql`min(${line}) FILTER (WHERE NOT ${num(spec.weights)} > 0) AS wbad`);
  }
  dummies.forEach(({ column, level }, i) => {
    parts.push(
      sql`sum(${w}) FILTER (WHERE ${id(column)}::text = ${level}) AS ${sql.raw(`fe${i}`)}`,
    );
  });
  const row = (await runner.execute(sql`SELECT ${sql.join(parts, sql`, `)} FROM ${from}`)).rows[0];
  const at = (key: string) => row[key] as string | number | null;
  const where = (lineKey: string, countKey: string) => {
    const first = at(lineKey);
    const count = Number(at(countKey));
    return first === null ? `on ${count} rows` : `on line ${first} (and ${count - 1} other rows)`;
  };
  checked.forEach(({ column, logged }, i) => {
    if (Number(at(`nc${i}`)) > 0) {
      throw new EstimationError(
        'invalid-value',
        `column ${column} is empty ${where(`nl${i}`, `nc${i}`)}; a model column needs a value on every row`,
        column,
      );
    }
    if (logged && Number(at(`pc${i}`)) > 0) {
      throw new EstimationError(
        'non-positive-log',
        `column ${column} is zero or negative ${where(`pl${i}`, `pc${i}`)}, so the ` +
          `${spec.form === 'loglog' ? 'log-log' : 'semi-log'} form cannot take its logarithm; ` +
          'choose the linear form or correct those rows',
        column,
      );
    }
  });
  if (Number(at('rows')) === 0) {
    throw new EstimationError('empty-data', 'the dataset has no rows', spec.quantity);
  }
  if (!row['varies']) {
    throw new EstimationError(
      'no-price-variation',
      `column ${spec.price} takes a single value; a demand curve needs at least two price levels`,
      spec.price,
    );
  }
  spec.instruments.forEach((column, i) => {
    if (row[`same${i}`]) {
      throw new EstimationError(
        'instrument-is-price',
        `instrument ${column} equals the price ${spec.price} on every row, so it cannot ` +
          'instrument it; choose a column that moves the price from outside the demand equation',
        'instruments',
      );
    }
  });
  if (spec.weights && at('wbad') !== null) {
    throw new EstimationError(
      'invalid-value',
      `weight ${spec.weights} is not above zero on line ${at('wbad')}`,
      spec.weights,
    );
  }
  const total = Number(at('wsum'));
  const raw = new Map<string, number>();
  const transformed = new Map<string, number>();
  continuous.forEach(({ column }, i) => {
    raw.set(column, Number(at(`raw${i}`)) / total);
    transformed.set(column, Number(at(`tr${i}`)) / total);
  });
  dummies.forEach(({ name }, i) => transformed.set(name, Number(at(`fe${i}`) ?? 0) / total));
  return { raw, transformed };
}
