/** Every command of the `ledger` command line, in the order `ledger --help` lists them. */
import type { Command } from '../command.ts';
import { levelCommand } from './level.ts';
import { absorptionCommand } from './absorption.ts';
import { powerCommand } from './power.ts';
import { backCommand } from './back.ts';
import { limitCommand } from './limit.ts';
import { exposureCommand } from './exposure.ts';
import { importCommand } from './import.ts';
import { exampleCommand } from './example.ts';
import { evaluateCommand } from './evaluate.ts';
import { optimiseCommand } from './optimise.ts';
import { confidenceCommand } from './confidence.ts';
import { exportCommand } from './export.ts';
import { clausesCommand } from './clauses.ts';
import { registerCommand } from './register.ts';
import { compareCommand } from './compare.ts';
import { mapCommand } from './map.ts';

export const commands: readonly Command[] = [
  levelCommand,
  absorptionCommand,
  powerCommand,
  backCommand,
  limitCommand,
  exposureCommand,
  importCommand,
  exampleCommand,
  evaluateCommand,
  optimiseCommand,
  confidenceCommand,
  clausesCommand,
  exportCommand,
  mapCommand,
  registerCommand,
  compareCommand,
];
