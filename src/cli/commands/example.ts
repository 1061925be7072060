/** `ledger example`: prints the invented demo project file, to start a project from. */
import type { Command } from '../command.ts';
import { helpText, parseFlags, type FlagSpecs } from '../flags.ts';
import { demoProject } from '../../ledger/model/demo.ts';
import { serializeProject } from '../../ledger/file/project-file.ts';

const specs: FlagSpecs = {};

export const exampleCommand: Command = {
  name: 'example',
  summary: 'print the demo project file (an invented site) to start from',
  help: helpText(
    'Usage: ledger example > project.json',
    'Prints the demo project as a project file: an invented site with three phases, four receivers, twelve duties and their candidate machines. Every name in it is made up.',
    specs,
  ),
  async run(argv, io) {
    parseFlags(argv, specs);
    io.out(serializeProject(demoProject()));
    return 0;
  },
};
