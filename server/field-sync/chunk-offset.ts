import { HttpError } from '../http/http-error';

const contentRangePattern = /^bytes (\d+)-(\d+)\/(\d+|\*)$/;

/**
 * The offset of a chunk's first byte: the `offset` query parameter, or else the start of a
 * `Content-Range: bytes START-END/TOTAL` header (END must match the body's length).
 */
export function chunkOffset(
  query: unknown,
  contentRange: string | undefined,
  bodyLength: number,
): number {
  const raw = (query as Record<string, unknown> | undefined)?.['offset'];
  if (raw !== undefined) {
    if (typeof raw !== 'string' || !/^\d{1,10}$/.test(raw)) {
      throw new HttpError(400, 'invalid-input', 'The offset must be a whole number of bytes.', [
        { path: 'offset', message: 'A whole number of bytes, 0 or more' },
      ]);
    }
    return Number(raw);
  }
  const match = contentRange ? contentRangePattern.exec(contentRange) : null;
  if (!match) {
    throw new HttpError(
      400,
      'invalid-input',
      'Say where the chunk starts: ?offset=N or a Content-Range: bytes START-END/TOTAL header.',
      [{ path: 'offset', message: 'Missing' }],
    );
  }
  const [start, end] = [Number(match[1]), Number(match[2])];
  if (end - start + 1 !== bodyLength) {
    throw new HttpError(
      400,
      'invalid-input',
      `The Content-Range covers ${end - start + 1} bytes but the body has ${bodyLength}.`,
      [{ path: 'Content-Range', message: 'Does not match the body length' }],
    );
  }
  return start;
}
