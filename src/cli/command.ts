/** The shape of one command of the `ledger` command line. */
export interface Io {
  /** Writes to standard output (a newline is not added). */
  out(text: string): void;
  /** Writes to standard error (a newline is not added). */
  err(text: string): void;
  /**
   * Shows how far long work has gone, on one line of standard error rewritten in place; present only when standard
   * error is a terminal (./progress.ts). `undefined` step: the work is over, the line is cleared.
   */
  progress?(step: string | undefined, fraction: number): void;
}

export interface Command {
  /** The word typed after `ledger`. */
  name: string;
  /** One line for the command list. */
  summary: string;
  /** The full --help text. */
  help: string;
  /** Runs the command; returns the exit code (0 done, 1 computed but a limit is not met where the command says so, 2 bad input). */
  run(argv: string[], io: Io): Promise<number>;
}
