import type { DataTable } from './data-table';

/** One estimation method the fit command can run on a data table. */
export interface FitMethod {
  /** The value of --method that selects it. */
  readonly name: string;
  /** Runs the method; the result is printed as JSON and always carries `n`. */
  run(table: DataTable, options: Record<string, string | boolean>): Record<string, unknown>;
}
