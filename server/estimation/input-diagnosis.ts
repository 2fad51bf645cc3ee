import { sql, type SQL } from 'drizzle-orm';
import { EstimationError } from '@shared/estimation/estimation-error';
import type { SqlRunner } from './in-database-model-spec';
import type { ResolvedModel } from './model-source';

/** One check on one column: the rows it counts, and the refusal when any is found. */
interface ColumnCheck {
  readonly rowsAtFault: SQL;
  readonly refusal: (count: number) => EstimationError;
}

/**
 * Finds the column behind a failed pass (it runs only after one: a clean fit never pays for
 * it): counts NULLs, NaN or infinite values, values ≤ 0 under a log and weights ≤ 0, column by
 * column in model order, and returns the first problem as a refusal naming the column and how
 * many rows are at fault — or null when every column is clean.
 */
export async function diagnoseInputs(
  runner: SqlRunner,
  model: ResolvedModel,
): Promise<EstimationError | null> {
  const checks = columnChecks(model);
  const counts = checks.map(
    (check, i) => sql`count(*) FILTER (WHERE ${check.rowsAtFault}) AS ${sql.raw(`f${i}`)}`,
  );
  const row = (await runner.execute(sql`SELECT ${sql.join(counts, sql`, `)} FROM ${model.from}`))
    .rows[0];
  const index = checks.findIndex((_, i) => Number(row[`f${i}`]) > 0);
  return index < 0 ? null : checks[index].refusal(Number(row[`f${index}`]));
}

function columnChecks(model: ResolvedModel): ColumnCheck[] {
  const terms = [...model.regressors, model.response];
  const checks: ColumnCheck[] = [];
  const seen = new Set<string>();
  for (const term of terms) {
    if (!seen.has(term.column)) checks.push(...valueChecks(term.column, model.label));
    seen.add(term.column);
  }
  for (const term of terms.filter((t) => t.log)) checks.push(logCheck(term.column, model.label));
  if (model.weights) {
    const weights = model.weights.column;
    checks.push(...valueChecks(weights, model.label), {
      rowsAtFault: sql`${sql.identifier(weights)} <= 0`,
      refusal: (count) =>
        new EstimationError(
          'invalid-value',
          `weights column ${weights} has ${count} values ≤ 0 in ${model.label}; weights must be positive`,
          weights,
        ),
    });
  }
  if (model.cluster) checks.push(nullCheck(model.cluster.column, model.label, 'cluster labels'));
  return checks;
}

function valueChecks(column: string, label: string): ColumnCheck[] {
  const value = sql`${sql.identifier(column)}::float8`;
  return [
    nullCheck(column, label, 'values'),
    {
      rowsAtFault: sql`NOT (${value} > '-Infinity'::float8 AND ${value} < 'Infinity'::float8)`,
      refusal: (count) =>
        new EstimationError(
          'invalid-value',
          `column ${column} has ${count} values in ${label} that are NaN or infinite`,
          column,
        ),
    },
  ];
}

function nullCheck(column: string, label: string, what: string): ColumnCheck {
  return {
    rowsAtFault: sql`${sql.identifier(column)} IS NULL`,
    refusal: (count) =>
      new EstimationError(
        'invalid-value',
        `column ${column} has ${count} missing (NULL) ${what} in ${label}; filter those rows ` +
          `out or fill them in first`,
        column,
      ),
  };
}

function logCheck(column: string, label: string): ColumnCheck {
  return {
    rowsAtFault: sql`${sql.identifier(column)} <= 0`,
    refusal: (count) =>
      new EstimationError(
        'non-positive-log',
        `column ${column} has ${count} values ≤ 0 in ${label}, which have no logarithm (the ` +
          `model uses ln(${column})); filter them out first (WHERE ${column} > 0)`,
        column,
      ),
  };
}
