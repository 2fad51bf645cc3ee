import { and, eq, inArray, sql } from 'drizzle-orm';
import type { Executor } from '../db/database';
import { interviewPhotos, interviews } from '../db/schema';
import { insertPhotoRows } from './insert-rows';
import type { StoredItem as Stored } from './plan-sync-batch';

/** Replaces a returned interview with its correction; false when it is no longer returned. */
export async function resubmit(tx: Executor, item: Stored, enumeratorId: string): Promise<boolean> {
  // The id and the enumerator stay as they are; everything the device decides is replaced.
  const changes = { ...item.row, id: undefined, enumeratorId: undefined, completeAt: null };
  const updated = await tx
    .update(interviews)
    .set(changes)
    .where(
      and(
        eq(interviews.id, item.id),
        eq(interviews.status, 'returned'),
        eq(interviews.enumeratorId, enumeratorId),
      ),
    )
    .returning({ id: interviews.id });
  if (updated.length === 0) return false;
  await replacePhotos(tx, item);
  await tx.execute(sql`
    update interviews set complete_at = case when exists (
      select 1 from interview_photos where interview_id = ${item.id} and stored_at is null
    ) then null else now() end
    where id = ${item.id}`);
  return true;
}

/** Keeps photos whose id and hash stay, drops the rest, and adds the new ones. */
async function replacePhotos(tx: Executor, item: Stored): Promise<void> {
  const keep = await tx
    .select({ id: interviewPhotos.id, sha256: interviewPhotos.sha256 })
    .from(interviewPhotos)
    .where(eq(interviewPhotos.interviewId, item.id));
  const unchanged = new Set(
    keep
      .filter((row) => item.photos.some((p) => p.id === row.id && p.sha256 === row.sha256))
      .map((row) => row.id),
  );
  const dropped = keep.filter((row) => !unchanged.has(row.id)).map((row) => row.id);
  if (dropped.length > 0)
    await tx.delete(interviewPhotos).where(inArray(interviewPhotos.id, dropped));
  const added = item.photos.filter((photo) => !unchanged.has(photo.id));
  await insertPhotoRows(tx, added);
}
