import { asc, eq } from 'drizzle-orm';
import type { InterviewPhoto } from '@shared/field-sync/interview-detail';
import type { PhotoContentType } from '@shared/field-sync/photo-manifest';
import type { Executor } from '../db/database';
import { interviewPhotos } from '../db/schema';

/**
 * Where the review screens load one photo: an API route behind the session and the study's
 * access rule (never a link to the object store, whose answers the app cannot give the headers
 * that keep a browser from reading an upload as anything but the image it was checked to be).
 */
export function interviewPhotoPath(studyId: string, interviewId: string, photoId: string): string {
  return `/api/studies/${studyId}/interviews/${interviewId}/photos/${photoId}`;
}

/** An interview's photos, each stored one with the link that serves it. */
export async function interviewPhotoLinks(
  db: Executor,
  studyId: string,
  interviewId: string,
): Promise<InterviewPhoto[]> {
  const rows = await db
    .select()
    .from(interviewPhotos)
    .where(eq(interviewPhotos.interviewId, interviewId))
    .orderBy(asc(interviewPhotos.createdAt), asc(interviewPhotos.id));
  return rows.map((row) => {
    const stored = row.storedAt !== null && row.objectKey !== null;
    return {
      photoId: row.id,
      contentType: row.contentType as PhotoContentType,
      byteSize: row.byteSize,
      sha256: row.sha256,
      stored,
      url: stored ? interviewPhotoPath(studyId, interviewId, row.id) : null,
    };
  });
}
