import { sql } from 'drizzle-orm';
import type { SyncItemResult } from '@shared/field-sync/sync-batch';
import type { Executor } from '../db/database';

/**
 * Writes the typed shelf-observation rows of the interviews a batch stored or corrected (the
 * SQL function of drizzle/0010 reads their answers and questionnaire blocks), so observed-price
 * fits read columns rather than JSON.
 */
export async function writeShelfObservationRows(
  tx: Executor,
  results: readonly SyncItemResult[],
): Promise<void> {
  const ids = results.filter((r) => r.outcome === 'accepted').map((r) => sql`${r.id}`);
  if (ids.length === 0) return;
  await tx.execute(
    sql`SELECT refresh_shelf_observation_rows(ARRAY[${sql.join(ids, sql`, `)}]::uuid[])`,
  );
}
