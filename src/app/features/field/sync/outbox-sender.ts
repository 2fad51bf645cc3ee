import { Injectable, inject } from '@angular/core';
import type { SyncItemResult } from '@shared/field-sync/sync-batch';
import type { FieldDb } from '../data/field-db';
import type { OutboxEntry } from '../data/field-records';
import { FieldStore } from '../data/field-store';
import { FieldSyncApi } from './field-sync-api';

/** Interviews per request: small enough for a weak connection, large enough to drain quickly. */
export const outboxBatchSize = 25;

/** What one drain of the outbox did. */
export interface DrainSummary {
  readonly batches: number;
  readonly accepted: number;
  readonly duplicate: number;
  readonly rejected: number;
}

/**
 * Sends the waiting interviews, oldest first, in batches, and marks each by the server's answer.
 * A batch that fails (network, server) leaves its interviews waiting: the server stores each
 * interview once whatever the number of tries, so sending again is always safe.
 */
@Injectable({ providedIn: 'root' })
export class OutboxSender {
  private readonly store = inject(FieldStore);
  private readonly api = inject(FieldSyncApi);

  async drain(batchSize = outboxBatchSize): Promise<DrainSummary> {
    const db = this.store.db;
    const summary = { batches: 0, accepted: 0, duplicate: 0, rejected: 0 };
    for (;;) {
      const batch = await db.outbox.where('state').equals('waiting').sortBy('queuedAt');
      if (batch.length === 0) return summary;
      const sending = batch.slice(0, batchSize);
      const { results } = await this.api.sendBatch(
        sending.map((entry) => entry.interview),
        batch.length - sending.length,
      );
      await recordResults(db, sending, results);
      summary.batches++;
      for (const result of results) summary[result.outcome]++;
    }
  }
}

/** Marks each sent interview in one transaction; one the server did not answer stays waiting. */
async function recordResults(
  db: FieldDb,
  sent: readonly OutboxEntry[],
  results: readonly SyncItemResult[],
): Promise<void> {
  const answeredAt = new Date().toISOString();
  await db.transaction('rw', db.outbox, async () => {
    for (const entry of sent) {
      const result = results.find((r) => r.id === entry.id);
      if (!result) continue;
      const current = await db.outbox.get(entry.id);
      // Corrected and queued again while this batch was on its way: the new content goes next.
      if (!current || current.queuedAt !== entry.queuedAt) continue;
      await db.outbox.put({ ...entry, ...outcomeOf(entry, result), answeredAt });
    }
  });
}

function outcomeOf(entry: OutboxEntry, result: SyncItemResult): Partial<OutboxEntry> {
  if (result.outcome === 'rejected') {
    return { state: 'rejected', serverStatus: null, reason: result.message, issues: result.issues };
  }
  if (result.outcome === 'duplicate' && result.status === 'rejected') {
    return { state: 'rejected', serverStatus: result.status, reason: entry.reason, issues: [] };
  }
  if (result.outcome === 'duplicate' && result.status === 'returned') {
    return { state: 'returned', serverStatus: result.status, issues: [] };
  }
  const state = entry.interview.photos.length > 0 ? 'photos' : 'complete';
  return { state, serverStatus: result.status, reason: null, issues: [] };
}
