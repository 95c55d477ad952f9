/** One command-line command: `npm run --silent cutbell -- <name> ...`. */
export interface Command {
  name: string;
  /** One line for the command list. */
  summary: string;
  /** Full `--help` text: usage, options with units, an example. */
  help: string;
  /** Runs with the arguments after the command name; resolves to the exit code. */
  run(args: string[], io: CommandIo): Promise<number> | number;
}

export interface CommandIo {
  out(line: string): void;
  err(line: string): void;
  readFile(path: string): Promise<string>;
}

/** A bad input the user can fix: printed as one line, exit code 2. */
export class UsageError extends Error {
  override name = 'UsageError';
}
