// The `heed` command: parse the verb, hand off to its module, map bad input to exit 2.
import { CliError } from './cli-error';

const USAGE = `usage:
  heed analyze FILE [--json] [--seed N] [--boot N]   statistics of a reads.csv
    [--include-withdrawn]                            keep the reads of withdrawn readers
  heed check-cases PATH                              validate a case set (folder or zip)
  heed demo [--out DIR]                              write the demo case set
  heed report FILE --reader ID [--out F.html] [--pdf F.pdf]
                                                     one reader's private feedback report
  heed verify BUNDLE                                 check a study bundle's hashes and chain
  heed merge A B ... --out C                         merge bundles of one study from several workstations
  heed simulate [--readers N] [--seed S] --out PATH  a demo study read by simulated readers, as a bundle
  heed plan [--design study.json] [--readers N] ...  dry-run a design: how precise its answers will be (--help)
Heed is a research and training tool, not a medical device.`;

type Verb = (args: string[]) => Promise<number>;

const verbs: Record<string, () => Promise<Verb>> = {
  analyze: async () => (await import('./analyze')).runAnalyze,
  'check-cases': async () => (await import('./check-cases')).runCheckCases,
  demo: async () => (await import('./demo')).runDemo,
  report: async () => (await import('./report')).runReport,
  verify: async () => (await import('./verify')).runVerify,
  merge: async () => (await import('./merge')).runMerge,
  simulate: async () => (await import('./simulate')).runSimulate,
  plan: async () => (await import('./plan')).runPlanCommand,
};

const main = async (argv: string[]): Promise<number> => {
  const [verb, ...rest] = argv;
  if (verb === undefined || verb === '--help' || verb === '-h') {
    console.log(USAGE);
    return verb === undefined ? 2 : 0;
  }
  const load = verbs[verb];
  if (!load) throw new CliError(`unknown command "${verb}"; try heed --help`);
  return (await load())(rest);
};

// A reader that stops early (`heed analyze FILE --json | head`) closes the pipe: that is not a
// failure of heed, so leave quietly instead of crashing on the unhandled write error.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (error: NodeJS.ErrnoException) => {
    if (error.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw error;
  });
}

main(process.argv.slice(2)).then(
  (code) => { process.exitCode = code; },
  (error: unknown) => {
    if (error instanceof CliError) {
      console.error(`heed: ${error.message}`);
      process.exitCode = 2;
    } else {
      console.error(error);
      process.exitCode = 1;
    }
  },
);
