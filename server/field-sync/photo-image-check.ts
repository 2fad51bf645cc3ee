import { fileTypeFromBuffer } from 'file-type';
import type { PhotoContentType } from '@shared/field-sync/photo-manifest';

const extensions: Record<PhotoContentType, string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
};

/** What the bytes really are: an accepted image format with its file extension, or why not. */
export type ImageCheck =
  | { ok: true; contentType: PhotoContentType; extension: string }
  | { ok: false; found: string };

/**
 * Looks at the bytes' signature (not the label the device gave) and accepts only JPEG, PNG and
 * WebP; anything else — a PDF, a script, random bytes — is refused.
 */
export async function checkImageBytes(bytes: Uint8Array): Promise<ImageCheck> {
  const detected = await fileTypeFromBuffer(bytes);
  const mime = detected?.mime as PhotoContentType | undefined;
  if (mime && mime in extensions) {
    return { ok: true, contentType: mime, extension: extensions[mime] };
  }
  return { ok: false, found: detected ? detected.mime : 'no known file format' };
}
