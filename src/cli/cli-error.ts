/** Bad input to the CLI: printed as one line and exit code 2, never a stack trace. */
export class CliError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CliError';
  }
}

/** "cannot write PATH: why", for a file the CLI was asked to write. */
export const cannotWrite = (path: string, error: unknown): CliError =>
  new CliError(`cannot write ${path}: ${error instanceof Error ? error.message : String(error)}`);
