import { downscaleToJpeg, fitWithin, type DecodedImage, type ImageCodec } from './image-downscale';

/** A codec that records what it was asked to do instead of drawing (jsdom has no canvas). */
function fakeCodec(width: number, height: number, readable = true) {
  const calls: { width: number; height: number; quality: number }[] = [];
  const closed: boolean[] = [];
  const codec: ImageCodec = {
    decode: () => {
      if (!readable) return Promise.reject(new Error('not an image'));
      const image: DecodedImage = {
        width,
        height,
        source: {} as CanvasImageSource,
        close: () => closed.push(true),
      };
      return Promise.resolve(image);
    },
    encodeJpeg: (_image, w, h, quality) => {
      calls.push({ width: w, height: h, quality });
      return Promise.resolve(new Blob(['jpeg'], { type: 'image/jpeg' }));
    },
  };
  return { codec, calls, closed };
}

describe('fitWithin', () => {
  it('brings the longer side of a landscape photo down to the limit, keeping its shape', () => {
    expect(fitWithin(4000, 3000, 1280)).toEqual({ width: 1280, height: 960 });
  });

  it('does the same for a portrait photo', () => {
    expect(fitWithin(3024, 4032, 1280)).toEqual({ width: 960, height: 1280 });
  });

  it('never enlarges a small picture', () => {
    expect(fitWithin(640, 480, 1280)).toEqual({ width: 640, height: 480 });
  });

  it('refuses a picture without a size', () => {
    expect(() => fitWithin(0, 100, 1280)).toThrow('size above zero, not 0 × 100');
  });
});

describe('downscaleToJpeg', () => {
  it('re-encodes a camera photo as a JPEG at 1280 px and quality 0.8, then frees it', async () => {
    const { codec, calls, closed } = fakeCodec(4608, 3456);
    const out = await downscaleToJpeg(new Blob(['raw']), codec);
    expect(out.type).toBe('image/jpeg');
    expect(calls).toEqual([{ width: 1280, height: 960, quality: 0.8 }]);
    expect(closed).toEqual([true]);
  });

  it('tells the enumerator to take the photo again when the file is not a picture', async () => {
    const { codec } = fakeCodec(1, 1, false);
    await expect(downscaleToJpeg(new Blob(['text']), codec)).rejects.toThrow(
      'not a picture the device can read',
    );
  });
});
