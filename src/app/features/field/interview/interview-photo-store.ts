import { DestroyRef, Injectable, inject } from '@angular/core';
import type { BlockPhotoStore } from '../../field-blocks/block-view-context';
import { PhotoCapture } from '../capture/photo-capture';

/** The runner's photo store: photos of one interview, kept in the device database. */
@Injectable()
export class InterviewPhotoStore implements BlockPhotoStore {
  private readonly capture = inject(PhotoCapture);
  private readonly urls = new Map<string, string>();
  interviewId = '';

  constructor() {
    inject(DestroyRef).onDestroy(() => this.urls.forEach((url) => URL.revokeObjectURL(url)));
  }

  async keep(file: File): Promise<string> {
    if (!this.interviewId) throw new Error('No interview is open');
    const photo = await this.capture.keep(this.interviewId, file);
    return photo.id;
  }

  async urlOf(photoId: string): Promise<string | null> {
    const held = this.urls.get(photoId);
    if (held) return held;
    const photo = await this.capture.get(photoId);
    if (!photo) return null;
    const url = URL.createObjectURL(photo.blob);
    this.urls.set(photoId, url);
    return url;
  }

  async drop(photoId: string): Promise<void> {
    const url = this.urls.get(photoId);
    if (url) URL.revokeObjectURL(url);
    this.urls.delete(photoId);
    await this.capture.drop(photoId);
  }
}
