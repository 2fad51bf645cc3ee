import { EstimationError } from '../estimation-error';

/** A named numeric column of the data, one value per observation. */
export interface NamedColumn {
  readonly name: string;
  readonly values: readonly number[];
}

/** A named column of group labels (cluster ids, regions). */
export interface LabelColumn {
  readonly name: string;
  readonly values: readonly (string | number)[];
}

/**
 * Copies a column into a Float64Array after checking it has `length` finite values.
 * Throws 'length-mismatch' or 'invalid-value' naming the column (and the 1-based row).
 */
export function finiteColumn(column: NamedColumn, length: number): Float64Array {
  if (column.values.length !== length) {
    throw new EstimationError(
      'length-mismatch',
      `column ${column.name} has ${column.values.length} values but the response has ${length}`,
      column.name,
    );
  }
  const values = new Float64Array(length);
  column.values.forEach((value, i) => {
    if (typeof value !== 'number' || !Number.isFinite(value)) {
      throw new EstimationError(
        'invalid-value',
        `column ${column.name}, row ${i + 1}: ${String(value)} is not a finite number`,
        column.name,
      );
    }
    values[i] = value;
  });
  return values;
}

/** Checks that a label column has one label per observation. */
export function checkLabelColumn(column: LabelColumn, length: number): void {
  if (column.values.length !== length) {
    throw new EstimationError(
      'length-mismatch',
      `column ${column.name} has ${column.values.length} values but the response has ${length}`,
      column.name,
    );
  }
  column.values.forEach((value, i) => {
    if (value === '' || (typeof value === 'number' && !Number.isFinite(value))) {
      throw new EstimationError(
        'invalid-value',
        `column ${column.name}, row ${i + 1}: missing group label`,
        column.name,
      );
    }
  });
}
