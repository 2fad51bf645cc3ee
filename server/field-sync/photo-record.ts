import { and, eq } from 'drizzle-orm';
import type { PhotoUploadState } from '@shared/field-sync/photo-manifest';
import type { Executor } from '../db/database';
import { interviewPhotos, interviews } from '../db/schema';
import { notFound } from '../http/http-error';

export type PhotoRow = typeof interviewPhotos.$inferSelect & { studyId: string };

/**
 * A photo declared by one of this enumerator's stored interviews, locked for the upload when
 * `lock` is set (two chunks of one photo never interleave). 404 for anyone else's photo.
 */
export async function findOwnPhoto(
  db: Executor,
  photoId: string,
  enumeratorId: string,
  lock = false,
): Promise<PhotoRow> {
  const query = db
    .select({ photo: interviewPhotos, studyId: interviews.studyId })
    .from(interviewPhotos)
    .innerJoin(interviews, eq(interviews.id, interviewPhotos.interviewId))
    .where(and(eq(interviewPhotos.id, photoId), eq(interviews.enumeratorId, enumeratorId)));
  const [row] = lock ? await query.for('update', { of: interviewPhotos }) : await query;
  if (!row) throw notFound('A photo with this id in one of your synced interviews');
  return { ...row.photo, studyId: row.studyId };
}

/** Where an upload stands, as the photo endpoints answer it. */
export function uploadState(photo: PhotoRow): PhotoUploadState {
  return {
    photoId: photo.id,
    interviewId: photo.interviewId,
    byteSize: photo.byteSize,
    receivedBytes: photo.receivedBytes,
    stored: photo.storedAt !== null,
    storedAt: photo.storedAt?.toISOString() ?? null,
  };
}
