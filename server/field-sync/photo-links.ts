import { GetObjectCommand } from '@aws-sdk/client-s3';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { asc, eq } from 'drizzle-orm';
import type { InterviewPhoto } from '@shared/field-sync/interview-detail';
import type { PhotoContentType } from '@shared/field-sync/photo-manifest';
import type { Executor } from '../db/database';
import { interviewPhotos } from '../db/schema';
import type { ObjectStorage } from '../storage/object-storage';

/** How long a photo link works: long enough to look, short enough not to be passed around. */
export const photoLinkSeconds = 5 * 60;

/** An interview's photos, each stored one with a short-lived presigned GET link. */
export async function interviewPhotoLinks(
  db: Executor,
  storage: ObjectStorage,
  interviewId: string,
): Promise<InterviewPhoto[]> {
  const rows = await db
    .select()
    .from(interviewPhotos)
    .where(eq(interviewPhotos.interviewId, interviewId))
    .orderBy(asc(interviewPhotos.createdAt), asc(interviewPhotos.id));
  const expiresAt = new Date(Date.now() + photoLinkSeconds * 1000).toISOString();
  return Promise.all(
    rows.map(async (row) => {
      const stored = row.storedAt !== null && row.objectKey !== null;
      const url = stored
        ? await getSignedUrl(
            storage.client,
            new GetObjectCommand({ Bucket: storage.bucket, Key: row.objectKey ?? '' }),
            { expiresIn: photoLinkSeconds },
          )
        : null;
      return {
        photoId: row.id,
        contentType: row.contentType as PhotoContentType,
        byteSize: row.byteSize,
        sha256: row.sha256,
        stored,
        url,
        urlExpiresAt: url ? expiresAt : null,
      };
    }),
  );
}
