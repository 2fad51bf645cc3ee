import { sha256Hex } from './content-hash';

describe('sha256Hex', () => {
  it('hashes "abc" to the published digest', async () => {
    // FIPS 180-2, appendix B.1 (one-block message "abc"), published value.
    expect(await sha256Hex(new TextEncoder().encode('abc'))).toBe(
      'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad',
    );
  });

  it('hashes the empty input to the well-known empty digest', async () => {
    // SHA-256 of zero bytes: NIST CAVP SHA256ShortMsg, Len = 0, published value.
    expect(await sha256Hex(new Uint8Array(0))).toBe(
      'e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855',
    );
  });
});
