// The small pieces of case-set reading: CRC-32, UTF-8 line finding, paths, magic bytes.
import { crc32 as nodeCrc32 } from 'node:zlib';
import { crc32 } from '../../../../src/io/case-set/crc32';
import { sniffImage } from '../../../../src/io/case-set/magic';
import { checkImagePath } from '../../../../src/io/case-set/paths';
import { decodeUtf8 } from '../../../../src/io/case-set/text';
import { jpeg, png } from './fixtures';

describe('crc32', () => {
  it('gives the standard check value for "123456789"', () => {
    // 0xCBF43926 is the published check value of CRC-32/ISO-HDLC (the zip CRC); from memory,
    // and confirmed against Node's zlib.crc32 below.
    expect(crc32(new TextEncoder().encode('123456789'))).toBe(0xcbf43926);
  });
  it('matches node:zlib crc32 (Node 20.20) on random bytes', () => {
    const bytes = new Uint8Array(10_000).map((_, i) => (i * 7919 + (i >> 3)) & 0xff);
    expect(crc32(bytes)).toBe(nodeCrc32(bytes));
  });
});

describe('decodeUtf8', () => {
  it('drops a BOM', () => {
    expect(decodeUtf8(new Uint8Array([0xef, 0xbb, 0xbf, 0x61]))).toEqual({ ok: true, text: 'a' });
  });
  it('names the line of the first bad byte, not a cut multi-byte character', () => {
    const bytes = new Uint8Array([...new TextEncoder().encode('a\nü\nb\n'), 0xe9, 0x0a]);
    expect(decodeUtf8(bytes)).toEqual({ ok: false, line: 4 });
  });
});

describe('checkImagePath', () => {
  it.each([
    ['img/a.png', 'img/a.png'], ['./img/a.png', 'img/a.png'], ['img//a.png', 'img/a.png'],
    ['img/x/../a.png', 'img/a.png'], [' img/a.png ', 'img/a.png'],
  ])('accepts %j as %j', (raw, path) => {
    expect(checkImagePath(raw)).toEqual({ ok: true, path });
  });
  it.each(['', '/a.png', 'C:/a.png', 'c:a.png', '//server/a.png', '../a.png', 'img/../../a.png', 'img\\a.png', '.', 'img/..'])('refuses %j', (raw) => {
    expect(checkImagePath(raw).ok).toBe(false);
  });
});

describe('sniffImage', () => {
  it('reads the type from the bytes', () => {
    expect(sniffImage(png())).toBe('image/png');
    expect(sniffImage(jpeg())).toBe('image/jpeg');
    expect(sniffImage(new Uint8Array([0x89, 0x50, 0x4e]))).toBeNull();
    expect(sniffImage(new Uint8Array())).toBeNull();
  });
});
