/**
 * `ledger export <project.json> -o <out.xlsx>`: writes the auditable workbook — inputs,
 * assumptions, paths, contributions, levels (live formulas with cached results), shortlist
 * and compliance statement. By default the optimiser runs first and the workbook shows its
 * cheapest compliant fleet; `--fleet baseline` shows the baselines instead, `--fleet <name>` a
 * fleet stored in the project, and
 * `--skip-optimiser` leaves the optimiser out (baseline fleet, no saving figures).
 * An invalid file lists every problem with its JSON path and exits 2; nothing is written.
 */
import { writeFile } from 'node:fs/promises';
import { resolve } from 'node:path';
import type { Command } from '../command.ts';
import { helpText, numberFlag, parseFlags, UsageError, type FlagSpecs } from '../flags.ts';
import type { OptimiseResult } from '../../ledger/model/results.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';
import { optimiseFleet, type OptimiseProgress } from '../../ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../ledger/optimise/load-highs.ts';
import { CAUTION, loadProject } from './evaluate.ts';
import { FLAG_RULES } from '../flag-rules.ts';
import { workbookTextChanges } from '../../io/workbook/text-changes.ts';
import { fleetLabel, readFleetFlag } from '../fleet-flag.ts';

const specs: FlagSpecs = {
  'time-limit': {
    type: 'string',
    value: '<s>',
    help: 'seconds the solver may search before it stops with the best fleet found (default 30)',
  },
  output: {
    type: 'string',
    value: '<out.xlsx>',
    help: 'the workbook to write (also -o); an existing file is replaced',
  },
  fleet: {
    type: 'string',
    value: '<name>',
    help: 'the fleet the workbook evaluates: best (solved afresh, the default), baseline, or a fleet stored in the project',
  },
  'skip-optimiser': {
    type: 'boolean',
    help: 'do not run the optimiser (baseline fleet, no saving over the best-buy-first fleet)',
  },
};

/**
 * The command line's flag parser reads long flags only: `-o <file>` and `-o=<file>` are
 * rewritten to `--output` here, before parsing.
 */
export function expandShortOutput(argv: readonly string[]): string[] {
  return argv.map((a) => (a === '-o' ? '--output' : a.startsWith('-o=') ? `--output=${a.slice(3)}` : a));
}

export const exportCommand: Command = {
  name: 'export',
  summary: 'write the auditable workbook (.xlsx): inputs, assumptions, live level formulas, shortlist, compliance',
  help: helpText(
    'Usage: ledger export <project.json> -o <out.xlsx> [--fleet best|baseline|<stored fleet>] [--skip-optimiser] [--time-limit <s>]',
    'Writes a workbook a reviewer can check: the inputs (yellow cells), every assumption in named cells, the path terms, ' +
      'each machine’s contribution at each receiver, the phase × receiver levels as live formulas (with cached results), ' +
      'the fleets and rankings with costs and the saving over the best-buy-first fleet, a compliance statement per phase and receiver, and the checks (Directive 2000/14/EC permissible levels, stand-in levels, operator exposure). ' +
      'Change a CHOSEN candidate on the inputs sheet and a spreadsheet program recalculates the levels. ' +
      'When standard error is a terminal, the share done is shown there while it works. Exit code 0 when written, 2 for an invalid file or flag.\n\n' +
      CAUTION,
    specs,
  ),
  async run(argv, io) {
    const { values, positionals } = parseFlags(expandShortOutput(argv), specs, 1);
    const file = positionals[0];
    if (file === undefined)
      throw new UsageError('missing project file (give its path, e.g. ledger export project.json -o project.xlsx)');
    const output = values.output;
    if (typeof output !== 'string' || output.trim() === '')
      throw new UsageError('--output: missing (give the workbook to write, e.g. -o project.xlsx)');
    if (!/\.xlsx$/i.test(output))
      throw new UsageError(
        `--output: ${JSON.stringify(output)} does not end in .xlsx (give a workbook name, e.g. project.xlsx)`,
      );
    if (resolve(output) === resolve(file))
      throw new UsageError(`--output: ${JSON.stringify(output)} is the project file itself (give another name)`);
    const skip = values['skip-optimiser'] === true;
    const timeLimitS = numberFlag(values, 'time-limit', FLAG_RULES.timeLimitS);

    const project = await loadProject(file, io, 'export');
    if (!project) return 2;
    const flag = readFleetFlag(project, values.fleet, 'best');
    const baseline = evaluateProject(project, undefined, { skipValidation: true });
    if (baseline.problems.length > 0) {
      io.err(
        `ledger export: ${file}: ${baseline.problems.length} problem${baseline.problems.length === 1 ? '' : 's'}; nothing written.\n`,
      );
      for (const p of baseline.problems) io.err(`  ${p.path}  ${p.message}\n`);
      return 2;
    }
    let optimise: OptimiseResult | undefined;
    if (!skip)
      optimise = optimiseFleet(
        project,
        baseline,
        {
          tradeOff: false,
          ...(timeLimitS === undefined ? {} : { timeLimitS }),
          ...(io.progress
            ? { onProgress: (p: OptimiseProgress) => io.progress?.(`solving: ${p.step}`, p.fraction) }
            : {}),
        },
        await loadHighsSolver(),
      );
    const solvedBest = optimise !== undefined && flag.kind === 'best';
    const evaluation = solvedBest
      ? evaluateProject(project, optimise!.best.fleet, { skipValidation: true })
      : flag.kind === 'named'
        ? evaluateProject(project, flag.fleet, { skipValidation: true })
        : baseline;
    const fleetName = solvedBest
      ? optimise!.feasible
        ? 'cheapest compliant (solved now)'
        : 'closest to compliance (solved now)'
      : flag.kind === 'named'
        ? flag.name
        : 'baseline';

    const { exportWorkbook } = await import('../../io/workbook/index.ts');
    const bytes = await exportWorkbook(project, {
      evaluation,
      fleetName,
      ...(optimise ? { optimise } : {}),
      ...(io.progress
        ? { onProgress: (p: { step: string; fraction: number }) => io.progress?.(p.step, p.fraction) }
        : {}),
    });
    io.progress?.(undefined, 1);
    try {
      await writeFile(output, bytes);
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code;
      throw new UsageError(
        `--output: ${JSON.stringify(output)} cannot be written (${code === 'ENOENT' ? 'its folder does not exist' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : 'write failed'}; give a writable path)`,
      );
    }
    const changes = workbookTextChanges(project);
    if (changes.length > 0) {
      io.err(
        `ledger export: warning: ${changes.length} text${changes.length === 1 ? '' : 's'} could not be written as typed (a workbook cannot hold control characters or half a surrogate pair); the project file is unchanged:\n`,
      );
      for (const c of changes) io.err(`  ${c.place}: ${c.change}\n`);
    }
    const over = evaluation.matrix.filter((m) => m.over).length;
    const which = solvedBest
      ? optimise!.feasible
        ? 'the cheapest compliant fleet'
        : 'the fleet closest to compliance (no fleet meets every limit)'
      : flag.kind === 'named'
        ? fleetLabel(flag)
        : 'the baseline fleet';
    io.out(
      `Wrote ${output} (${Math.round(bytes.byteLength / 1024)} kB) with ${which}: ${evaluation.matrix.length} phase × receiver level${evaluation.matrix.length === 1 ? '' : 's'}, ${over} over the limit.\n` +
        'The levels are live formulas on the inputs and assumptions sheets; open the workbook in a spreadsheet program to check them.\n' +
        `${CAUTION}\n`,
    );
    return 0;
  },
};
