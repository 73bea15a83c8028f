import { CliError } from './cli-error';

// Not built yet: the work on this verb replaces this file.
export const runDemo = async (_args: string[]): Promise<number> => {
  throw new CliError('demo is not built yet');
};
