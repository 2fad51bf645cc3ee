import { EstimationError } from '../estimation-error';
import type { NamedColumn } from './named-column';

/**
 * ln of every value, refusing with 'non-positive-log' (naming the column, the 1-based row and
 * the value) when a value is zero or negative, and with 'invalid-value' when it is not a number.
 * `why` says which model needs the logarithm, for the message.
 */
export function logColumn(column: NamedColumn, why: string): NamedColumn {
  const values = column.values.map((value, i) => {
    if (typeof value !== 'number' || Number.isNaN(value) || value === Infinity) {
      throw new EstimationError(
        'invalid-value',
        `column ${column.name}, row ${i + 1}: ${String(value)} is not a finite number`,
        column.name,
      );
    }
    if (!(value > 0)) {
      throw new EstimationError(
        'non-positive-log',
        `column ${column.name}, row ${i + 1}: ${value} is not positive, so it has no logarithm ` +
          `(${why}); drop or correct the row, or choose a form without a log of ${column.name}`,
        column.name,
      );
    }
    return Math.log(value);
  });
  return { name: column.name, values };
}
