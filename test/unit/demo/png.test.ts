// The demo's PNG writer: its checksums against Node's zlib, and its files read back by two
// independent decoders (pngjs checks every chunk CRC; its inflate checks the Adler-32).
import { crc32 as nodeCrc32, deflateSync } from 'node:zlib';
import { decode } from 'fast-png';
import { PNG } from 'pngjs';
import { Adler32, crc32, grayPng } from '../../../demo-cases/generator/png';

const bytesOf = (text: string): Uint8Array => new TextEncoder().encode(text);

/** Seeded pseudo-random pixels (a simple LCG), so the test needs no generator of ours. */
const pixelsOf = (count: number): Uint8Array => {
  const out = new Uint8Array(count);
  let state = 12345;
  for (let i = 0; i < count; i += 1) {
    state = (Math.imul(state, 1103515245) + 12345) >>> 0;
    out[i] = state >>> 24;
  }
  return out;
};

describe('PNG checksums', () => {
  it('CRC-32 gives the standard check value and agrees with Node zlib.crc32', () => {
    // 0xCBF43926: the CRC-32 check value for "123456789" (CRC catalogue, CRC-32/ISO-HDLC; from
    // memory), confirmed by Node 20 zlib.crc32('123456789').
    expect(crc32(bytesOf('123456789'), 0, 9)).toBe(0xcbf43926);
    const data = pixelsOf(70_000);
    expect(crc32(data, 0, data.length)).toBe(nodeCrc32(data));
    expect(crc32(data, 100, 5000)).toBe(nodeCrc32(data.subarray(100, 5000)));
  });

  it('Adler-32 agrees with the trailer zlib writes, fed whole or in pieces', () => {
    // zlib (Node 20 deflateSync) ends its stream with the Adler-32 of the input, big-endian.
    const trailer = (data: Uint8Array): number => Buffer.from(deflateSync(data).subarray(-4)).readUInt32BE(0);
    expect(new Adler32().update(bytesOf('Wikipedia')).value()).toBe(0x11e60398);
    const data = pixelsOf(200_000);
    expect(new Adler32().update(data).value()).toBe(trailer(data));
    const pieces = new Adler32().update(data, 0, 7).update(data, 7, 123_457).update(data, 123_457);
    expect(pieces.value()).toBe(trailer(data));
  });
});

describe('grayPng', () => {
  it.each([
    [320, 320],
    [7, 3],
    [300, 500], // several stored blocks
  ])('writes %i x %i pixels that pngjs and fast-png read back exactly', (width, height) => {
    const pixels = pixelsOf(width * height);
    const bytes = grayPng(pixels, width, height);
    const strict = PNG.sync.read(Buffer.from(bytes), { checkCRC: true });
    expect([strict.width, strict.height]).toEqual([width, height]);
    // pngjs expands gray to RGBA: every 4th byte is the gray value.
    expect(Uint8Array.from({ length: width * height }, (_, i) => strict.data[4 * i] as number)).toEqual(pixels);
    const other = decode(bytes);
    expect([other.width, other.height, other.channels, other.depth]).toEqual([width, height, 1, 8]);
    expect(Uint8Array.from(other.data)).toEqual(pixels);
  });

  it('refuses pixels that do not fill the stated size', () => {
    expect(() => grayPng(new Uint8Array(10), 4, 4)).toThrow(/expected 4 x 4 pixels, got 10/);
    expect(() => grayPng(new Uint8Array(0), 0)).toThrow(RangeError);
  });
});
