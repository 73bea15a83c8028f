// `heed demo [--out DIR] [--seed N] [--cases N]`: write the demo case set, then check and summarise it.
import { mkdir, writeFile } from 'node:fs/promises';
import { dirname, join } from 'node:path';
import { generateDemoCaseSet } from '../../demo-cases/generator/generate';
import { readCaseSet } from '../io/case-set/read-case-set';
import { CliError } from './cli-error';
import { problemLine, summaryLines } from './format-case-set';
import { folderSource } from './node-set-source';

const USAGE = 'usage: heed demo [--out DIR] [--seed N] [--cases N]';

type DemoArgs = { out: string; seed?: number; cases?: number };

const parse = (args: string[]): DemoArgs => {
  const parsed: DemoArgs = { out: join('demo-cases', 'out') };
  for (let i = 0; i < args.length; i += 2) {
    const flag = args[i];
    const value = args[i + 1];
    if (value === undefined || value.startsWith('--')) throw new CliError(`${flag} needs a value; ${USAGE}`);
    if (flag === '--out') parsed.out = value;
    else if (flag === '--seed' || flag === '--cases') {
      const n = Number(value);
      if (!Number.isInteger(n)) throw new CliError(`${flag} must be a whole number, got "${value}"`);
      if (flag === '--seed') parsed.seed = n;
      else parsed.cases = n;
    } else throw new CliError(`unknown option ${flag}; ${USAGE}`);
  }
  return parsed;
};

export const runDemo = async (args: string[]): Promise<number> => {
  const options = parse(args);
  if (options.cases !== undefined && (options.cases < 2 || options.cases > 2000)) {
    throw new CliError(`--cases must be from 2 to 2000, got ${options.cases}`);
  }
  const set = generateDemoCaseSet({
    ...(options.seed === undefined ? {} : { seed: options.seed }),
    ...(options.cases === undefined ? {} : { cases: options.cases }),
  });
  try {
    await mkdir(join(options.out, 'images'), { recursive: true });
    for (const image of set.images) {
      const target = join(options.out, image.path);
      await mkdir(dirname(target), { recursive: true });
      await writeFile(target, image.bytes);
    }
    await writeFile(join(options.out, 'cases.csv'), set.csv);
  } catch (error) {
    throw new CliError(`cannot write the demo set to ${options.out}: ${error instanceof Error ? error.message : String(error)}`);
  }
  // Read back what was written, so the summary describes the files on disk.
  const source = folderSource(options.out);
  const result = await readCaseSet(source);
  if (!result.ok) {
    console.error(result.problems[0] ? problemLine(source.label, result.problems[0]) : 'the written demo set does not check');
    return 1;
  }
  console.log(`wrote the demo case set to ${options.out}`);
  for (const line of summaryLines(result.summary)) console.log(line);
  console.log('The images are generated placeholders in a fictional scenario, not patient data.');
  console.log('Heed is a research and training tool, not a medical device.');
  return 0;
};
