// An image's type from its first bytes, never from its name.

const PNG = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const JPEG = [0xff, 0xd8, 0xff];

const startsWith = (bytes: Uint8Array, magic: number[]): boolean =>
  bytes.length >= magic.length && magic.every((b, i) => bytes[i] === b);

/** 'image/png' or 'image/jpeg' by signature, or null for anything else. */
export const sniffImage = (bytes: Uint8Array): 'image/png' | 'image/jpeg' | null =>
  startsWith(bytes, PNG) ? 'image/png' : startsWith(bytes, JPEG) ? 'image/jpeg' : null;

/** A short name for what the bytes look like instead, for messages. */
export const describeBytes = (bytes: Uint8Array): string => {
  if (bytes.length === 0) return 'an empty file';
  if (startsWith(bytes, [0x47, 0x49, 0x46, 0x38])) return 'a GIF';
  if (startsWith(bytes, [0x42, 0x4d])) return 'a BMP';
  if (startsWith(bytes, [0x49, 0x49, 0x2a, 0x00]) || startsWith(bytes, [0x4d, 0x4d, 0x00, 0x2a])) return 'a TIFF';
  if (bytes.length > 132 && bytes[128] === 0x44 && bytes[129] === 0x49 && bytes[130] === 0x43 && bytes[131] === 0x4d) return 'a DICOM file';
  if (startsWith(bytes, [0x52, 0x49, 0x46, 0x46]) && bytes[8] === 0x57) return 'a WebP';
  return 'neither a PNG nor a JPEG';
};
