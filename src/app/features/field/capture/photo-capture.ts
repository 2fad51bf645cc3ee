import { Injectable, inject } from '@angular/core';
import { maxPhotoBytes } from '@shared/field-sync/photo-manifest';
import type { StoredPhoto } from '../data/field-records';
import { FieldStore } from '../data/field-store';
import { browserImageCodec } from './browser-image-codec';
import { sha256Hex } from './content-hash';
import { downscaleToJpeg, fieldPhotoSize } from './image-downscale';

/**
 * Turns a camera picture into a stored field photo: downscaled to a JPEG in the browser, hashed
 * (the server checks the hash), and kept in IndexedDB until its upload is complete.
 */
@Injectable({ providedIn: 'root' })
export class PhotoCapture {
  private readonly store = inject(FieldStore);

  async keep(interviewId: string, file: Blob): Promise<StoredPhoto> {
    const jpeg = await downscaleToJpeg(file, browserImageCodec, fieldPhotoSize);
    if (jpeg.size > maxPhotoBytes) {
      throw new Error('This photo is too detailed to send. Take it again, closer to the tag.');
    }
    const photo: StoredPhoto = {
      id: crypto.randomUUID(),
      interviewId,
      blob: jpeg,
      sha256: await sha256Hex(await jpeg.arrayBuffer()),
      byteSize: jpeg.size,
      contentType: 'image/jpeg',
      takenAt: new Date().toISOString(),
      uploadedBytes: 0,
      storedAt: null,
    };
    await this.store.db.photos.add(photo);
    return photo;
  }

  async get(photoId: string): Promise<StoredPhoto | undefined> {
    return this.store.db.photos.get(photoId);
  }

  async drop(photoId: string): Promise<void> {
    await this.store.db.photos.delete(photoId);
  }
}
