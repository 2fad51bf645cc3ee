/** A decoded picture, ready to be drawn at another size. */
export interface DecodedImage {
  readonly width: number;
  readonly height: number;
  readonly source: CanvasImageSource;
  close(): void;
}

/** How pictures are decoded and re-encoded: the browser's in the app, a fake in unit specs. */
export interface ImageCodec {
  decode(blob: Blob): Promise<DecodedImage>;
  encodeJpeg(image: DecodedImage, width: number, height: number, quality: number): Promise<Blob>;
}

export interface DownscaleOptions {
  /** The longer side of the result, in pixels; a smaller picture is not enlarged. */
  readonly longSide: number;
  /** JPEG quality from 0 to 1. */
  readonly quality: number;
}

/** About 150–300 kB for a shelf photo: readable price tags, quick to sync on a weak network. */
export const fieldPhotoSize: DownscaleOptions = { longSide: 1280, quality: 0.8 };

/** The size that fits `width × height` within `longSide` on its longer side, keeping its shape. */
export function fitWithin(
  width: number,
  height: number,
  longSide: number,
): { width: number; height: number } {
  if (!(width > 0 && height > 0)) {
    throw new RangeError(`A picture must have a size above zero, not ${width} × ${height}`);
  }
  const scale = Math.min(1, longSide / Math.max(width, height));
  return {
    width: Math.max(1, Math.round(width * scale)),
    height: Math.max(1, Math.round(height * scale)),
  };
}

/**
 * The camera's picture as a JPEG no longer than `longSide` on either side. A file that is not
 * a picture the browser can decode is refused with a message the enumerator can act on.
 */
export async function downscaleToJpeg(
  file: Blob,
  codec: ImageCodec,
  options: DownscaleOptions = fieldPhotoSize,
): Promise<Blob> {
  let image: DecodedImage;
  try {
    image = await codec.decode(file);
  } catch {
    throw new Error('This file is not a picture the device can read. Take the photo again.');
  }
  try {
    const size = fitWithin(image.width, image.height, options.longSide);
    return await codec.encodeJpeg(image, size.width, size.height, options.quality);
  } finally {
    image.close();
  }
}
