import { and, eq, lt, sql } from 'drizzle-orm';
import type { DatasetFormat, UploadStart, UploadState } from '@shared/datasets/dataset-upload';
import type { Database, Executor } from '../db/database';
import { datasetUploadChunks, datasetUploads } from '../db/schema';
import { HttpError, notFound } from '../http/http-error';
import { fileKindProblem } from './file-kind';

/** An upload nobody adds to for this long is deleted with its chunks. */
const idleLifetime = sql`interval '24 hours'`;

type UploadRow = typeof datasetUploads.$inferSelect;

function stateOf(row: UploadRow): UploadState {
  return {
    uploadId: row.id,
    fileName: row.fileName,
    format: row.format as DatasetFormat,
    totalBytes: row.totalBytes,
    receivedBytes: row.receivedBytes,
    complete: row.receivedBytes === row.totalBytes,
    expiresAt: row.expiresAt.toISOString(),
  };
}

/** Announces a file; first clears away uploads that were abandoned. */
export async function startUpload(
  db: Database,
  studyId: string,
  start: UploadStart,
  userId: string,
): Promise<UploadState> {
  await deleteExpiredUploads(db);
  const format = start.fileName.toLowerCase().endsWith('.xlsx') ? 'xlsx' : 'csv';
  const [row] = await db
    .insert(datasetUploads)
    .values({
      studyId,
      fileName: start.fileName,
      format,
      totalBytes: start.totalBytes,
      createdBy: userId,
      expiresAt: sql`now() + ${idleLifetime}`,
    })
    .returning();
  return stateOf(row);
}

export async function findUpload(db: Executor, studyId: string, uploadId: string) {
  const [row] = await db
    .select()
    .from(datasetUploads)
    .where(and(eq(datasetUploads.id, uploadId), eq(datasetUploads.studyId, studyId)));
  if (!row) throw notFound('That upload');
  return row;
}

export async function uploadState(db: Executor, studyId: string, uploadId: string) {
  return stateOf(await findUpload(db, studyId, uploadId));
}

/**
 * Stores one chunk at `offset`, which must be the server's count of bytes received so far (a
 * client that lost its connection asks for that count and resumes from it). The first chunk's
 * bytes must look like the announced kind of file. Concurrent chunks for one upload are
 * serialised by a row lock.
 */
export async function appendChunk(
  db: Database,
  studyId: string,
  uploadId: string,
  offset: number,
  bytes: Buffer,
): Promise<UploadState> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(datasetUploads)
      .where(and(eq(datasetUploads.id, uploadId), eq(datasetUploads.studyId, studyId)))
      .for('update');
    if (!row) throw notFound('That upload');
    if (offset !== row.receivedBytes) {
      throw new HttpError(
        409,
        'wrong-offset',
        `The server holds ${row.receivedBytes} bytes of this file; send the chunk that starts there.`,
        [{ path: 'offset', message: `Expected ${row.receivedBytes}` }],
      );
    }
    if (bytes.length === 0) {
      throw new HttpError(400, 'invalid-input', 'The chunk is empty.', [
        { path: 'body', message: 'Send the file bytes as application/octet-stream' },
      ]);
    }
    if (offset + bytes.length > row.totalBytes) {
      throw new HttpError(
        400,
        'invalid-input',
        `The chunk runs past the announced size of ${row.totalBytes} bytes.`,
        [{ path: 'body', message: 'Too many bytes' }],
      );
    }
    if (offset === 0) {
      const problem = fileKindProblem(row.format as DatasetFormat, bytes);
      if (problem)
        throw new HttpError(400, 'invalid-file', problem, [{ path: 'file', message: problem }]);
    }
    await tx.insert(datasetUploadChunks).values({ uploadId, byteOffset: offset, bytes });
    const [updated] = await tx
      .update(datasetUploads)
      .set({
        receivedBytes: offset + bytes.length,
        expiresAt: sql`now() + ${idleLifetime}`,
      })
      .where(eq(datasetUploads.id, uploadId))
      .returning();
    return stateOf(updated);
  });
}

/** The upload's bytes in order, one stored chunk at a time (never the whole file in memory). */
export async function* uploadBytes(db: Executor, uploadId: string): AsyncGenerator<Buffer> {
  let offset = 0;
  for (;;) {
    const [chunk] = await db
      .select({ bytes: datasetUploadChunks.bytes })
      .from(datasetUploadChunks)
      .where(
        and(eq(datasetUploadChunks.uploadId, uploadId), eq(datasetUploadChunks.byteOffset, offset)),
      );
    if (!chunk) return;
    offset += chunk.bytes.length;
    yield chunk.bytes;
  }
}

/** Deletes uploads past their expiry, with their chunks (the foreign key cascades). */
export async function deleteExpiredUploads(db: Executor): Promise<number> {
  const gone = await db
    .delete(datasetUploads)
    .where(lt(datasetUploads.expiresAt, sql`now()`))
    .returning({ id: datasetUploads.id });
  return gone.length;
}

/** Drops an upload's chunks once its rows are imported; the upload row itself goes with them. */
export async function deleteUpload(db: Executor, uploadId: string): Promise<void> {
  await db.delete(datasetUploads).where(eq(datasetUploads.id, uploadId));
}
