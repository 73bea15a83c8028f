/** A decoded grayscale image, ready for window/level rendering. */
export type GrayImage = { width: number; height: number; gray: Uint8ClampedArray };

/** Decodes PNG/JPEG bytes in the browser and keeps the luminance (images are grayscale). */
export const decodeGray = async (bytes: Uint8Array, mime: string): Promise<GrayImage> => {
  const bitmap = await createImageBitmap(new Blob([new Uint8Array(bytes)], { type: mime }));
  const canvas = new OffscreenCanvas(bitmap.width, bitmap.height);
  const context = canvas.getContext('2d');
  if (!context) throw new Error('no 2D canvas');
  context.drawImage(bitmap, 0, 0);
  bitmap.close();
  const rgba = context.getImageData(0, 0, canvas.width, canvas.height).data;
  const gray = new Uint8ClampedArray(canvas.width * canvas.height);
  for (let i = 0, j = 0; j < gray.length; i += 4, j++) {
    gray[j] = (0.299 * (rgba[i] ?? 0) + 0.587 * (rgba[i + 1] ?? 0) + 0.114 * (rgba[i + 2] ?? 0)) | 0;
  }
  return { width: canvas.width, height: canvas.height, gray };
};

/** The window a case opens with: the full 8-bit range. */
export const DEFAULT_LEVEL = 128;
export const DEFAULT_WIDTH = 256;

// one prepared frame per image (the last window drawn, or the default one made ahead)
const prepared = new WeakMap<GrayImage, { level: number; width: number; pixels: ImageData }>();

/**
 * The image's RGBA pixels at this window, made once and kept with the image: the next case's are
 * made ahead (prepareWindow after its image is decoded), so drawing it is a single putImageData.
 */
export const windowedPixels = (image: GrayImage, level: number, width: number): ImageData => {
  const kept = prepared.get(image);
  if (kept && kept.level === level && kept.width === width) return kept.pixels;
  const pixels = kept?.pixels ?? new ImageData(image.width, image.height);
  applyWindow(image, level, width, pixels.data);
  prepared.set(image, { level, width, pixels });
  return pixels;
};

/** Makes the default window's pixels ahead of time (see windowedPixels). */
export const prepareWindow = (image: GrayImage): void => { windowedPixels(image, DEFAULT_LEVEL, DEFAULT_WIDTH); };

/**
 * Window/level: grey values in [level - width/2, level + width/2] are stretched over the
 * display range; below is black, above is white. Writes RGBA into `out`.
 */
export const applyWindow = (image: GrayImage, level: number, width: number, out: Uint8ClampedArray): void => {
  const lut = new Uint8ClampedArray(256);
  const low = level - width / 2;
  for (let v = 0; v < 256; v++) lut[v] = ((v - low) / Math.max(1, width)) * 255;
  const { gray } = image;
  for (let j = 0, i = 0; j < gray.length; j++, i += 4) {
    const g = lut[gray[j] ?? 0] ?? 0;
    out[i] = g; out[i + 1] = g; out[i + 2] = g; out[i + 3] = 255;
  }
};
