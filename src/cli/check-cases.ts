import { CliError } from './cli-error';

// Not built yet: the work on this verb replaces this file.
export const runCheckCases = async (_args: string[]): Promise<number> => {
  throw new CliError('check-cases is not built yet');
};
