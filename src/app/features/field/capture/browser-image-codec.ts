import type { DecodedImage, ImageCodec } from './image-downscale';

/**
 * Decoding with `createImageBitmap` (turned the way the camera held it) and encoding through a
 * canvas, which every browser the field app targets supports.
 */
export const browserImageCodec: ImageCodec = {
  async decode(blob: Blob): Promise<DecodedImage> {
    const bitmap = await createImageBitmap(blob, { imageOrientation: 'from-image' });
    return {
      width: bitmap.width,
      height: bitmap.height,
      source: bitmap,
      close: () => bitmap.close(),
    };
  },

  encodeJpeg(image, width, height, quality): Promise<Blob> {
    const canvas = document.createElement('canvas');
    canvas.width = width;
    canvas.height = height;
    const context = canvas.getContext('2d');
    if (!context) return Promise.reject(new Error('This browser cannot resize pictures'));
    context.imageSmoothingQuality = 'high';
    context.drawImage(image.source, 0, 0, width, height);
    return new Promise((resolve, reject) =>
      canvas.toBlob(
        (blob) => (blob ? resolve(blob) : reject(new Error('The picture could not be saved'))),
        'image/jpeg',
        quality,
      ),
    );
  },
};
