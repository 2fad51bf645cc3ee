import { HttpError } from '../http/http-error';
import { chunkOffset } from './chunk-offset';

const refusal = (run: () => unknown) => {
  try {
    run();
  } catch (error) {
    if (error instanceof HttpError) return error;
  }
  throw new Error('expected an HttpError');
};

describe('chunkOffset', () => {
  it('reads ?offset=N', () => {
    expect(chunkOffset({ offset: '262144' }, undefined, 10)).toBe(262144);
  });

  it('reads the start of a Content-Range whose length matches the body', () => {
    expect(chunkOffset({}, 'bytes 100-199/1000', 100)).toBe(100);
    expect(chunkOffset({}, 'bytes 0-9/*', 10)).toBe(0);
  });

  it('refuses a negative or fractional offset, naming the parameter', () => {
    expect(refusal(() => chunkOffset({ offset: '-1' }, undefined, 1)).issues?.[0].path).toBe(
      'offset',
    );
    expect(refusal(() => chunkOffset({ offset: '1.5' }, undefined, 1)).status).toBe(400);
  });

  it('refuses a missing offset and a range that does not match the body', () => {
    expect(refusal(() => chunkOffset({}, undefined, 1)).message).toMatch(/offset=N/);
    expect(refusal(() => chunkOffset({}, 'bytes 0-99/1000', 50)).message).toMatch(/100 bytes/);
  });
});
