// 8-bit grayscale PNG bytes, in Node and in the renderer. The image data is stored, not
// compressed (noise barely compresses: storing is several times faster for about 25% more bytes),
// so the whole file is framing: PNG chunks with CRC-32, and a zlib stream of stored deflate blocks
// with its Adler-32. Written here in one buffer, because a general encoder copies every pixel
// through a byte-at-a-time buffer and then deflates it (most of the time it took).
// Formats: PNG Specification (W3C, Second Edition) sections 5, 11.2; RFC 1950 (zlib); RFC 1951
// section 3.2.4 (stored blocks).

const SIGNATURE = [137, 80, 78, 71, 13, 10, 26, 10];
const MAX_BLOCK = 65535;

// CRC-32 of the PNG specification (Annex D): reflected polynomial 0xEDB88320, 256-entry table.
const CRC_TABLE = (() => {
  const table = new Int32Array(256);
  for (let n = 0; n < 256; n += 1) {
    let c = n;
    for (let k = 0; k < 8; k += 1) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
    table[n] = c;
  }
  return table;
})();

export const crc32 = (bytes: Uint8Array, from: number, to: number): number => {
  let c = -1;
  for (let i = from; i < to; i += 1) c = (CRC_TABLE[(c ^ (bytes[i] as number)) & 255] as number) ^ (c >>> 8);
  return (c ^ -1) >>> 0;
};

/** Adler-32 (RFC 1950 section 8.2), fed in pieces; reduced every 5552 bytes, the most that cannot overflow. */
export class Adler32 {
  private a = 1;
  private b = 0;

  update(bytes: Uint8Array, from = 0, to = bytes.length): this {
    let { a, b } = this;
    for (let start = from; start < to; start += 5552) {
      const end = Math.min(to, start + 5552);
      for (let i = start; i < end; i += 1) {
        a += bytes[i] as number;
        b += a;
      }
      a %= 65521;
      b %= 65521;
    }
    this.a = a;
    this.b = b;
    return this;
  }

  value(): number {
    return ((this.b << 16) | this.a) >>> 0;
  }
}

/** Writes one chunk's length, type and data at `at`, then its CRC; returns the end. */
const writeChunk = (out: Uint8Array, view: DataView, at: number, type: string, length: number, fill: (dataAt: number) => void): number => {
  view.setUint32(at, length);
  for (let i = 0; i < 4; i += 1) out[at + 4 + i] = type.charCodeAt(i);
  fill(at + 8);
  view.setUint32(at + 8 + length, crc32(out, at + 4, at + 8 + length));
  return at + 12 + length;
};

/**
 * A PNG of width x height 8-bit gray pixels (row by row; height defaults to width).
 * Throws RangeError on a size that is not a positive whole number or a length mismatch.
 */
export const grayPng = (pixels: Uint8Array, width: number, height = width): Uint8Array => {
  if (!Number.isInteger(width) || !Number.isInteger(height) || width < 1 || height < 1 || pixels.length !== width * height) {
    throw new RangeError(`expected ${width} x ${height} pixels, got ${pixels.length}`);
  }
  // Each row is preceded by its filter type, 0 (none); a stored block holds whole rows, so the
  // pixels are copied once, straight into place.
  const line = width + 1;
  const rowsPerBlock = Math.floor(MAX_BLOCK / line);
  if (rowsPerBlock < 1) throw new RangeError(`rows wider than ${MAX_BLOCK - 1} pixels are not supported, got ${width}`);
  const blocks = Math.ceil(height / rowsPerBlock);
  const zlibLength = 2 + 5 * blocks + height * line + 4;
  const out = new Uint8Array(SIGNATURE.length + 25 + 12 + zlibLength + 12);
  const view = new DataView(out.buffer);
  out.set(SIGNATURE, 0);
  let at = writeChunk(out, view, SIGNATURE.length, 'IHDR', 13, (d) => {
    view.setUint32(d, width);
    view.setUint32(d + 4, height);
    out.set([8, 0, 0, 0, 0], d + 8); // bit depth 8, grayscale, deflate, adaptive filters, no interlace
  });
  at = writeChunk(out, view, at, 'IDAT', zlibLength, (d) => {
    out[d] = 0x78; // deflate, 32 KiB window
    out[d + 1] = 0x01; // no dictionary, fastest; (0x78 * 256 + 0x01) % 31 === 0
    let w = d + 2;
    const adler = new Adler32();
    for (let first = 0; first < height; first += rowsPerBlock) {
      const rows = Math.min(rowsPerBlock, height - first);
      const length = rows * line;
      out[w] = first + rows === height ? 1 : 0; // BFINAL, BTYPE 00 (stored)
      view.setUint16(w + 1, length, true);
      view.setUint16(w + 3, ~length & 0xffff, true);
      for (let y = first; y < first + rows; y += 1) {
        // The filter byte is already 0; the row follows it.
        out.set(pixels.subarray(y * width, (y + 1) * width), w + 5 + (y - first) * line + 1);
      }
      adler.update(out, w + 5, w + 5 + length);
      w += 5 + length;
    }
    view.setUint32(w, adler.value());
  });
  writeChunk(out, view, at, 'IEND', 0, () => undefined);
  return out;
};
