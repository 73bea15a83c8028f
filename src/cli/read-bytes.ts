// A file's bytes for the CLI verbs, and whether they are a zip; kept apart from the bundle
// reader so a verb given a plain reads.csv never loads (or initialises) it.
import { readFile } from 'node:fs/promises';
import { CliError } from './cli-error';

export const readBytes = async (file: string): Promise<Uint8Array> => {
  try {
    const data = await readFile(file);
    // a view of the Buffer's memory, not a copy: a million-read log is 140 MB
    return new Uint8Array(data.buffer, data.byteOffset, data.byteLength);
  } catch (error) {
    const code = error instanceof Error && 'code' in error ? String(error.code) : 'unreadable';
    throw new CliError(`${file}: cannot read the file (${code === 'ENOENT' ? 'no such file' : code})`);
  }
};

/** A zip starts with a local file header (PK\x03\x04) or, when empty, the end record (PK\x05\x06). */
export const looksLikeZip = (bytes: Uint8Array): boolean =>
  bytes.length >= 4 && bytes[0] === 0x50 && bytes[1] === 0x4b && (bytes[2] === 3 || bytes[2] === 5);
