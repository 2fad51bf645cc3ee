import type { SyncBatchResult } from '@shared/field-sync/sync-batch';
import type { Actor } from '../auth/actor';
import type { Database } from '../db/database';
import { batchKeys } from './batch-keys';
import { loadEnumeratorScope } from './enumerator-scope';
import { loadExistingInterviews, loadPhotoOwners } from './existing-interviews';
import { planSyncBatch } from './plan-sync-batch';
import type { PublishedVersionCache } from './published-versions';
import { loadRespondentMatches } from './respondent-matches';
import { storeSyncBatch } from './store-sync-batch';

/**
 * Accepts a device's batch: reads what the checks need in a handful of queries, decides each
 * interview on its own, then writes all accepted ones in ONE transaction (one statement when
 * there are only new interviews). A server killed midway leaves nothing of the batch; sending
 * it again gives the same answers (duplicates for what was stored), so a batch is never stored
 * twice or half.
 */
export async function syncBatch(
  db: Database,
  versionCache: PublishedVersionCache,
  actor: Actor,
  items: readonly unknown[],
): Promise<SyncBatchResult> {
  const receivedAt = new Date();
  const keys = batchKeys(items);
  const [scope, versions, existing, photoOwners, respondentMatches] = await Promise.all([
    loadEnumeratorScope(db, actor),
    versionCache.load(db, keys.versionIds),
    loadExistingInterviews(db, keys.interviewIds),
    loadPhotoOwners(db, keys.photoIds),
    loadRespondentMatches(db, keys.studyIds, keys.respondentKeys),
  ]);
  const plan = planSyncBatch(items, {
    enumeratorId: actor.userId,
    scope,
    versions,
    existing,
    photoOwners,
    respondentMatches,
    receivedAt,
  });
  // New interviews go in with a single statement, atomic on its own; corrections take several.
  const corrections = plan.some((item) => item.kind === 'resubmit');
  const results = corrections
    ? await db.transaction((tx) => storeSyncBatch(tx, plan, actor.userId))
    : await storeSyncBatch(db, plan, actor.userId);
  return { results, receivedAt: receivedAt.toISOString() };
}
