/**
 * `ledger map <project.json> --phase <id> [--fleet <name>] [--spacing <m>] [--height <m>]
 * [--step <dB>] [--limit-of <receiver id>] -o <out.svg|out.csv>`: the level map of one phase
 * (free field, L_Aeq,T or the rating level L_Ar,T) by the same engine as `ledger evaluate`,
 * written as the plan with its bands and isolines (SVG) or as the grid of levels (CSV: x, y, level).
 */
import { writeFile } from 'node:fs/promises';
import { resolve } from 'node:path';
import type { Command } from '../command.ts';
import { helpText, numberFlag, parseFlags, UsageError, type FlagSpecs } from '../flags.ts';
import { FLAG_RULES } from '../flag-rules.ts';
import { loadProject, CAUTION } from './evaluate.ts';
import { readFleetFlag } from '../fleet-flag.ts';
import { levelGrid } from '../../ledger/map/level-grid.ts';
import { isolineLevels, DEFAULT_ISOLINE_STEP_DB } from '../../ledger/map/contours.ts';
import { limitLine } from '../../ledger/map/limit-line.ts';
import { defaultSpacingM, fitBox, gridOver, placedPoints } from '../../ledger/map/map-bounds.ts';
import { dutiesLeftOff } from '../../ledger/map/map-project.ts';
import { mapCsv, mapSvg } from '../../io/map/map-svg.ts';

const specs: FlagSpecs = {
  phase: { type: 'string', value: '<id>', help: 'the phase whose level is mapped (its id)' },
  fleet: {
    type: 'string',
    value: '<name>',
    help: 'baseline or a fleet stored in the project; default: the project’s assessed fleet',
  },
  spacing: { type: 'string', value: '<m>', help: 'grid spacing in metres (default: about 100 points across the plan)' },
  height: { type: 'string', value: '<m>', help: 'height of the grid points above ground, m (default 4)' },
  step: { type: 'string', value: '<dB>', help: `isolines every so many dB (default ${DEFAULT_ISOLINE_STEP_DB})` },
  'limit-of': {
    type: 'string',
    value: '<receiver id>',
    help: 'draw this receiver’s limit as a heavier dashed line (a façade receiver’s at the limit less 3 dB)',
  },
  output: {
    type: 'string',
    value: '<out.svg|out.csv>',
    help: 'the file to write (also -o): .svg for the map, .csv for the grid of levels',
  },
};

const MAX_POINTS = 250_000;

export const mapCommand: Command = {
  name: 'map',
  summary: 'level map of a phase over the site plan (SVG), or its grid of levels (CSV)',
  help: helpText(
    'Usage: ledger map <project.json> --phase <id> [--fleet <name>] [--spacing <m>] [--height <m>] [--step <dB>] [--limit-of <receiver id>] -o <out.svg|out.csv>',
    'Computes the free-field level of the phase (no façade term; L_Aeq,T in the phase’s own period, or the rating level L_Ar,T where a character penalty applies) ' +
      'on a grid over the plan, each point by the same engine as ledger evaluate (barriers on the plan screen it as they screen receivers), and writes the plan with filled bands and isolines (SVG) or the grid (CSV: x, y, level in dB). ' +
      'Exit code 0 when written, 2 for an invalid file or flag.\n\n' +
      CAUTION,
    specs,
  ),
  async run(argv, io) {
    const { values, positionals } = parseFlags(
      argv.map((a) => (a === '-o' ? '--output' : a.startsWith('-o=') ? `--output=${a.slice(3)}` : a)),
      specs,
      1,
    );
    const file = positionals[0];
    if (file === undefined)
      throw new UsageError('missing project file (give its path, e.g. ledger map project.json --phase ph1 -o map.svg)');
    const output = values.output;
    if (typeof output !== 'string' || output.trim() === '')
      throw new UsageError('--output: missing (give the file to write, e.g. -o map.svg or -o map.csv)');
    const kind = /\.svg$/i.test(output) ? 'svg' : /\.csv$/i.test(output) ? 'csv' : undefined;
    if (!kind)
      throw new UsageError(
        `--output: ${JSON.stringify(output)} does not end in .svg or .csv (give e.g. map.svg or map.csv)`,
      );
    if (resolve(output) === resolve(file))
      throw new UsageError(`--output: ${JSON.stringify(output)} is the project file itself (give another name)`);
    const heightM = numberFlag(values, 'height', FLAG_RULES.mapHeightM) ?? 4;
    const spacingFlag = numberFlag(values, 'spacing', FLAG_RULES.mapSpacingM);
    const stepDb = numberFlag(values, 'step', FLAG_RULES.isolineStepDb) ?? DEFAULT_ISOLINE_STEP_DB;

    const project = await loadProject(file, io, 'map');
    if (!project) return 2;
    const phaseId = values.phase;
    if (typeof phaseId !== 'string' || phaseId.trim() === '')
      throw new UsageError(
        `--phase: missing (give a phase id: ${project.phases.map((p) => JSON.stringify(p.id)).join(', ')})`,
      );
    const phase = project.phases.find((p) => p.id === phaseId);
    if (!phase)
      throw new UsageError(
        `--phase: ${JSON.stringify(phaseId)} is not a phase of this project (use one of ${project.phases.map((p) => JSON.stringify(p.id)).join(', ')})`,
      );
    const flag = readFleetFlag(project, values.fleet, 'assessed');
    if (flag.kind !== 'named')
      throw new UsageError(
        '--fleet: best is not offered here (use baseline or a fleet stored in the project; ledger optimise --save stores the cheapest one)',
      );
    const limitOf = values['limit-of'];
    if (limitOf !== undefined && !project.receivers.some((r) => r.id === limitOf)) {
      throw new UsageError(
        `--limit-of: ${JSON.stringify(limitOf)} is not a receiver of this project (use one of ${project.receivers.map((r) => JSON.stringify(r.id)).join(', ')})`,
      );
    }
    const box = fitBox(placedPoints(project), 0.08);
    const spacingM = spacingFlag ?? defaultSpacingM(box);
    const { nx, ny } = gridOver(box, spacingM);
    if (nx * ny > MAX_POINTS)
      throw new UsageError(
        `--spacing: ${spacingM} m gives ${nx * ny} points over the plan (give a wider spacing: at most ${MAX_POINTS} points)`,
      );
    const grid = levelGrid(project, {
      phaseId: phase.id,
      fleet: flag.fleet,
      heightM,
      spacingM,
      ...gridOver(box, spacingM),
    });
    const limit = typeof limitOf === 'string' ? limitLine(project, limitOf, phase.id) : undefined;
    const text =
      kind === 'csv'
        ? mapCsv(grid)
        : mapSvg(project, grid, {
            box,
            levels: isolineLevels(grid, stepDb),
            ...(limit ? { limit } : {}),
            title: `${project.name}: ${phase.name}, ${flag.name} fleet`,
          });
    try {
      await writeFile(output, text);
    } catch (e) {
      throw new UsageError(
        `--output: ${JSON.stringify(output)} cannot be written (${(e as NodeJS.ErrnoException).code ?? 'error'}; give a path in a folder you may write to)`,
      );
    }
    const computed = grid.levelsDb.filter((v) => Number.isFinite(v)).length;
    const leftOff = dutiesLeftOff(project, phase.id);
    if (leftOff.length > 0)
      io.err(
        `ledger map: left off the map (distances stated per receiver, no place on the site grid): ${leftOff.join(', ')}\n`,
      );
    io.out(
      `Wrote ${output}: ${phase.name}, ${flag.name} fleet, ${nx} × ${ny} points every ${spacingM} m at ${heightM} m (${computed} computed).\n`,
    );
    return 0;
  },
};
