/** Errors the command line reports as one message on stderr (no stack), with the process exit code to use. */

/** Exit codes: 0 success, 1 bad input (file, JSON, case, plan), 2 wrong usage, 130 interrupted (128 + SIGINT). */
export const EXIT_OK = 0;
export const EXIT_BAD_INPUT = 1;
export const EXIT_USAGE = 2;
export const EXIT_INTERRUPTED = 130;

export class CliError extends Error {
  constructor(
    message: string,
    readonly exitCode: number = EXIT_BAD_INPUT,
  ) {
    super(message);
    this.name = 'CliError';
  }
}

/** Wrong command line: the message is followed by the usage text of `usage`. */
export class UsageError extends CliError {
  constructor(
    message: string,
    readonly usage: string,
  ) {
    super(message, EXIT_USAGE);
    this.name = 'UsageError';
  }
}
