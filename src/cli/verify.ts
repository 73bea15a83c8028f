// `heed verify BUNDLE`: checks a study bundle's manifest (sizes, SHA-256) and hash chain; exit 0
// when intact, 2 with one line naming the file and line of the first fault.
import { CliError } from './cli-error';
import { readBytes, verifiedBundle } from './bundle-file';

export const runVerify = async (args: string[]): Promise<number> => {
  const [file, ...rest] = args;
  if (file === undefined || file.startsWith('--') || rest.length > 0) throw new CliError('usage: heed verify BUNDLE');
  const { manifest } = verifiedBundle(file, await readBytes(file));
  console.log(`${file}: intact. Study ${manifest.study_id}: ${manifest.chain.reads} reads, ${manifest.chain.events} events, chain head ${manifest.chain.head}.`);
  return 0;
};
