// What `heed analyze` (and other verbs taking a read log) reads: a reads.csv, or a study bundle,
// which is verified first and whose reads.csv is then read exactly as a plain one.
import { readBundle } from '../io/bundle/read';
import { faultText } from '../io/bundle/fault';
import { unzipSync } from 'fflate';
import { CliError } from './cli-error';
import { looksLikeZip, readBytes, useNativeSha256 } from './bundle-file';

export const readAnalyzeInput = async (file: string): Promise<string> => {
  const bytes = await readBytes(file);
  if (!looksLikeZip(bytes)) return new TextDecoder('utf-8', { ignoreBOM: true }).decode(bytes);
  useNativeSha256();
  const read = readBundle(bytes);
  if (!read.ok) throw new CliError(`${file}: ${faultText(read.fault)}`);
  const reads = unzipSync(bytes, { filter: (f) => f.name === 'reads.csv' })['reads.csv'];
  if (!reads) throw new CliError(`${file}: the bundle holds no reads.csv`);
  return new TextDecoder().decode(reads);
};
