import { sql } from 'drizzle-orm';
import type { Executor } from '../db/database';
import { refusalMessage, sqlStateOf } from './database-refusal';
import type { InterviewInsert, PhotoInsert } from './interview-row';
import { insertInterviewRows } from './insert-rows';
import { rejection, type Rejection } from './sync-rejection';

/** What writing a batch's new interviews did: the ids stored, and the ones refused with why. */
export interface NewRowsOutcome {
  stored: string[];
  refused: ReadonlyMap<string, Rejection>;
}

/**
 * Inserts new interviews inside an open transaction so that one the database refuses cannot
 * take the others with it: the whole batch first, under a savepoint; when PostgreSQL refuses
 * it, each interview again under its own savepoint, and only those it still refuses are
 * answered as refused. The shared schemas already refuse what is known to fail; this is the
 * net for what they do not know of, so the slow path runs rarely.
 */
export async function insertItemByItem(
  tx: Executor,
  rows: readonly InterviewInsert[],
  photos: readonly PhotoInsert[],
): Promise<NewRowsOutcome> {
  const whole = await underSavepoint(tx, () => insertInterviewRows(tx, rows, photos));
  if (whole.ok) return { stored: whole.value, refused: new Map() };
  const stored: string[] = [];
  const refused = new Map<string, Rejection>();
  for (const row of rows) {
    const id = row.id;
    const own = photos.filter((photo) => photo.interviewId === id);
    const one = await underSavepoint(tx, () => insertInterviewRows(tx, [row], own));
    if (one.ok) stored.push(...one.value);
    else refused.set(id, rejection('unstorable', [{ path: 'interview', message: one.message }]));
  }
  return { stored, refused };
}

type Attempt<T> = { ok: true; value: T } | { ok: false; message: string };

async function underSavepoint<T>(tx: Executor, work: () => Promise<T>): Promise<Attempt<T>> {
  await tx.execute(sql`savepoint sync_item`);
  try {
    const value = await work();
    await tx.execute(sql`release savepoint sync_item`);
    return { ok: true, value };
  } catch (error) {
    if (sqlStateOf(error) === null) throw error;
    await tx.execute(sql`rollback to savepoint sync_item`);
    return { ok: false, message: refusalMessage(error) };
  }
}
