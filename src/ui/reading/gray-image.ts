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
