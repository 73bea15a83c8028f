// Reading a study bundle from disk for the CLI verbs: the bytes, whether they are a zip, and the
// verified snapshot (a fault becomes a CliError naming the bundle, the file inside and the line).
import { createHash } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { useSha256 } from '../core/chain';
import { faultText } from '../io/bundle/fault';
import { readBundle } from '../io/bundle/read';
import type { BundleManifest } from '../io/bundle/write';
import type { StudySnapshot } from '../io/bundle/snapshot';
import { CliError } from './cli-error';

export const readBytes = async (file: string): Promise<Uint8Array> => {
  try {
    return new Uint8Array(await readFile(file));
  } catch (error) {
    const code = error instanceof Error && 'code' in error ? String(error.code) : 'unreadable';
    throw new CliError(`${file}: cannot read the file (${code === 'ENOENT' ? 'no such file' : code})`);
  }
};

/** A zip starts with a local file header (PK\x03\x04) or, when empty, the end record (PK\x05\x06). */
export const looksLikeZip = (bytes: Uint8Array): boolean =>
  bytes.length >= 4 && bytes[0] === 0x50 && bytes[1] === 0x4b && (bytes[2] === 3 || bytes[2] === 5);

export const verifiedBundle = (file: string, bytes: Uint8Array): { snapshot: StudySnapshot; manifest: BundleManifest } => {
  useNativeSha256();
  const read = readBundle(bytes);
  if (!read.ok) throw new CliError(`${file}: ${faultText(read.fault)}`);
  return read;
};

/** Node's native SHA-256 for the bundle verbs: the same digests as the app's, several times faster. */
export const useNativeSha256 = (): void => {
  useSha256((data) => createHash('sha256').update(data).digest('hex'));
};
