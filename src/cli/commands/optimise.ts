/**
 * `ledger optimise <project.json> [--budget <amount>] [--json]`: the cheapest fleet that
 * meets every limit (proven by HiGHS), its levels and margins, the hand method's fleet and
 * what the exact fleet saves over it, and the trade-off curve of cost against worst margin.
 * An invalid file lists every problem with its JSON path and exits 2; nothing is computed.
 * Exit code 1 when no fleet meets every limit (the closest one is still printed).
 * With `--confidence <p>`: the cheapest fleet meeting every limit at once with probability p
 * (./optimise-confidence.ts).
 */
import type { Command } from '../command.ts';
import { helpText, numberFlag, parseFlags, UsageError, type FlagSpecs } from '../flags.ts';
import { FLAG_RULES } from '../flag-rules.ts';
import { writeFile } from 'node:fs/promises';
import type { Fleet, NamedFleet, Project } from '../../ledger/model/model.ts';
import type { Evaluation, FleetOutcome, OptimiseResult } from '../../ledger/model/results.ts';
import { OPTIMISER_FLEET, inputsFingerprint, withAssessedFleet, withFleet } from '../../ledger/model/fleets.ts';
import { serializeProject } from '../../ledger/file/project-file.ts';
import { cellQuantity } from '../../ledger/model/results.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';
import { formatMoney } from '../../ledger/costs/money.ts';
import { optimiseFleet, type OptimiseProgress } from '../../ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../ledger/optimise/load-highs.ts';
import { CAUTION, loadProject } from './evaluate.ts';
import { own } from '../../ledger/model/own.ts';
import { CONFIDENCE_RULE, runConfidence } from './optimise-confidence.ts';
import { UNCERTAINTY_RULES } from '../../ledger/uncertainty/settings.ts';

const specs: FlagSpecs = {
  'time-limit': {
    type: 'string',
    value: '<s>',
    help: 'seconds the solver may search before it stops with the best fleet found (default 30)',
  },
  budget: {
    type: 'string',
    value: '<amount>',
    help: 'upper limit on the fleet’s total cost, in the project’s currency',
  },
  'ignore-clauses': { type: 'boolean', help: 'do not honour the project’s tender clauses (limits at receivers only)' },
  confidence: {
    type: 'string',
    value: '<p>',
    help: 'find the cheapest fleet that meets every limit at once with this probability (0.01 to 0.9999, e.g. 0.9), verified by simulation, and what it costs over the deterministic optimum (tender clauses are not honoured in this search)',
  },
  draws: {
    type: 'string',
    value: '<n>',
    help: 'with --confidence: Monte Carlo draws of the verification (default: the project’s setting, 10000)',
  },
  seed: {
    type: 'string',
    value: '<n>',
    help: 'with --confidence: seed of the verification (default: the project’s setting, 1)',
  },
  frontier: {
    type: 'string',
    value: '<file.csv|file.json>',
    help: 'trace the exact frontier — every fleet that no other fleet beats on both cost and worst margin, from the cheapest fleet to the quietest — in place of the 0.5 dB curve, and write it to this file (CSV or JSON by its ending)',
  },
  json: { type: 'boolean', help: 'print one JSON object' },
  save: {
    type: 'string',
    value: '<project.json>',
    help: `also write the project with the fleet found stored as "${OPTIMISER_FLEET}" and made the assessed fleet (may be the input file itself)`,
  },
};

const jsonNumbers = (_k: string, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v);
const db = (x: number | undefined, width = 6) =>
  (x === undefined
    ? '—'
    : Number.isNaN(x)
      ? 'n/a'
      : x === -Infinity
        ? 'silent'
        : x === Infinity
          ? '—'
          : x.toFixed(1)
  ).padStart(width);
const signed = (x: number | undefined) =>
  x === undefined || Number.isNaN(x)
    ? '—'
    : !Number.isFinite(x)
      ? 'no limit'
      : `${x > 0 ? '+' : x < 0 ? '−' : ''}${Math.abs(x).toFixed(1)}`;
const trim = (s: string, n: number) => (s.length > n ? `${s.slice(0, n - 1)}…` : s).padEnd(n);

/** A boundary point's receiver id ("@boundary/<clause>/<k>") in words. */
const boundaryWords = (id: string) => {
  const m = /^@boundary\/.+\/(\d+)$/.exec(id);
  return m ? `boundary point ${Number(m[1]) + 1}` : id;
};

function labels(project: Project) {
  const candidate = new Map(project.candidates.map((c) => [c.id, c.label]));
  return {
    candidate: (id: string | undefined) => (id === undefined ? '—' : (candidate.get(id) ?? id)),
    receiver: (id: string) => project.receivers.find((r) => r.id === id)?.name ?? boundaryWords(id),
    phase: (id: string) => project.phases.find((p) => p.id === id)?.name ?? id,
  };
}

function fleetText(project: Project, fleet: Fleet, ev: Evaluation): string[] {
  const name = labels(project);
  const money = (x: number) => formatMoney(x, project.currency);
  const lines = [`  ${'Duty'.padEnd(36)} ${'Candidate'.padEnd(40)} ${'Cost'.padStart(11)}`];
  for (const d of project.duties) {
    const id = own(fleet, d.id) as string;
    const changed = id !== d.baselineCandidateId ? `  (instead of ${name.candidate(d.baselineCandidateId)})` : '';
    lines.push(
      `  ${trim(d.name, 36)} ${trim(name.candidate(id), 40)} ${money(own(ev.costs, id)?.total ?? NaN).padStart(11)}${changed}`,
    );
  }
  return lines;
}

function matrixText(project: Project, chosen: Evaluation, baseline: Evaluation): string[] {
  const name = labels(project);
  const periodName = (id: string) => project.periods.find((p) => p.id === id)?.name ?? id;
  const lines = [
    `  ${'Phase'.padEnd(28)} ${'Period'.padEnd(16)} ${'Receiver'.padEnd(32)} ${'Qty'.padEnd(6)} ${'Level'.padStart(6)} ${'Limit'.padStart(6)} ${'Margin'.padStart(7)} ${'Baseline'.padStart(9)}`,
  ];
  chosen.matrix.forEach((cell, i) => {
    const base = baseline.matrix[i];
    const verdict =
      cell.limitDb === undefined
        ? 'no limit for this period'
        : Number.isNaN(cell.levelDb)
          ? 'not computed'
          : cell.over
            ? `OVER by ${(-(cell.marginDb as number)).toFixed(1)} dB`
            : 'within the limit';
    const rating =
      cell.levelAeqDb !== undefined ? `  [LAeq,T ${db(cell.levelAeqDb, 0)} + penalty ${db(cell.penaltyDb, 0)}]` : '';
    lines.push(
      `  ${trim(cell.ownPeriod ? name.phase(cell.phaseId) : `  ↳ ${name.phase(cell.phaseId)}`, 28)} ${trim(periodName(cell.periodId), 16)} ${trim(name.receiver(cell.receiverId), 32)} ${trim(cellQuantity(cell).replace('_', ''), 6)} ${db(cell.levelDb)} ${db(cell.limitDb)} ${signed(cell.marginDb).padStart(7)} ${db(base?.levelDb, 9)}  ${verdict}${rating}`,
    );
  });
  if (chosen.matrix.some((c) => c.levelAeqDb !== undefined))
    lines.push('  LAr,T: rating level (ISO 1996-1) = LAeq,T + character penalty, compared with the limit.');
  if (chosen.matrix.some((c) => !c.ownPeriod))
    lines.push('  ↳ the same phase’s working hours in another period than its own, assessed over that period.');
  for (const n of chosen.notes) lines.push(`  Note: ${n.message}`);
  return lines;
}

function outcomeLine(project: Project, o: FleetOutcome): string {
  return `cost ${formatMoney(o.cost, project.currency)}, worst margin ${signed(o.worstMarginDb)} dB`;
}

function humanText(
  project: Project,
  r: OptimiseResult,
  chosen: Evaluation,
  baseline: Evaluation,
  budget: number | undefined,
  exactTable = false,
): string {
  const money = (x: number) => formatMoney(x, project.currency);
  const name = labels(project);
  const lines = [project.name, ''];
  lines.push(
    r.feasible
      ? `Cheapest fleet that meets every limit${r.clauses && r.clauses.honoured.length > 0 ? ' and tender clause' : ''}${budget !== undefined ? ` within the budget of ${money(budget)}` : ''}: ${money(r.best.cost)}${r.proven ? ', proven optimal (HiGHS)' : ', best found (not proven optimal)'}.`
      : `NO FLEET MEETS EVERY LIMIT${budget !== undefined ? ` within the budget of ${money(budget)}` : ''}. Closest fleet (smallest largest exceedance, then least cost): ${money(r.best.cost)}.`,
  );
  lines.push(
    `Baseline fleet: ${outcomeLine(project, r.baseline)}${r.baseline.over.length > 0 ? `, ${r.baseline.over.length} phase × receiver cell${r.baseline.over.length === 1 ? '' : 's'} over` : ''}.`,
  );
  if (r.clauses) {
    if (r.clauses.honoured.length > 0)
      lines.push(
        `Tender clauses honoured as constraints: ${r.clauses.honoured.join(', ')} (ledger clauses --fleet best answers each).`,
      );
    for (const u of r.clauses.unmet) lines.push(`${u.name} cannot be met and is left out: ${u.reason}.`);
  }
  if (!r.feasible) {
    lines.push('Still over with this fleet:');
    for (const o of r.best.over)
      lines.push(
        `  ${o.clause ? `${o.clause}, ` : ''}${name.receiver(o.receiverId)} in ${name.phase(o.phaseId)}: ${o.levelDb.toFixed(1)} dB against ${o.limitDb} dB, over by ${(o.levelDb - o.limitDb).toFixed(1)} dB`,
      );
  }
  if (r.notConsidered && r.notConsidered.length > 0) {
    lines.push('Not considered:');
    for (const n of r.notConsidered) lines.push(`  ${name.candidate(n.candidateId)}: ${n.reason}`);
  }
  lines.push('', 'Chosen fleet:', ...fleetText(project, r.best.fleet, chosen));
  lines.push(
    '',
    'Levels with the chosen fleet, dB LAeq,T or LAr,T where marked (margin = limit − level; baseline level for comparison):',
    ...matrixText(project, chosen, baseline),
  );
  lines.push(
    '',
    `Best-buy-first fleet (from the baseline, the substitution with the most dB per ${money(1000)} at the worst receiver first, as worked by hand):`,
  );
  if (r.hand.steps.length === 0) lines.push('  no substitution taken');
  r.hand.steps.forEach((s, i) => {
    const duty = project.duties.find((d) => d.id === s.dutyId)?.name ?? s.dutyId;
    lines.push(
      `  ${i + 1}. ${duty}: ${name.candidate(s.candidateId)} (${Number.isFinite(s.dbPer1000) ? `${s.dbPer1000.toFixed(2)} dB per ${money(1000)}` : 'no extra cost'})`,
    );
  });
  lines.push(
    `  Result: ${outcomeLine(project, r.hand)}, ${r.hand.compliant ? 'meets every limit' : 'does NOT meet every limit'}.`,
  );
  if (r.savingOverHand !== undefined) {
    lines.push(
      r.savingOverHand > 0.005
        ? `  The exact fleet saves ${money(r.savingOverHand)} over the best-buy-first fleet.`
        : '  The best-buy-first fleet is as cheap as the exact one.',
    );
  }
  if (r.tradeOff.length > 0) {
    lines.push(
      '',
      exactTable
        ? 'Exact frontier: every fleet no other beats on both cost and worst margin (from the cheapest fleet to the quietest):'
        : 'Trade-off: least cost for each worst-case margin (from the baseline’s margin to the quietest fleet):',
    );
    lines.push(
      `  ${'Worst margin'.padStart(12)} ${'Level there'.padStart(11)} ${'Cost'.padStart(12)} ${'Extra per dB'.padStart(13)}  Changes from the baseline`,
    );
    r.tradeOff.forEach((p, i) => {
      const prev = r.tradeOff[i - 1];
      const perDb = prev ? (p.cost - prev.cost) / (p.worstMarginDb - prev.worstMarginDb) : undefined;
      const changes = project.duties.filter((d) => own(p.fleet, d.id) !== d.baselineCandidateId).length;
      lines.push(
        `  ${`${signed(p.worstMarginDb)} dB`.padStart(12)} ${db(p.worstLevelDb, 8)} dB ${money(p.cost).padStart(12)} ${(perDb === undefined ? '—' : money(Math.round(perDb))).padStart(13)}  ${changes} of ${project.duties.length} dut${project.duties.length === 1 ? 'y' : 'ies'}`,
      );
    });
  }
  lines.push('', CAUTION, '');
  return lines.join('\n');
}

/** A CSV field: quoted when it holds a comma, quote or line break. */
const csvField = (x: string) => (/[",\n\r]/.test(x) ? `"${x.replaceAll('"', '""')}"` : x);

/**
 * The exact frontier as a file: CSV (one row per fleet: worst margin, worst-case level, cost, duties changed from
 * the baseline, then the candidate of each duty by label) or JSON (the points as the optimiser gives them).
 */
function frontierText(project: Project, r: OptimiseResult, json: boolean): string {
  if (json)
    return `${JSON.stringify({ project: project.name, currency: project.currency, frontier: r.tradeOff, caution: CAUTION }, jsonNumbers, 2)}\n`;
  const name = labels(project);
  const head = ['worst margin dB', 'worst-case level dB', `cost ${project.currency}`, 'duties changed'];
  const rows = [[...head, ...project.duties.map((d) => d.name)].map(csvField).join(',')];
  for (const p of r.tradeOff) {
    const changed = project.duties.filter((d) => own(p.fleet, d.id) !== d.baselineCandidateId).length;
    rows.push(
      [
        p.worstMarginDb.toFixed(6),
        p.worstLevelDb.toFixed(6),
        p.cost.toFixed(2),
        String(changed),
        ...project.duties.map((d) => name.candidate(own(p.fleet, d.id))),
      ]
        .map(csvField)
        .join(','),
    );
  }
  return `${rows.join('\n')}\n`;
}

export const optimiseCommand: Command = {
  name: 'optimise',
  summary: 'the cheapest fleet that meets every limit, the best-buy-first fleet, the trade-off curve',
  help: helpText(
    'Usage: ledger optimise <project.json> [--budget <amount>] [--time-limit <s>] [--save <project.json>] [--ignore-clauses] [--frontier <file.csv|file.json>] [--confidence <p> [--draws <n>] [--seed <n>]] [--json]',
    'Chooses one candidate per duty so that every phase total at every receiver stays at or under its limit for the least total cost, ' +
      'honouring pinned and excluded candidates, the project’s tender clauses (caps, hour restrictions, shares of electric plant, limits at receivers or a boundary; a clause no fleet can meet is named and left out) and an optional budget; the solver (HiGHS) proves the optimum. ' +
      'When no fleet meets every limit it prints the fleet with the smallest largest exceedance (then the least cost) and names the receivers and phases still over. ' +
      'Also shows the best-buy-first fleet (as worked by hand: the most dB per cost first) and the least cost for each worst-case margin. ' +
      'When standard error is a terminal, the share done is shown there while it works. Exit code 0 when a fleet meets every limit, 1 when none does, 2 for an invalid file or flag.\n\n' +
      CAUTION,
    specs,
  ),
  async run(argv, io) {
    const { values, positionals } = parseFlags(argv, specs, 1);
    const file = positionals[0];
    if (file === undefined)
      throw new UsageError('missing project file (give its path, e.g. ledger optimise project.json)');
    const budget = numberFlag(values, 'budget', FLAG_RULES.money);
    if (budget !== undefined && budget < 0)
      throw new UsageError(`--budget: ${budget} is out of range (give an amount of 0 or more)`);
    const timeLimitS = numberFlag(values, 'time-limit', FLAG_RULES.timeLimitS);
    const project = await loadProject(file, io, 'optimise');
    if (!project) return 2;
    const baseline = evaluateProject(project, undefined, { skipValidation: true });
    if (baseline.problems.length > 0) {
      io.err(
        `ledger optimise: ${file}: ${baseline.problems.length} problem${baseline.problems.length === 1 ? '' : 's'}; nothing computed.\n`,
      );
      for (const p of baseline.problems) io.err(`  ${p.path}  ${p.message}\n`);
      return 2;
    }
    const solver = await loadHighsSolver();
    const confidence = numberFlag(values, 'confidence', CONFIDENCE_RULE);
    const draws = numberFlag(values, 'draws', UNCERTAINTY_RULES.draws);
    const seed = numberFlag(values, 'seed', UNCERTAINTY_RULES.seed);
    if (confidence === undefined && (draws !== undefined || seed !== undefined))
      throw new UsageError(
        `--${draws !== undefined ? 'draws' : 'seed'}: only used with --confidence (give --confidence <p>, e.g. 0.9)`,
      );
    if (confidence !== undefined) {
      if (values.save !== undefined)
        throw new UsageError(
          '--save: not with --confidence (save the fleet from ledger optimise without --confidence, or store it in the app)',
        );
      return runConfidence(
        project,
        baseline,
        {
          confidence,
          ...(budget === undefined ? {} : { budget }),
          ...(timeLimitS === undefined ? {} : { timeLimitS }),
          ...(draws === undefined ? {} : { draws }),
          ...(seed === undefined ? {} : { seed }),
        },
        solver,
        values.json === true,
        io,
      );
    }
    const frontierFile = values.frontier;
    if (typeof frontierFile === 'string' && !/\.(csv|json)$/i.test(frontierFile))
      throw new UsageError(
        `--frontier: ${JSON.stringify(frontierFile)} ends neither in .csv nor .json (give e.g. frontier.csv)`,
      );
    const result = optimiseFleet(
      project,
      baseline,
      {
        ...(typeof frontierFile === 'string' ? { exactFrontier: true } : {}),
        ...(budget === undefined ? {} : { budget }),
        ...(timeLimitS === undefined ? {} : { timeLimitS }),
        ...(values['ignore-clauses'] ? { clauses: false } : {}),
        ...(io.progress ? { onProgress: (p: OptimiseProgress) => io.progress?.(p.step, p.fraction) } : {}),
      },
      solver,
    );
    io.progress?.(undefined, 1);
    const chosen = evaluateProject(project, result.best.fleet, { skipValidation: true });
    if (typeof values.save === 'string') {
      if (!/\.json$/i.test(values.save))
        throw new UsageError(
          `--save: ${JSON.stringify(values.save)} does not end in .json (give a project file name, e.g. project.json)`,
        );
      const fleet: NamedFleet = {
        name: OPTIMISER_FLEET,
        choice: { ...result.best.fleet },
        origin: 'optimiser',
        foundFor: inputsFingerprint(project),
      };
      if (budget !== undefined) fleet.budget = budget;
      const saved = withAssessedFleet(withFleet(project, fleet), OPTIMISER_FLEET);
      try {
        await writeFile(values.save, serializeProject(saved));
      } catch (e) {
        const code = (e as NodeJS.ErrnoException).code;
        throw new UsageError(
          `--save: ${JSON.stringify(values.save)} cannot be written (${code === 'ENOENT' ? 'its folder does not exist' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : 'write failed'}; give a writable path)`,
        );
      }
      io.err(`Saved ${values.save} with the fleet found as "${OPTIMISER_FLEET}", now the assessed fleet.\n`);
    }
    if (typeof frontierFile === 'string') {
      try {
        await writeFile(frontierFile, frontierText(project, result, /\.json$/i.test(frontierFile)));
      } catch (e) {
        const code = (e as NodeJS.ErrnoException).code;
        throw new UsageError(
          `--frontier: ${JSON.stringify(frontierFile)} cannot be written (${code === 'ENOENT' ? 'its folder does not exist' : code === 'EISDIR' ? 'it is a folder' : code === 'EACCES' ? 'permission denied' : 'write failed'}; give a writable path)`,
        );
      }
      io.err(`Wrote ${result.tradeOff.length} frontier fleets to ${frontierFile}.\n`);
    }
    if (values.json) {
      const out = {
        project: project.name,
        currency: project.currency,
        ...(budget === undefined ? {} : { budget }),
        ...result,
        matrix: chosen.matrix,
        baselineMatrix: baseline.matrix,
        caution: CAUTION,
      };
      io.out(`${JSON.stringify(out, jsonNumbers, 2)}\n`);
    } else {
      io.out(humanText(project, result, chosen, baseline, budget, typeof frontierFile === 'string'));
    }
    return result.feasible ? 0 : 1;
  },
};
