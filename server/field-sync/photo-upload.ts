import { eq } from 'drizzle-orm';
import type { PhotoUploadState } from '@shared/field-sync/photo-manifest';
import type { Database } from '../db/database';
import { interviewPhotos, photoUploadChunks } from '../db/schema';
import { HttpError } from '../http/http-error';
import type { ObjectStorage } from '../storage/object-storage';
import { finishUpload, type FinishOutcome } from './photo-finish';
import { findOwnPhoto, uploadState } from './photo-record';

/** One chunk of a photo: the bytes and the offset of their first byte in the photo. */
export interface PhotoChunk {
  photoId: string;
  offset: number;
  bytes: Buffer;
}

/**
 * Takes one chunk of a resumable upload. Bytes the server already holds are skipped (a chunk
 * re-sent after a lost answer changes nothing); a chunk that would leave a gap is refused with
 * the offset to resume from. The last chunk triggers the checks and the move to object storage;
 * a stored photo answers its state, so re-sending it is harmless.
 */
export async function receivePhotoChunk(
  db: Database,
  storage: ObjectStorage,
  enumeratorId: string,
  chunk: PhotoChunk,
): Promise<PhotoUploadState> {
  const { state, outcome } = await db.transaction(async (tx) => {
    const photo = await findOwnPhoto(tx, chunk.photoId, enumeratorId, true);
    if (photo.storedAt) return { state: uploadState(photo), outcome: undefined };
    const held = photo.receivedBytes;
    if (chunk.offset > held) {
      throw new HttpError(
        409,
        'upload-gap',
        `The server holds ${held} bytes of this photo; send the next chunk from offset ${held}, not ${chunk.offset}.`,
      );
    }
    const fresh = chunk.bytes.subarray(Math.min(held - chunk.offset, chunk.bytes.length));
    if (held + fresh.length > photo.byteSize) {
      throw new HttpError(
        413,
        'photo-too-large',
        `The photo was declared as ${photo.byteSize} bytes; this chunk would bring it to ${held + fresh.length}.`,
      );
    }
    if (fresh.length === 0) return { state: uploadState(photo), outcome: undefined };
    await tx.insert(photoUploadChunks).values({ photoId: photo.id, offset: held, data: fresh });
    const receivedBytes = held + fresh.length;
    await tx.update(interviewPhotos).set({ receivedBytes }).where(eq(interviewPhotos.id, photo.id));
    const grown = { ...photo, receivedBytes };
    if (receivedBytes < photo.byteSize) return { state: uploadState(grown), outcome: undefined };
    const finished = await finishUpload(tx, storage, grown);
    return { state: stateAfter(grown, finished), outcome: finished };
  });
  refuseIfDiscarded(outcome, state);
  return state;
}

function stateAfter(photo: Parameters<typeof uploadState>[0], outcome: FinishOutcome) {
  if (outcome.kind === 'stored') return uploadState({ ...photo, storedAt: outcome.storedAt });
  return uploadState({ ...photo, receivedBytes: 0 });
}

/** After the transaction has committed the discard, tells the device why and to start over. */
function refuseIfDiscarded(outcome: FinishOutcome | undefined, state: PhotoUploadState): void {
  if (outcome?.kind === 'hash-mismatch') {
    throw new HttpError(
      422,
      'photo-hash-mismatch',
      `The ${state.byteSize} bytes received hash to ${outcome.received}, not the SHA-256 declared for this photo; they were discarded — upload it again from offset 0.`,
    );
  }
  if (outcome?.kind === 'not-an-image') {
    throw new HttpError(
      415,
      'not-an-image',
      `The bytes are not a JPEG, PNG or WebP image (found: ${outcome.found}); they were discarded.`,
    );
  }
}
