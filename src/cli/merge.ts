// `heed merge A B ... --out C`: merges verified bundles of one study (same design fingerprint)
// into one bundle; refuses two different answers under one read id, naming both.
import { writeFile } from 'node:fs/promises';
import { BundleMergeError, mergeSnapshots } from '../io/bundle/merge';
import { readsOfChain } from '../io/bundle/snapshot';
import { writeBundle } from '../io/bundle/write';
import { cannotWrite, CliError } from './cli-error';
import { readBytes, verifiedBundle } from './bundle-file';

const USAGE = 'usage: heed merge A B ... --out C';

export const runMerge = async (args: string[]): Promise<number> => {
  const inputs: string[] = [];
  let out: string | undefined;
  for (let i = 0; i < args.length; i++) {
    const a = args[i] as string;
    if (a === '--out') out = args[++i];
    else if (a.startsWith('--')) throw new CliError(`merge: unknown option ${a}; ${USAGE}`);
    else inputs.push(a);
  }
  if (out === undefined || out.startsWith('--')) throw new CliError(`merge needs --out C; ${USAGE}`);
  if (inputs.length === 0) throw new CliError(USAGE);
  const snapshots = [];
  for (const file of inputs) snapshots.push({ label: file, snapshot: verifiedBundle(file, await readBytes(file)).snapshot });
  let merged;
  try {
    merged = mergeSnapshots(snapshots);
  } catch (error) {
    if (error instanceof BundleMergeError) throw new CliError(`merge refused: ${error.message}`);
    throw error;
  }
  try {
    await writeFile(out, writeBundle(merged));
  } catch (error) {
    throw cannotWrite(out, error);
  }
  const reads = [...readsOfChain(merged.events).values()].filter((r) => r.read.final !== null).length;
  console.log(`merged ${inputs.length} bundle${inputs.length === 1 ? '' : 's'} into ${out}: ${reads} reads, ${merged.events.length} events.`);
  return 0;
};
