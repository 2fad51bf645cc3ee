import type { SQL } from 'drizzle-orm';

/** A model term: a stored numeric column, or the natural log of one (`{ log: 'price' }`). */
export type InDatabaseTerm = string | { readonly log: string };

/**
 * Where the observations live: a table (optionally schema-qualified), or a subquery built with
 * drizzle's `sql` template (never concatenated user input).
 */
export type InDatabaseSource =
  | { readonly table: string; readonly schema?: string }
  | { readonly query: SQL };

/** Which standard errors to report; cluster-robust names the column holding the cluster ids. */
export type InDatabaseStandardErrors =
  | { readonly type: 'classical' }
  | { readonly type: 'hc1' }
  | { readonly type: 'cluster'; readonly column: string };

/** A linear model fitted where its rows are stored. */
export interface InDatabaseModelSpec {
  readonly source: InDatabaseSource;
  readonly response: InDatabaseTerm;
  readonly regressors: readonly InDatabaseTerm[];
  /** Include a constant term (default true). */
  readonly intercept?: boolean;
  /** Column of positive analytic weights: minimise Σ wᵢ·eᵢ². */
  readonly weights?: string;
  /** Default classical. */
  readonly standardErrors?: InDatabaseStandardErrors;
  /** Default 0.95. */
  readonly confidenceLevel?: number;
  /**
   * Scaled condition of XᵀX above which float8 sums are not trusted to pin the coefficients
   * down (default 1e10); such designs are summed in exact numeric instead.
   */
  readonly maxConditionNumber?: number;
  /**
   * Write the sums straight over the source's rows (default false). A source on another server
   * (a postgres_fdw foreign table, or a partition of one) can then compute them there and send
   * back one row; by default the shifted values are first computed in a fenced subquery, which is
   * quicker locally but makes a foreign source send every row.
   */
  readonly aggregateAtSource?: boolean;
}

/** A result column as PostgreSQL describes it. */
export interface ResultField {
  readonly name: string;
  readonly dataTypeID: number;
}

/** What the fit needs of a connection: drizzle's `execute` (a database or a transaction). */
export interface SqlRunner {
  execute(query: SQL): PromiseLike<{
    readonly rows: Record<string, unknown>[];
    readonly fields?: readonly ResultField[];
  }>;
}

/**
 * A drizzle database or transaction: the fit runs its passes in one (nested) transaction. A
 * database opens it read-only at REPEATABLE READ; a savepoint keeps its caller's isolation.
 */
export interface FitDatabase {
  transaction<T>(
    run: (tx: SqlRunner) => Promise<T>,
    config?: { isolationLevel?: 'repeatable read'; accessMode?: 'read only' },
  ): Promise<T>;
}
