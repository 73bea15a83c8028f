// 8-bit grayscale PNG bytes, with a pure-JS encoder that runs in Node and in the renderer.
import { encode } from 'fast-png';

// Noise barely compresses: storing (level 0) is several times faster for about 25% more bytes.
const LEVEL = 0;

export const grayPng = (pixels: Uint8Array, size: number): Uint8Array =>
  encode({ width: size, height: size, data: pixels, depth: 8, channels: 1 }, { zlib: { level: LEVEL } });
