import { readFileSync } from 'node:fs';
import { parse } from 'csv-parse/sync';
import { EstimationError } from '@shared/estimation/estimation-error';

/** A CSV file read into named columns (the first line holds the column names). */
export interface DataTable {
  readonly path: string;
  readonly columns: readonly string[];
  readonly rowCount: number;
  has(column: string): boolean;
  /** The column as numbers; refuses a missing cell or text, naming column and 1-based data row. */
  numbers(column: string): number[];
  /** The column's cells as trimmed text. */
  texts(column: string): string[];
}

const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** Reads a comma-separated file with a header line. Refuses an unreadable or empty file. */
export function readDataTable(path: string): DataTable {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    throw new EstimationError('unreadable-file', `cannot read the data file ${path}`, 'data');
  }
  const rows = parse(text, {
    bom: true,
    skip_empty_lines: true,
    trim: true,
    relax_column_count: true,
  });
  if (rows.length === 0)
    throw new EstimationError('empty-data', `${path} has no header line`, 'data');
  const [header, ...data] = rows;
  const columns = header.map((name) => name.trim());
  const index = (column: string): number => {
    const at = columns.indexOf(column);
    if (at < 0) {
      throw new EstimationError(
        'missing-column',
        `column "${column}" is not in ${path}; its columns are ${columns.join(', ')}`,
        column,
      );
    }
    return at;
  };
  const texts = (column: string): string[] => {
    const at = index(column);
    return data.map((row) => (row[at] ?? '').trim());
  };
  return {
    path,
    columns,
    rowCount: data.length,
    has: (column) => columns.includes(column),
    texts,
    numbers: (column) =>
      texts(column).map((cell, i) => {
        if (cell === '') {
          throw new EstimationError(
            'missing-value',
            `column ${column}, row ${i + 1}: the cell is empty`,
            column,
          );
        }
        if (!DECIMAL.test(cell)) {
          throw new EstimationError(
            'invalid-value',
            `column ${column}, row ${i + 1}: "${cell}" is not a number`,
            column,
          );
        }
        return Number(cell);
      }),
  };
}
