// `heed check-cases PATH`: validate a case set (folder or zip) without importing it.
import { readCaseSet } from '../io/case-set/read-case-set';
import { CliError } from './cli-error';
import { refusalLines, summaryLines } from './format-case-set';
import { nodeSetSource } from './node-set-source';

const NOTICE = 'Heed is a research and training tool, not a medical device.';

export const runCheckCases = async (args: string[]): Promise<number> => {
  const [path, ...extra] = args;
  if (path === undefined || path.startsWith('--') || extra.length > 0) {
    throw new CliError('usage: heed check-cases PATH   (PATH: a folder holding cases.csv, or a .zip of one)');
  }
  const source = await nodeSetSource(path).catch((error: unknown) => {
    throw new CliError(error instanceof Error ? error.message : String(error));
  });
  const result = await readCaseSet(source);
  if (!result.ok) {
    for (const line of refusalLines(source.label, result.problems, result.total)) console.error(line);
    return 2;
  }
  for (const line of summaryLines(result.summary)) console.log(line);
  console.log(`The set is valid. ${NOTICE}`);
  return 0;
};
