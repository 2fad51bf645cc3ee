import { createHash } from 'node:crypto';
import { PutObjectCommand } from '@aws-sdk/client-s3';
import { asc, eq, sql } from 'drizzle-orm';
import type { Executor } from '../db/database';
import { interviewPhotos, photoUploadChunks } from '../db/schema';
import type { ObjectStorage } from '../storage/object-storage';
import { checkImageBytes } from './photo-image-check';
import type { PhotoRow } from './photo-record';

/** How a completed upload ended. Refused bytes are discarded; the device starts again. */
export type FinishOutcome =
  | { kind: 'stored'; objectKey: string; storedAt: Date }
  | { kind: 'hash-mismatch'; received: string }
  | { kind: 'not-an-image'; found: string };

/** The object key of a stored photo: grouped by study and interview. */
export function photoObjectKey(photo: PhotoRow, extension: string): string {
  return `studies/${photo.studyId}/interviews/${photo.interviewId}/${photo.id}.${extension}`;
}

/**
 * Runs when the last byte of a photo has arrived, inside the upload's transaction: the
 * assembled bytes must hash to the declared SHA-256 and be a real JPEG, PNG or WebP; then they
 * go to object storage, the chunks are dropped, the photo is marked stored, and its interview
 * becomes complete once none of its photos is missing. If the server dies after the put but
 * before the commit, the retry puts the same bytes under the same key again: no harm.
 */
export async function finishUpload(
  tx: Executor,
  storage: ObjectStorage,
  photo: PhotoRow,
): Promise<FinishOutcome> {
  const chunks = await tx
    .select({ data: photoUploadChunks.data })
    .from(photoUploadChunks)
    .where(eq(photoUploadChunks.photoId, photo.id))
    .orderBy(asc(photoUploadChunks.offset));
  const bytes = Buffer.concat(chunks.map((chunk) => chunk.data));
  const received = createHash('sha256').update(bytes).digest('hex');
  if (received !== photo.sha256) {
    await discardChunks(tx, photo.id);
    return { kind: 'hash-mismatch', received };
  }
  const image = await checkImageBytes(bytes);
  if (!image.ok) {
    await discardChunks(tx, photo.id);
    return { kind: 'not-an-image', found: image.found };
  }
  const objectKey = photoObjectKey(photo, image.extension);
  await storage.client.send(
    new PutObjectCommand({
      Bucket: storage.bucket,
      Key: objectKey,
      Body: bytes,
      ContentType: image.contentType,
      ContentLength: bytes.length,
    }),
  );
  const storedAt = new Date();
  await tx.delete(photoUploadChunks).where(eq(photoUploadChunks.photoId, photo.id));
  await tx
    .update(interviewPhotos)
    .set({ objectKey, storedAt, contentType: image.contentType })
    .where(eq(interviewPhotos.id, photo.id));
  await tx.execute(sql`
    update interviews set complete_at = ${storedAt}
    where id = ${photo.interviewId} and complete_at is null and not exists (
      select 1 from interview_photos where interview_id = ${photo.interviewId} and stored_at is null
    )`);
  return { kind: 'stored', objectKey, storedAt };
}

async function discardChunks(tx: Executor, photoId: string): Promise<void> {
  await tx.delete(photoUploadChunks).where(eq(photoUploadChunks.photoId, photoId));
  await tx.update(interviewPhotos).set({ receivedBytes: 0 }).where(eq(interviewPhotos.id, photoId));
}
