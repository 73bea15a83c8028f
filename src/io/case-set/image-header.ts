/**
 * Checks that an image's bytes can be shown, from its structure, before any pixel is decoded:
 * a PNG's chunks (each CRC-32 checked) from IHDR to IEND, with its size in IHDR (PNG
 * specification, 3rd edition, sections 5.3 and 11.2.1); a JPEG's segments up to the first scan,
 * with its size in the start-of-frame segment (ITU-T T.81, B.2.2). The size is bounded so that
 * showing the image cannot exhaust memory: each side at most MAX_SIDE pixels and at most
 * MAX_DECODED_BYTES once decoded to 4 bytes a pixel (what a browser holds per image).
 * Example: imageHeader(png4x3, 'image/png') -> { ok: true, width: 4, height: 3 }.
 */
import { crc32 } from './crc32';

export const MAX_SIDE = 16_384;
export const MAX_DECODED_BYTES = 256 * 1024 * 1024;

export type ImageHeader = { ok: true; width: number; height: number } | { ok: false; reason: string };

const bad = (reason: string): ImageHeader => ({ ok: false, reason });

const sized = (width: number, height: number): ImageHeader => {
  if (width === 0 || height === 0) return bad('its header gives a width or height of 0');
  if (width > MAX_SIDE || height > MAX_SIDE) return bad(`it is ${width} x ${height} pixels; each side may be at most ${MAX_SIDE.toLocaleString('en')}`);
  if (width * height * 4 > MAX_DECODED_BYTES) {
    return bad(`it is ${width} x ${height} pixels, over ${Math.round(MAX_DECODED_BYTES / 1048576)} MB once decoded`);
  }
  return { ok: true, width, height };
};

const ascii = (bytes: Uint8Array, at: number): string => String.fromCharCode(bytes[at] ?? 0, bytes[at + 1] ?? 0, bytes[at + 2] ?? 0, bytes[at + 3] ?? 0);

const pngHeader = (bytes: Uint8Array): ImageHeader => {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  let at = 8;
  let header: ImageHeader | null = null;
  let data = false;
  while (at + 12 <= bytes.length) {
    const length = view.getUint32(at);
    const type = ascii(bytes, at + 4);
    if (!/^[A-Za-z]{4}$/.test(type)) return bad(`it is damaged (no valid PNG chunk at byte ${at})`);
    if (at + 12 + length > bytes.length) return bad(`it is cut short (chunk ${type} runs past the end)`);
    if (crc32(bytes.subarray(at + 4, at + 8 + length)) !== view.getUint32(at + 8 + length)) return bad(`it is damaged (chunk ${type} fails its CRC check)`);
    if (header === null) {
      if (type !== 'IHDR' || length !== 13) return bad('it is damaged (a PNG must start with its IHDR header)');
      header = sized(view.getUint32(at + 8), view.getUint32(at + 12));
      if (!header.ok) return header;
    } else if (type === 'IDAT') data = true;
    else if (type === 'IEND') return data ? header : bad('it has no image data (no IDAT chunk)');
    at += 12 + length;
  }
  return bad(header === null ? 'it is damaged (only the PNG signature is readable)' : 'it is cut short (no IEND chunk)');
};

// Start-of-frame markers C0-CF except C4 (DHT), C8 (JPG) and CC (DAC).
const isFrame = (marker: number): boolean => marker >= 0xc0 && marker <= 0xcf && marker !== 0xc4 && marker !== 0xc8 && marker !== 0xcc;

const jpegHeader = (bytes: Uint8Array): ImageHeader => {
  let at = 2;
  let header: ImageHeader | null = null;
  while (at + 4 <= bytes.length) {
    if (bytes[at] !== 0xff) return bad(`it is damaged (no JPEG marker at byte ${at})`);
    const marker = bytes[at + 1] as number;
    if (marker === 0xff) {
      at += 1; // fill byte
      continue;
    }
    if (marker === 0x01 || (marker >= 0xd0 && marker <= 0xd7)) {
      at += 2; // markers without a length
      continue;
    }
    if (marker === 0xd9) break;
    const length = ((bytes[at + 2] as number) << 8) | (bytes[at + 3] as number);
    if (length < 2 || at + 2 + length > bytes.length) return bad('it is cut short or damaged (a segment runs past the end)');
    if (isFrame(marker)) {
      if (length < 8) return bad('it is damaged (start-of-frame too short)');
      const height = ((bytes[at + 5] as number) << 8) | (bytes[at + 6] as number);
      const width = ((bytes[at + 7] as number) << 8) | (bytes[at + 8] as number);
      header = sized(width, height);
      if (!header.ok) return header;
    }
    if (marker === 0xda) return header ?? bad('it is damaged (image data before its size)');
    at += 2 + length;
  }
  return bad(header === null ? 'it is damaged (no start-of-frame with its size)' : 'it is cut short (no image data)');
};

/** The image's size when its structure is sound and within the limits; else why not. */
export const imageHeader = (bytes: Uint8Array, mime: 'image/png' | 'image/jpeg'): ImageHeader =>
  mime === 'image/png' ? pngHeader(bytes) : jpegHeader(bytes);
