import { withLowerCaseIds } from '@shared/field-sync/lower-case-ids';
import type { SyncBatchResult } from '@shared/field-sync/sync-batch';
import type { Actor } from '../auth/actor';
import type { Database } from '../db/database';
import { batchKeys } from './batch-keys';
import { copyInterviewRows } from './copy-interview-rows';
import { loadEnumeratorScope } from './enumerator-scope';
import { loadExistingInterviews, loadPhotoOwners } from './existing-interviews';
import { insertItemByItem } from './insert-item-by-item';
import { planSyncBatch } from './plan-sync-batch';
import type { PublishedVersionCache } from './published-versions';
import { loadRespondentMatches } from './respondent-matches';
import { storeSyncBatch, type NewRowWriter } from './store-sync-batch';

/**
 * Accepts a device's batch: reads what the checks need in a handful of queries, decides each
 * interview on its own, then writes all accepted ones in ONE transaction (a single COPY when
 * there are only new interviews without photos). A server killed midway leaves nothing of the
 * batch; sending it again gives the same answers (duplicates for what was stored), so a batch
 * is never stored twice or half.
 */
export async function syncBatch(
  db: Database,
  versionCache: PublishedVersionCache,
  actor: Actor,
  sent: readonly unknown[],
): Promise<SyncBatchResult> {
  const receivedAt = new Date();
  const items = sent.map(withLowerCaseIds);
  const keys = batchKeys(items);
  const [scope, versions, existing, photoOwners, respondentMatches] = await Promise.all([
    loadEnumeratorScope(db, actor),
    versionCache.load(db, keys.versionIds),
    loadExistingInterviews(db, keys.interviewIds),
    loadPhotoOwners(db, keys.photoIds),
    loadRespondentMatches(db, keys.respondents),
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
  // New interviews go in with one COPY (falling back to INSERT … ON CONFLICT, item by item if
  // need be, when an id was taken meanwhile or the database refused a row); corrections take
  // several statements, so a batch with one runs in a transaction.
  const corrections = plan.some((item) => item.kind === 'resubmit');
  const results = corrections
    ? await db.transaction((tx) =>
        storeSyncBatch(tx, plan, actor.userId, (rows, photos) =>
          insertItemByItem(tx, rows, photos),
        ),
      )
    : await storeSyncBatch(db, plan, actor.userId, copyOrInsert(db));
  return { results, receivedAt: receivedAt.toISOString() };
}

/**
 * The fast COPY path, or, when a concurrent request took one of the ids or the database refused
 * a row, the judging INSERT that sets aside only the rows refused.
 */
function copyOrInsert(db: Database): NewRowWriter {
  return async (rows, photos) => {
    const copied = await copyInterviewRows(db.$client, rows, photos);
    if (copied) return { stored: copied, refused: new Map() };
    return db.transaction((tx) => insertItemByItem(tx, rows, photos));
  };
}
