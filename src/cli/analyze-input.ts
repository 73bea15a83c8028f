// What `heed analyze` (and other verbs taking a read log) reads: a reads.csv, or a study bundle,
// which is verified first and whose reads.csv is then read exactly as a plain one.
import { CliError } from './cli-error';
import { looksLikeZip, readBytes } from './read-bytes';

/** The bytes of the read log: the file itself, or the verified bundle's reads.csv (parse with parseReadLogBytes, strict UTF-8). */
export const readAnalyzeInput = async (file: string): Promise<Uint8Array> => {
  const bytes = await readBytes(file);
  if (!looksLikeZip(bytes)) return bytes;
  // the bundle reader (schemas, zip, hashes) is loaded only for a bundle
  const [{ readBundle }, { faultText }, { unzipSync }, { useNativeSha256 }] = await Promise.all([
    import('../io/bundle/read'), import('../io/bundle/fault'), import('fflate'), import('./bundle-file'),
  ]);
  useNativeSha256();
  const read = readBundle(bytes);
  if (!read.ok) throw new CliError(`${file}: ${faultText(read.fault)}`);
  const reads = unzipSync(bytes, { filter: (f) => f.name === 'reads.csv' })['reads.csv'];
  if (!reads) throw new CliError(`${file}: the bundle holds no reads.csv`);
  return reads;
};
