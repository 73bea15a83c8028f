import { CliError } from './cli-error';

// Not built yet: the work on this verb replaces this file.
export const runAnalyze = async (_args: string[]): Promise<number> => {
  throw new CliError('analyze is not built yet');
};
