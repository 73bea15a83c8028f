/** Bad input to the CLI: printed as one line and exit code 2, never a stack trace. */
export class CliError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'CliError';
  }
}
