/** Every command of the `ledger` command line, in the order `ledger --help` lists them. */
import type { Command } from '../command.ts';

export const commands: readonly Command[] = [];
