import type { SyncItemResult } from '@shared/field-sync/sync-batch';
import type { InterviewStatus } from '@shared/interviews/interview-status';
import type { Executor } from '../db/database';
import { decideOnExisting } from './existing-decision';
import { loadExistingInterviews } from './existing-interviews';
import type { NewRowsOutcome } from './insert-item-by-item';
import type { InterviewInsert, PhotoInsert } from './interview-row';
import { resubmit } from './resubmit-interview';
import type { PlannedItem, StoredItem as Stored } from './plan-sync-batch';
import { rejection, type Rejection } from './sync-rejection';
import { writeShelfObservationRows } from './shelf-observation-rows';

/**
 * Stores new interviews and the photo rows they declare; answers the ids it stored and those the
 * database refused (each alone, never the batch). An id a concurrent request stored first is
 * in neither list (and not written).
 */
export type NewRowWriter = (
  rows: readonly InterviewInsert[],
  photos: readonly PhotoInsert[],
) => Promise<NewRowsOutcome>;

/**
 * Writes a planned batch and answers each item. New interviews go in through `writeNew` in one
 * atomic step; an id that a concurrent request stored first is then judged against what it
 * stored (duplicate or conflict), exactly as if it had been there before. Corrections of
 * returned interviews take more statements: the caller runs those in a transaction.
 */
export async function storeSyncBatch(
  tx: Executor,
  plan: readonly PlannedItem[],
  enumeratorId: string,
  writeNew: NewRowWriter,
): Promise<SyncItemResult[]> {
  const inserts = plan.filter((item): item is Stored => item.kind === 'insert');
  const { lost, refused } = await insertNew(writeNew, inserts);
  const lostDecisions = await judgeLost(tx, lost, enumeratorId);
  const results: SyncItemResult[] = [];
  for (const item of plan) {
    const { index } = item;
    if (item.kind === 'rejected') {
      results.push({ index, id: item.id, outcome: 'rejected', ...item.rejection });
    } else if (item.kind === 'duplicate') {
      results.push({ index, id: item.id, outcome: 'duplicate', status: item.status });
    } else if (refused.has(item.id)) {
      results.push({ index, id: item.id, outcome: 'rejected', ...refused.get(item.id)! });
    } else if (lostDecisions.has(item.id)) {
      results.push(withPlace(lostDecisions.get(item.id), index, item.id));
    } else {
      const resubmitted = item.kind === 'resubmit';
      if (resubmitted && !(await resubmit(tx, item, enumeratorId))) {
        const changed = rejection('id-conflict', [
          { path: 'id', message: 'The interview changed on the server meanwhile; sync again' },
        ]);
        results.push({ index, id: item.id, outcome: 'rejected', ...changed });
        continue;
      }
      const status = item.row.status === 'flagged' ? 'flagged' : 'received';
      results.push({ index, id: item.id, outcome: 'accepted', status, resubmitted });
    }
  }
  await writeShelfObservationRows(tx, results);
  return results;
}

/**
 * Inserts the new interviews and their photo rows; answers the ones someone stored first and
 * the ones the database refused.
 */
async function insertNew(
  writeNew: NewRowWriter,
  inserts: readonly Stored[],
): Promise<{ lost: Stored[]; refused: NewRowsOutcome['refused'] }> {
  if (inserts.length === 0) return { lost: [], refused: new Map() };
  const rows = inserts.map((item) => item.row);
  const photos = inserts.flatMap((item) => item.photos);
  const outcome = await writeNew(rows, photos);
  const done = new Set(outcome.stored);
  const lost = inserts.filter((item) => !done.has(item.id) && !outcome.refused.has(item.id));
  return { lost, refused: outcome.refused };
}

type LostAnswer =
  | { outcome: 'duplicate'; status: InterviewStatus }
  | ({ outcome: 'rejected' } & Rejection);

function withPlace(answer: LostAnswer | undefined, index: number, id: string): SyncItemResult {
  if (answer?.outcome === 'duplicate') return { index, id, ...answer };
  const why = answer ?? rejection('id-conflict', [{ path: 'id', message: 'Sync again' }]);
  return { index, id, ...why, outcome: 'rejected' };
}

async function judgeLost(
  tx: Executor,
  lost: readonly Stored[],
  enumeratorId: string,
): Promise<Map<string, LostAnswer>> {
  const answers = new Map<string, LostAnswer>();
  if (lost.length === 0) return answers;
  const existing = await loadExistingInterviews(
    tx,
    lost.map((item) => item.id),
  );
  for (const item of lost) {
    const stored = existing.get(item.id);
    const decision = stored
      ? decideOnExisting(stored, {
          enumeratorId,
          studyId: item.row.studyId,
          fingerprint: item.fingerprint(),
        })
      : undefined;
    if (decision?.kind === 'duplicate') {
      answers.set(item.id, { outcome: 'duplicate', status: decision.status });
    } else {
      const why =
        decision?.kind === 'rejected'
          ? decision.rejection
          : rejection('id-conflict', [
              { path: 'id', message: 'Stored meanwhile by another request; sync again' },
            ]);
      answers.set(item.id, { outcome: 'rejected', ...why });
    }
  }
  return answers;
}
