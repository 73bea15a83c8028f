// Strict UTF-8 decoding: a file in another encoding is refused rather than silently garbled.

export type Decoded = { ok: true; text: string } | { ok: false; line: number };

/** Decodes UTF-8 (a leading BOM is dropped); on failure gives the 1-based line of the first bad byte. */
export const decodeUtf8 = (bytes: Uint8Array): Decoded => {
  try {
    const text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
    return { ok: true, text };
  } catch {
    return { ok: false, line: firstBadLine(bytes) };
  }
};

// A UTF-8 multi-byte sequence never contains 0x0A, so each line can be checked alone.
const firstBadLine = (bytes: Uint8Array): number => {
  const decoder = new TextDecoder('utf-8', { fatal: true });
  let line = 1;
  let start = 0;
  for (let i = 0; i <= bytes.length; i += 1) {
    if (i === bytes.length || bytes[i] === 0x0a) {
      try {
        decoder.decode(bytes.subarray(start, i));
      } catch {
        return line;
      }
      line += 1;
      start = i + 1;
    }
  }
  return line - 1;
};
