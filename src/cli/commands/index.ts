/** Every command of the `ledger` command line, in the order `ledger --help` lists them. */
import type { Command } from '../command.ts';
import { limitCommand } from './limit.ts';
import { exposureCommand } from './exposure.ts';

export const commands: readonly Command[] = [
  limitCommand,
  exposureCommand,
];
