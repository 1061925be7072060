/**
 * The `ledger` command line: quick calculations and batch work on project files.
 * Each command lives in its own file under ./commands and is listed here.
 */
import type { Command, Io } from './command.ts';
import { UsageError } from './flags.ts';
import { InputError } from '../core/input-error.ts';
import { commands } from './commands/index.ts';
import { escapeControls } from './terminal-text.ts';
import { progressLine } from './progress.ts';

const processIo: Io = {
  out: (t) => process.stdout.write(escapeControls(t)),
  err: (t) => process.stderr.write(escapeControls(t)),
  ...(process.stderr.isTTY ? { progress: progressLine(process.stderr) } : {}),
};

function overview(list: readonly Command[]): string {
  const rows = list.map((c) => `  ${c.name.padEnd(12)} ${c.summary}`);
  return [
    'Usage: ledger <command> [flags]',
    '',
    'Plant Noise Ledger: predicted noise levels from declared sound power, and the cheapest fleet that meets the limits.',
    '',
    'Commands:',
    ...rows,
    '',
    'ledger <command> --help describes each command.',
    'Predictions are estimates (ISO 9613-2 quotes ±3 dB); a competent acoustician and the local rules decide.',
    '',
  ].join('\n');
}

/** Runs the command line; returns the exit code. */
export async function main(argv: readonly string[], io: Io = processIo): Promise<number> {
  const [name, ...rest] = argv;
  if (name === undefined || name === '--help' || name === '-h' || name === 'help') {
    io.out(overview(commands));
    return name === undefined ? 2 : 0;
  }
  const command = commands.find((c) => c.name === name);
  if (!command) {
    io.err(`${JSON.stringify(name)}: unknown command (accepted: ${commands.map((c) => c.name).join(', ')})\n`);
    return 2;
  }
  if (rest.includes('--help') || rest.includes('-h')) {
    io.out(command.help);
    return 0;
  }
  try {
    return await command.run(rest, io);
  } catch (e) {
    io.progress?.(undefined, 1);
    if (e instanceof UsageError || e instanceof InputError) {
      io.err(`ledger ${command.name}: ${e.message}\n`);
      return 2;
    }
    const message = e instanceof Error ? e.message : String(e);
    io.err(`ledger ${command.name}: ${message}\n`);
    return 1;
  }
}
