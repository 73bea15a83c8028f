// Reading a study bundle from disk for the CLI verbs: the bytes, whether they are a zip, and the
// verified snapshot (a fault becomes a CliError naming the bundle, the file inside and the line).
import { createHash } from 'node:crypto';
import { useSha256 } from '../core/chain';
import { faultText } from '../io/bundle/fault';
import { readBundle } from '../io/bundle/read';
import type { BundleManifest } from '../io/bundle/write';
import type { StudySnapshot } from '../io/bundle/snapshot';
import { CliError } from './cli-error';

export { looksLikeZip, readBytes } from './read-bytes';

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
