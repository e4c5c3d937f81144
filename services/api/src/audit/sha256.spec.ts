import { createHash } from 'node:crypto';
import { sha256Hex } from './sha256';

describe('sha256Hex', () => {
  it('gives the published digests', () => {
    // Source: FIPS 180-2, Appendix B.1 (one-block message "abc").
    expect(sha256Hex('abc')).toBe(
      'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad',
    );
    // Source: FIPS 180-2, Appendix B.2 (multi-block message).
    expect(sha256Hex('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe(
      '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1',
    );
  });

  it('hashes the UTF-8 bytes of non-ASCII text', () => {
    // "é" is the two bytes C3 A9 in UTF-8.
    const bytes = createHash('sha256')
      .update(Buffer.from([0xc3, 0xa9]))
      .digest('hex');
    expect(sha256Hex('é')).toBe(bytes);
  });
});
