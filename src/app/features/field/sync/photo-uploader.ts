import { HttpErrorResponse } from '@angular/common/http';
import { Injectable, inject } from '@angular/core';
import type { FieldDb } from '../data/field-db';
import type { OutboxEntry } from '../data/field-records';
import { FieldStore } from '../data/field-store';
import { FieldSyncApi } from './field-sync-api';

/** Bytes per request: a chunk lost on a weak connection costs little to send again. */
export const photoChunkBytes = 256 * 1024;

/**
 * Uploads the photos of accepted interviews, resuming each where the server stopped (it says
 * how many bytes it holds), in chunks. An interview is complete when all its photos are stored;
 * its photos then leave the device.
 */
@Injectable({ providedIn: 'root' })
export class PhotoUploader {
  private readonly store = inject(FieldStore);
  private readonly api = inject(FieldSyncApi);

  /** Uploads what is pending; returns the number of photos stored in this run. */
  async uploadPending(chunkBytes = photoChunkBytes): Promise<number> {
    const db = this.store.db;
    const entries = await db.outbox.where('state').equals('photos').sortBy('queuedAt');
    let stored = 0;
    for (const entry of entries) {
      let complete = true;
      for (const { photoId } of entry.interview.photos) {
        const outcome = await this.ensureStored(db, photoId, chunkBytes).catch((error: unknown) =>
          refusedPhoto(db, entry, error),
        );
        if (outcome === 'stored-now') stored++;
        if (outcome !== 'stored-now' && outcome !== 'stored-before') complete = false;
      }
      if (complete) await markComplete(db, entry);
    }
    return stored;
  }

  private async ensureStored(
    db: FieldDb,
    photoId: string,
    chunkBytes: number,
  ): Promise<'stored-before' | 'stored-now' | 'missing'> {
    const photo = await db.photos.get(photoId);
    if (photo?.storedAt) return 'stored-before';
    // Not on this device (a correction of an interview sent from elsewhere): the server may hold it.
    if (!photo) return (await this.api.photoState(photoId)).stored ? 'stored-before' : 'missing';
    let offset = await this.api.photoOffset(photoId);
    for (;;) {
      const state = await this.sendFrom(photoId, photo.blob, offset, chunkBytes);
      await db.photos.update(photoId, {
        uploadedBytes: state.receivedBytes,
        storedAt: state.stored ? (state.storedAt ?? new Date().toISOString()) : null,
      });
      if (state.stored) return 'stored-now';
      if (state.receivedBytes <= offset) {
        throw new Error(`The server took no bytes of photo ${photoId} at offset ${offset}`);
      }
      offset = state.receivedBytes;
    }
  }

  /** One chunk; when the server already holds every byte, asks where the photo stands. */
  private async sendFrom(photoId: string, blob: Blob, offset: number, chunkBytes: number) {
    if (offset >= blob.size) return this.api.photoState(photoId);
    try {
      return await this.api.putChunk(photoId, offset, blob.slice(offset, offset + chunkBytes));
    } catch (error) {
      // The offset moved under us (an earlier chunk did arrive): ask again and carry on.
      if (error instanceof HttpErrorResponse && error.status === 409) {
        return this.api.photoState(photoId);
      }
      throw error;
    }
  }
}

/**
 * A photo the server refuses for good (too large, not an image, wrong hash) is noted on its
 * interview for the sync page, and the other photos go on; anything else (no network, a server
 * fault) stops this run so the sync retries later.
 */
async function refusedPhoto(db: FieldDb, entry: OutboxEntry, error: unknown): Promise<'refused'> {
  const permanent =
    error instanceof HttpErrorResponse && [400, 404, 413, 415, 422].includes(error.status);
  if (!permanent) throw error;
  const body = error.error as { error?: { message?: string } } | null;
  const why = body?.error?.message ?? `HTTP ${error.status}`;
  await db.outbox.update(entry.id, { reason: `A photo was refused: ${why}` });
  return 'refused';
}

/** Every photo is stored: the interview is complete and its photos leave the device. */
async function markComplete(db: FieldDb, entry: OutboxEntry): Promise<void> {
  await db.transaction('rw', db.outbox, db.photos, async () => {
    const current = await db.outbox.get(entry.id);
    if (current?.state !== 'photos' || current.queuedAt !== entry.queuedAt) return;
    await db.outbox.update(entry.id, { state: 'complete' });
    await db.photos.bulkDelete(entry.interview.photos.map((photo) => photo.photoId));
  });
}
