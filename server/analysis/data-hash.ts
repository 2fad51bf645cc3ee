import { createHash } from 'node:crypto';
import type { DatasetTable } from './dataset-table';

/**
 * SHA-256 (hex) of the canonical serialisation of a fit's data: the method, the column names
 * and every row, rows in interview-id order, each value as JSON writes it (numbers in their
 * shortest round-trip form). Two fits with the same hash ran on the same numbers.
 */
export function dataHash(method: string, table: DatasetTable): string {
  const canonical = JSON.stringify({ method, columns: table.columns, rows: table.rows });
  return createHash('sha256').update(canonical, 'utf8').digest('hex');
}
