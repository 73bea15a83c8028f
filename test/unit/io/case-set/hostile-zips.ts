// Generators of hostile zips for the tests and the bench (never committed as files). A tiny zip
// writer, so entries can point where a normal writer never would.
import { crc32 } from '../../../../src/io/case-set/crc32';
import { deflateSync } from 'fflate';

export type RawEntry = {
  name: string;
  /** the bytes as stored (already deflated when method is 8) */
  stored: Uint8Array;
  method: 0 | 8;
  crc: number;
  /** the size written in the directory (may lie) */
  size: number;
};

/** The PNG signature then `size` zero bytes: compresses about 1000:1 under deflate. */
export const zeroPng = (size: number): Uint8Array => {
  const bytes = new Uint8Array(size);
  bytes.set([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return bytes;
};

export const deflatedEntry = (name: string, data: Uint8Array, declaredSize = data.length): RawEntry => ({
  name, stored: deflateSync(data, { level: 1 }), method: 8, crc: crc32(data), size: declaredSize,
});

const enc = new TextEncoder();

/**
 * A zip whose local entries are `entries`, and whose central directory lists them plus `aliases`:
 * extra names pointing at the local header of an existing entry (index into entries).
 */
export const rawZip = (entries: readonly RawEntry[], aliases: readonly { name: string; of: number }[] = []): Uint8Array => {
  const locals: Uint8Array[] = [];
  const offsets: number[] = [];
  let at = 0;
  for (const e of entries) {
    const name = enc.encode(e.name);
    const head = new Uint8Array(30 + name.length);
    const v = new DataView(head.buffer);
    v.setUint32(0, 0x04034b50, true);
    v.setUint16(4, 20, true);
    v.setUint16(8, e.method, true);
    v.setUint32(14, e.crc, true);
    v.setUint32(18, e.stored.length, true);
    v.setUint32(22, e.size, true);
    v.setUint16(26, name.length, true);
    head.set(name, 30);
    offsets.push(at);
    locals.push(head, e.stored);
    at += head.length + e.stored.length;
  }
  const dirStart = at;
  const central: Uint8Array[] = [];
  const listed = [...entries.map((e, i) => ({ e, name: e.name, offset: offsets[i] ?? 0 })),
    ...aliases.map((a) => ({ e: entries[a.of] as RawEntry, name: a.name, offset: offsets[a.of] ?? 0 }))];
  for (const { e, name: text, offset } of listed) {
    const name = enc.encode(text);
    const rec = new Uint8Array(46 + name.length);
    const v = new DataView(rec.buffer);
    v.setUint32(0, 0x02014b50, true);
    v.setUint16(4, 20, true);
    v.setUint16(6, 20, true);
    v.setUint16(10, e.method, true);
    v.setUint32(16, e.crc, true);
    v.setUint32(20, e.stored.length, true);
    v.setUint32(24, e.size, true);
    v.setUint16(28, name.length, true);
    v.setUint32(42, offset, true);
    rec.set(name, 46);
    central.push(rec);
    at += rec.length;
  }
  const end = new Uint8Array(22);
  const v = new DataView(end.buffer);
  v.setUint32(0, 0x06054b50, true);
  v.setUint16(8, listed.length, true);
  v.setUint16(10, listed.length, true);
  v.setUint32(12, at - dirStart, true);
  v.setUint32(16, dirStart, true);
  const out = new Uint8Array(at + 22);
  let p = 0;
  for (const part of [...locals, ...central, end]) {
    out.set(part, p);
    p += part.length;
  }
  return out;
};

/** cases.csv naming `count` images img/0.png ... (one case each). */
export const casesFor = (count: number): Uint8Array => {
  const lines = ['case_id,finding,truth,image'];
  for (let i = 0; i < count; i += 1) lines.push(`C${i},target,${i % 2},img/${i}.png`);
  return enc.encode(`${lines.join('\n')}\n`);
};

/**
 * The overlapping-entry bomb: one deflated image of `size` bytes, listed `count` times under
 * different names, plus a cases.csv naming them all. Declared sizes are honest per entry.
 */
export const overlappingBomb = (count: number, size: number): Uint8Array => {
  const csv = casesFor(count);
  const image = deflatedEntry('img/0.png', zeroPng(size));
  const aliases = [];
  for (let i = 1; i < count; i += 1) aliases.push({ name: `img/${i}.png`, of: 1 });
  return rawZip([deflatedEntry('cases.csv', csv), image], aliases);
};
