/**
 * `ledger confidence <project.json> [--fleet <name>] [--draws <n>] [--seed <n>] [--json]`:
 * how sure compliance is for a fleet — per phase, period and receiver the probability that
 * the level stays at or under the limit (simulated, with its sampling error, beside the
 * analytic figure) and the 90 %-sure level; the probability that every limit is met at
 * once; and the model's assumptions in words, with the caution.
 */
import type { Command } from '../command.ts';
import { helpText, numberFlag, parseFlags, UsageError, type FlagSpecs } from '../flags.ts';
import type { Fleet } from '../../ledger/model/model.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';
import { optimiseFleet } from '../../ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../ledger/optimise/load-highs.ts';
import { complianceConfidence } from '../../ledger/uncertainty/confidence.ts';
import { BOUND_NAME, CONFIDENCE_CAUTION } from '../../ledger/uncertainty/assumptions.ts';
import { UNCERTAINTY_RULES } from '../../ledger/uncertainty/settings.ts';
import { percent, simulatedWords } from '../../ledger/uncertainty/words.ts';
import { fleetLabel, readFleetFlag } from '../fleet-flag.ts';
import { CAUTION, loadProject } from './evaluate.ts';

const specs: FlagSpecs = {
  fleet: {
    type: 'string',
    value: '<name>',
    help: 'the fleet: baseline, best (solved afresh), or a fleet stored in the project; default: the project’s assessed fleet',
  },
  draws: { type: 'string', value: '<n>', help: 'Monte Carlo draws (default: the project’s setting, 10000)' },
  seed: {
    type: 'string',
    value: '<n>',
    help: 'seed of the random stream (default: the project’s setting, 1); the same seed gives the same figures',
  },
  json: { type: 'boolean', help: 'print one JSON object' },
};

const jsonNumbers = (_k: string, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v);
const db = (x: number, width = 6) =>
  (Number.isNaN(x) ? 'n/a' : x === -Infinity ? 'silent' : x.toFixed(1)).padStart(width);
const trim = (s: string, n: number) => (s.length > n ? `${s.slice(0, n - 1)}…` : s).padEnd(n);

export const confidenceCommand: Command = {
  name: 'confidence',
  summary: 'the probability that a fleet meets each limit and every limit at once',
  help: helpText(
    'Usage: ledger confidence <project.json> [--fleet <name>] [--draws <n>] [--seed <n>] [--json]',
    'Treats each machine’s declared uncertainty K, the prediction method’s accuracy and any on-time range as spreads (the project’s uncertainty settings; printed with the figures), ' +
      'and gives per phase, period and receiver the probability that the level stays at or under the limit — by seeded Monte Carlo with its sampling error, beside an analytic approximation — ' +
      `the ${BOUND_NAME} (the level the fleet stays under with 90 % probability; not the background statistic L_A90), and the probability that every limit is met at once. ` +
      'Exit code 0 when computed, 2 for an invalid file or flag.\n\n' +
      CONFIDENCE_CAUTION,
    specs,
  ),
  async run(argv, io) {
    const { values, positionals } = parseFlags(argv, specs, 1);
    const file = positionals[0];
    if (file === undefined)
      throw new UsageError('missing project file (give its path, e.g. ledger confidence project.json)');
    const draws = numberFlag(values, 'draws', UNCERTAINTY_RULES.draws);
    const seed = numberFlag(values, 'seed', UNCERTAINTY_RULES.seed);
    const project = await loadProject(file, io, 'confidence');
    if (!project) return 2;
    const flag = readFleetFlag(project, values.fleet, 'assessed');
    const baseline = evaluateProject(project, undefined, { skipValidation: true });
    if (baseline.problems.length > 0) {
      io.err(
        `ledger confidence: ${file}: ${baseline.problems.length} problem${baseline.problems.length === 1 ? '' : 's'}; nothing computed.\n`,
      );
      for (const p of baseline.problems) io.err(`  ${p.path}  ${p.message}\n`);
      return 2;
    }
    let picked: { name: string; fleet: Fleet; outOfDate: boolean };
    if (flag.kind === 'best') {
      const best = optimiseFleet(project, baseline, { tradeOff: false }, await loadHighsSolver());
      picked = {
        name: best.feasible ? 'cheapest compliant (solved now)' : 'closest to compliance (solved now)',
        fleet: best.best.fleet,
        outOfDate: false,
      };
    } else picked = flag;
    const ev = evaluateProject(project, picked.fleet, { skipValidation: true });
    const r = complianceConfidence(project, ev, {
      ...(draws === undefined ? {} : { draws }),
      ...(seed === undefined ? {} : { seed }),
    });
    if (values.json) {
      const { model, ...rest } = r;
      io.out(
        `${JSON.stringify({ project: project.name, fleetName: picked.name, ...rest, spreads: { duties: model.duties, paths: model.paths, settings: model.settings }, caution: CONFIDENCE_CAUTION }, jsonNumbers, 2)}\n`,
      );
      return 0;
    }
    const phase = (id: string) => project.phases.find((p) => p.id === id)?.name ?? id;
    const period = (id: string) => project.periods.find((p) => p.id === id)?.name ?? id;
    const receiver = (id: string) => project.receivers.find((x) => x.id === id)?.name ?? id;
    const lines = [project.name, ''];
    lines.push(
      `How sure compliance is for ${fleetLabel(picked)}: ${r.draws.toLocaleString('en-GB')} draws, seed ${r.seed}.`,
    );
    lines.push(
      `Every limit met at once: ${simulatedWords(r.joint.probability, r.joint.standardError, r.draws)} (simulated); the cells’ analytic figures bound it between ${percent(r.joint.lowerBound)} and ${percent(r.joint.upperBound)}.`,
    );
    lines.push('');
    lines.push(
      `  ${'Phase'.padEnd(24)} ${'Period'.padEnd(14)} ${'Receiver'.padEnd(26)} ${'Level'.padStart(6)} ${'Limit'.padStart(6)} ${'Margin'.padStart(7)}  ${'P(meet), simulated'.padEnd(26)} ${'analytic'.padStart(9)}  ${BOUND_NAME} [95 % range]`,
    );
    for (const c of r.cells) {
      const s = c.simulated;
      lines.push(
        `  ${trim(phase(c.phaseId), 24)} ${trim(period(c.periodId), 14)} ${trim(receiver(c.receiverId), 26)} ${db(c.levelDb)} ${db(c.limitDb)} ${db(c.marginDb, 7)}  ${trim(simulatedWords(s.probability, s.standardError, r.draws), 26)} ${percent(c.analytic.probability).padStart(9)}  ${db(s.boundDb, 0)} dB [${db(s.boundRangeDb[0], 0)}–${db(s.boundRangeDb[1], 0)}]`,
      );
    }
    lines.push(
      '',
      'Level and margin: the ledger’s prediction (rated levels). The probabilities centre each machine on its mean level.',
      '',
      'Model (project settings; ledger confidence --help):',
    );
    for (const a of r.assumptions) lines.push(`  - ${a}`);
    lines.push('', CONFIDENCE_CAUTION, CAUTION, '');
    io.out(lines.join('\n'));
    return 0;
  },
};
