import { InjectionToken } from '@angular/core';
import type { BidLevel } from '@shared/questionnaire/bid-design';

/** What a block view needs beyond its block and answer. */
export interface BlockViewContext {
  /** The study's currency and locale, for amounts typed and shown. */
  readonly currency: string;
  readonly locale: string;
  /** The bid drawn for a dichotomous-choice block (null in a preview: the first bid is shown). */
  readonly bid: BidLevel | null;
  /** Fixes a random-start ladder's first price for one interview. */
  readonly seed: string;
}

export const previewContext: BlockViewContext = {
  currency: 'USD',
  locale: 'en-US',
  bid: null,
  seed: 'preview',
};

/**
 * Where photo blocks keep the pictures taken: the field app stores them (downscaled, hashed) in
 * the device database; the default keeps them in memory for previews.
 */
export interface BlockPhotoStore {
  /** Keeps the camera's file and answers the photo's id. */
  keep(file: File): Promise<string>;
  /** A URL to show the photo, or null when the device no longer holds it. */
  urlOf(photoId: string): Promise<string | null>;
  drop(photoId: string): Promise<void>;
}

export const BLOCK_PHOTO_STORE = new InjectionToken<BlockPhotoStore>('block photo store', {
  factory: () => memoryPhotoStore(),
});

function memoryPhotoStore(): BlockPhotoStore {
  const urls = new Map<string, string>();
  return {
    keep: (file) => {
      const id = crypto.randomUUID();
      urls.set(id, URL.createObjectURL(file));
      return Promise.resolve(id);
    },
    urlOf: (id) => Promise.resolve(urls.get(id) ?? null),
    drop: (id) => {
      const url = urls.get(id);
      if (url) URL.revokeObjectURL(url);
      urls.delete(id);
      return Promise.resolve();
    },
  };
}
