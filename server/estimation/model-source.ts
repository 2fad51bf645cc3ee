import { sql, type SQL } from 'drizzle-orm';
import { EstimationError } from '@shared/estimation/estimation-error';
import type {
  InDatabaseModelSpec,
  InDatabaseSource,
  InDatabaseTerm,
  ResultField,
  SqlRunner,
} from './in-database-model-spec';
import { sqlState } from './input-problem';

/** PostgreSQL's numeric types by type oid (the terms are read as float8). */
const NUMERIC_TYPES = new Set([21, 23, 20, 700, 701, 1700]);

/** A model column as SQL: the stored column or its log, as float8. */
export interface ModelVariable {
  /** The term's name in the fit: the column, or ln(column). */
  readonly name: string;
  /** The stored column the term is read from. */
  readonly column: string;
  readonly log: boolean;
  readonly value: SQL;
}

/** The model with every column checked against the source and quoted as an identifier. */
export interface ResolvedModel {
  /** The FROM item, aliased src. */
  readonly from: SQL;
  readonly label: string;
  readonly regressors: readonly ModelVariable[];
  readonly response: ModelVariable;
  readonly weights: ModelVariable | null;
  readonly cluster: { readonly column: string; readonly value: SQL } | null;
  readonly intercept: boolean;
  /** Sums over the source's rows directly, so a foreign source computes them itself. */
  readonly aggregateAtSource: boolean;
  /** The source table's name as `regclass` reads it (quoted, qualified), or null for a query. */
  readonly table: string | null;
}

/**
 * Reads the source's columns (a LIMIT 0 query, so no row is read) and resolves every column the
 * spec names against them: an unknown column is refused with 'missing-column', a non-numeric
 * term with 'invalid-value'. Names reach SQL only as quoted identifiers.
 */
export async function resolveModel(
  runner: SqlRunner,
  spec: InDatabaseModelSpec,
): Promise<ResolvedModel> {
  const { from, label } = fromItem(spec.source);
  const fields = await describe(runner, from, label);
  const column = (name: string, numeric: boolean): string =>
    checkColumn(fields, name, label, numeric);
  const variable = (term: InDatabaseTerm): ModelVariable => termVariable(term, column);
  const se = spec.standardErrors;
  return {
    from,
    label,
    regressors: spec.regressors.map(variable),
    response: variable(spec.response),
    weights: spec.weights === undefined ? null : variable(spec.weights),
    cluster:
      se?.type === 'cluster'
        ? { column: column(se.column, false), value: sql`${sql.identifier(se.column)}` }
        : null,
    intercept: spec.intercept ?? true,
    aggregateAtSource: spec.aggregateAtSource ?? false,
    table: 'table' in spec.source ? regclassName(spec.source) : null,
  };
}

function termVariable(term: InDatabaseTerm, column: (name: string, numeric: true) => string) {
  const name = column(typeof term === 'string' ? term : term.log, true);
  const stored = sql`${sql.identifier(name)}::float8`;
  return typeof term === 'string'
    ? { name, column: name, log: false, value: stored }
    : { name: `ln(${name})`, column: name, log: true, value: sql`ln(${stored})` };
}

function fromItem(source: InDatabaseSource): { from: SQL; label: string } {
  if ('query' in source) return { from: sql`(${source.query}) AS src`, label: 'the source query' };
  const name = source.schema ? `${source.schema}.${source.table}` : source.table;
  const table = source.schema
    ? sql`${sql.identifier(source.schema)}.${sql.identifier(source.table)}`
    : sql.identifier(source.table);
  return { from: sql`${table} AS src`, label: `table ${name}` };
}

async function describe(
  runner: SqlRunner,
  from: SQL,
  label: string,
): Promise<readonly ResultField[]> {
  try {
    const result = await runner.execute(sql`SELECT * FROM ${from} LIMIT 0`);
    return result.fields ?? [];
  } catch (error) {
    if (sqlState(error) === '42P01') {
      throw new EstimationError('missing-table', `${label} does not exist`, 'source');
    }
    throw error;
  }
}

function checkColumn(
  fields: readonly ResultField[],
  name: string,
  label: string,
  numeric: boolean,
): string {
  const field = fields.find((f) => f.name === name);
  if (!field) {
    const known = fields.map((f) => f.name).join(', ');
    throw new EstimationError(
      'missing-column',
      `column ${name} is not in ${label} (its columns: ${known || 'none'})`,
      name,
    );
  }
  if (numeric && !NUMERIC_TYPES.has(field.dataTypeID)) {
    throw new EstimationError(
      'invalid-value',
      `column ${name} of ${label} does not hold numbers, so it cannot enter the model`,
      name,
    );
  }
  return name;
}

function regclassName(source: { table: string; schema?: string }): string {
  const quote = (name: string) => `"${name.replace(/"/g, '""')}"`;
  return source.schema ? `${quote(source.schema)}.${quote(source.table)}` : quote(source.table);
}
