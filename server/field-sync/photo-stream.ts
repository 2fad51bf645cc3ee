import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import { GetObjectCommand } from '@aws-sdk/client-s3';
import { and, eq, isNotNull } from 'drizzle-orm';
import type { Response } from 'express';
import type { Executor } from '../db/database';
import { interviewPhotos, interviews } from '../db/schema';
import { notFound } from '../http/http-error';
import type { ObjectStorage } from '../storage/object-storage';

/**
 * Streams one stored photo of a study's interview from the object store, with the content type
 * its bytes were checked to have at upload, `nosniff` (set for every answer by the security
 * headers) so the browser never reads it as anything else, and no caching. 404 when the
 * study has no such interview, the interview no such photo, or its bytes are not in yet.
 */
export async function streamInterviewPhoto(
  db: Executor,
  storage: ObjectStorage,
  where: { studyId: string; interviewId: string; photoId: string },
  res: Response,
): Promise<void> {
  const [photo] = await db
    .select({
      objectKey: interviewPhotos.objectKey,
      contentType: interviewPhotos.contentType,
      byteSize: interviewPhotos.byteSize,
    })
    .from(interviewPhotos)
    .innerJoin(interviews, eq(interviews.id, interviewPhotos.interviewId))
    .where(
      and(
        eq(interviewPhotos.id, where.photoId),
        eq(interviewPhotos.interviewId, where.interviewId),
        eq(interviews.studyId, where.studyId),
        isNotNull(interviewPhotos.storedAt),
        isNotNull(interviewPhotos.objectKey),
      ),
    );
  const objectKey = photo?.objectKey;
  if (!photo || !objectKey) throw notFound('That photo');
  const object = await storage.client.send(
    new GetObjectCommand({ Bucket: storage.bucket, Key: objectKey }),
  );
  res.setHeader('Content-Type', photo.contentType ?? 'application/octet-stream');
  res.setHeader('Content-Length', String(photo.byteSize));
  res.setHeader('X-Content-Type-Options', 'nosniff');
  res.setHeader('Content-Disposition', 'inline');
  res.setHeader('Cache-Control', 'private, no-store');
  await pipeline(object.Body as Readable, res);
}
