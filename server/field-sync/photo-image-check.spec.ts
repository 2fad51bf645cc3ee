import { checkImageBytes } from './photo-image-check';

// Minimal file signatures, from each format's specification: JPEG SOI + APP0 "JFIF"
// (ITU-T T.81 / JFIF 1.02), PNG's 8-byte signature + IHDR (ISO/IEC 15948), RIFF "WEBP" "VP8 "
// (RFC 9649), and "%PDF-" (ISO 32000).
const jpeg = Buffer.from('ffd8ffe000104a46494600010100000100010000ffd9', 'hex');
const png = Buffer.concat([
  Buffer.from('89504e470d0a1a0a0000000d49484452', 'hex'),
  Buffer.alloc(17),
]);
const webp = Buffer.concat([
  Buffer.from('RIFF\x24\x00\x00\x00WEBPVP8 ', 'latin1'),
  Buffer.alloc(24),
]);

describe('checkImageBytes', () => {
  it.each([
    ['JPEG', jpeg, 'image/jpeg', 'jpg'],
    ['PNG', png, 'image/png', 'png'],
    ['WebP', webp, 'image/webp', 'webp'],
  ])('accepts %s by its signature', async (_name, bytes, contentType, extension) => {
    expect(await checkImageBytes(bytes)).toEqual({ ok: true, contentType, extension });
  });

  it('refuses a PDF, naming what it found', async () => {
    const pdf = Buffer.from('%PDF-1.7\n%âãÏÓ\n1 0 obj\n<<>>\nendobj\n', 'latin1');
    expect(await checkImageBytes(pdf)).toEqual({ ok: false, found: 'application/pdf' });
  });

  it('refuses text that merely claims to be an image', async () => {
    expect(await checkImageBytes(Buffer.from('not really a photo'))).toEqual({
      ok: false,
      found: 'no known file format',
    });
  });
});
