import { createHash } from 'node:crypto';
import { sha256Hex } from '../../../src/core/chain';

// Reference: Node's native SHA-256 (OpenSSL), `createHash('sha256').update(text, 'utf8').digest('hex')`;
// the app's @noble/hashes digest, with its reused encoding buffer, must give the same 64 hex digits.
const native = (data: string | Uint8Array): string => createHash('sha256').update(data).digest('hex');

describe('sha256Hex (the app\'s SHA-256 of text and bytes)', () => {
  it('matches the native digest for texts of every length around the block and buffer sizes, in any script', () => {
    const pieces = ['a', 'é', '€', '😀', '\n', '"', '\u0000'];
    const lengths = [0, 1, 55, 56, 63, 64, 65, 119, 120, 1000, 65_535, 65_536, 65_537, 200_000];
    for (const [k, length] of lengths.entries()) {
      let text = '';
      for (let i = 0; text.length < length; i++) text += pieces[(i * (k + 3)) % pieces.length];
      text = text.slice(0, length);
      expect(sha256Hex(text), `length ${length}`).toBe(native(text));
    }
  });

  it('gives the same digest for a short text after a longer one (nothing left over in the reused buffer)', () => {
    expect(sha256Hex('x'.repeat(5000))).toBe(native('x'.repeat(5000)));
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'); // FIPS 180-2, appendix B.1
  });

  it('encodes a lone surrogate as U+FFFD, as TextEncoder does', () => {
    expect(sha256Hex('a\ud800b')).toBe(native(Buffer.from('a\ufffdb', 'utf8')));
  });

  it('hashes bytes as they are', () => {
    const bytes = Uint8Array.from({ length: 300 }, (_, i) => (i * 37) % 256);
    expect(sha256Hex(bytes)).toBe(native(bytes));
  });
});
