/**
 * `ledger evaluate <project.json> [--receiver <id>] [--json]`: the phase × receiver matrix
 * (level, limit, margin) for the assessed fleet (or --fleet) with its compliance statement, and the ranking of every duty's candidates,
 * with each candidate's checks: over its Directive 2000/14/EC permissible level, the
 * permissible level standing in for a missing LWA, a machine off the project's level basis
 * (no K given), the character penalty, the pairs too close to call within the declared
 * uncertainty K (the ledger's own rule; K as ISO 4871:1996 declares it), and the operators' daily
 * exposure (ISO 9612:2009, Directive 2003/10/EC).
 * An invalid file lists every problem with its JSON path and exits 2; nothing is computed.
 */
import { readFile } from 'node:fs/promises';
import type { Command, Io } from '../command.ts';
import { helpText, parseFlags, UsageError, type FlagSpecs } from '../flags.ts';
import type { Candidate, Duty, Fleet, Project } from '../../ledger/model/model.ts';
import { REFERENCE_RECEIVER_ID } from '../../ledger/model/model.ts';
import type { DataProblem, Evaluation, RankingRow } from '../../ledger/model/results.ts';
import { cellQuantity } from '../../ledger/model/results.ts';
import { parseProjectFile } from '../../ledger/file/project-file.ts';
import { validateProject } from '../../ledger/validate/validate.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';
import { complianceStatement, type ComplianceStatement } from '../../ledger/checks/compliance-statement.ts';
import { optimiseFleet } from '../../ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../ledger/optimise/load-highs.ts';
import { fleetLabel, readFleetFlag } from '../fleet-flag.ts';
import { rankEveryDuty } from '../../ledger/ranking/rank-every-duty.ts';
import { formatMoney } from '../../ledger/costs/money.ts';
import { candidateChecks, type CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import { rankingUncertainty, type RankingUncertainty } from '../../ledger/ranking/ranking-uncertainty.ts';
import { EXPOSURE_CAUTION } from '../../ledger/checks/operator-exposure.ts';
import { own } from '../../ledger/model/own.ts';
import { FLAG_WORDS } from '../../ledger/ranking/flag-words.ts';

const specs: FlagSpecs = {
  fleet: {
    type: 'string',
    value: '<name>',
    help: 'the fleet to assess: baseline, best (solved afresh), or a fleet stored in the project; default: the project’s assessed fleet',
  },
  receiver: {
    type: 'string',
    value: '<id>',
    help: `rank at this receiver (an id, or ${REFERENCE_RECEIVER_ID}); default: each phase's worst receiver`,
  },
  json: { type: 'boolean', help: 'print one JSON object' },
};

export const CAUTION =
  'Predictions are estimates (ISO 9613-2 quotes ±3 dB); site conditions, machine condition and operators change real levels. ' +
  'A competent acoustician and the local authority’s rules decide.';

/** Reads and checks a project file; problems go to stderr. Returns undefined after printing them. */
export async function loadProject(file: string, io: Io, command: string): Promise<Project | undefined> {
  let text: string;
  try {
    text = await readFile(file, 'utf8');
  } catch (e) {
    const code = (e as NodeJS.ErrnoException).code;
    throw new UsageError(
      `${JSON.stringify(file)}: ${code === 'ENOENT' ? 'no such file' : code === 'EISDIR' ? 'is a folder' : 'cannot be read'} (give the path of a project file, e.g. from ledger example > project.json)`,
    );
  }
  const parsed = parseProjectFile(text);
  const problems: DataProblem[] = 'problems' in parsed ? parsed.problems : validateProject(parsed.project);
  if (problems.length > 0) {
    io.err(
      `ledger ${command}: ${file}: ${problems.length} problem${problems.length === 1 ? '' : 's'}; nothing computed.\n`,
    );
    for (const p of problems) io.err(`  ${p.path}  ${p.message}\n`);
    return undefined;
  }
  return 'project' in parsed ? parsed.project : undefined;
}

const db = (x: number | undefined, width = 6) =>
  (x === undefined ? '—' : Number.isNaN(x) ? 'n/a' : x === -Infinity ? 'silent' : x.toFixed(1)).padStart(width);
const signed = (x: number) => (Number.isNaN(x) ? 'n/a' : `${x > 0 ? '+' : x < 0 ? '−' : ''}${Math.abs(x).toFixed(1)}`);
const signed2 = (x: number) => `${x < 0 ? '−' : ''}${Math.abs(x).toFixed(2)}`;
const trim = (s: string, n: number) => (s.length > n ? `${s.slice(0, n - 1)}…` : s).padEnd(n);

function matrixText(project: Project, ev: Evaluation): string[] {
  const name = (id: string) =>
    project.receivers.find((r) => r.id === id)?.name ??
    (id === REFERENCE_RECEIVER_ID ? `reference receiver at ${project.settings.referenceDistanceM} m` : id);
  const periodName = (id: string) => project.periods.find((p) => p.id === id)?.name ?? id;
  const rated = ev.matrix.some((c) => c.levelAeqDb !== undefined);
  const lines = [
    rated
      ? 'Levels by phase, period and receiver, dB (margin = limit − level). Where a tonal or impulsive machine works the level is the rating level LAr,T (ISO 1996-1) = LAeq,T + character penalty, and the limit is compared with it; elsewhere LAeq,T:'
      : 'Levels by phase, period and receiver, dB LAeq,T (margin = limit − level):',
    `  ${'Phase'.padEnd(32)} ${'Period (hours worked of T)'.padEnd(30)} ${'Receiver'.padEnd(36)} ${'Qty'.padEnd(7)} ${'Level'.padStart(6)} ${'Limit'.padStart(6)} ${'Margin'.padStart(7)}`,
  ];
  for (const cell of ev.matrix) {
    const phase = project.phases.find((p) => p.id === cell.phaseId)?.name ?? cell.phaseId;
    const kind = project.receivers.find((r) => r.id === cell.receiverId)?.kind;
    const verdict =
      cell.limitDb === undefined
        ? 'no limit for this period'
        : Number.isNaN(cell.levelDb)
          ? 'not computed'
          : cell.over
            ? `OVER the limit by ${(-(cell.marginDb as number)).toFixed(1)} dB`
            : 'within the limit';
    const hours = `${periodName(cell.periodId)} (${formatHours(cell.hoursWorked)} of ${formatHours(cell.periodHours)} h)`;
    const rating =
      cell.levelAeqDb !== undefined ? `  [LAeq,T ${db(cell.levelAeqDb, 0)} + penalty ${db(cell.penaltyDb, 0)}]` : '';
    lines.push(
      `  ${trim(cell.ownPeriod ? phase : `  ↳ ${phase}`, 32)} ${trim(hours, 30)} ${trim(`${name(cell.receiverId)}${kind ? ` (${kind})` : ''}`, 36)} ${trim(cellQuantity(cell).replace('_', ''), 7)} ${db(cell.levelDb)} ${db(cell.limitDb)} ${(cell.marginDb === undefined ? '—' : signed(cell.marginDb)).padStart(7)}  ${verdict}${rating}`,
    );
  }
  if (ev.matrix.some((c) => !c.ownPeriod))
    lines.push('  ↳ the same phase’s working hours in another period than its own, assessed over that period.');
  lines.push('', 'Worst receiver per phase:');
  for (const phase of project.phases)
    lines.push(`  ${phase.name}: ${name(own(ev.worstReceiverByPhase, phase.id) ?? '—')}`);
  if (ev.notes.length > 0) {
    lines.push('', 'Notes:');
    for (const n of ev.notes) lines.push(`  ${n.path}  ${n.message}`);
  }
  return lines;
}

const formatHours = (h: number) => (!Number.isFinite(h) ? '?' : Number.isInteger(h) ? String(h) : h.toFixed(2));

/** Flags of a candidate's checks for the notes column. */
function checkNotes(check: CandidateCheck | undefined, character: string): string[] {
  if (!check) return [];
  return [
    check.overPermissible ? 'over permissible' : '',
    check.standIn ? 'stand-in LWA' : '',
    check.penaltyDb !== 0 ? `penalty +${check.penaltyDb} dB (${character})` : '',
  ].filter(Boolean);
}

function rankingText(
  project: Project,
  candidateById: ReadonlyMap<string, Candidate>,
  duty: Duty,
  receiverId: string,
  rows: RankingRow[],
  checks: Record<string, CandidateCheck>,
  uncertainty: RankingUncertainty,
): string[] {
  const money = (x: number) => formatMoney(x, project.currency);
  const receiverName =
    project.receivers.find((r) => r.id === receiverId)?.name ??
    `reference receiver at ${project.settings.referenceDistanceM} m`;
  const lines = [
    `Duty "${duty.name}" — ranked at ${receiverName}:`,
    `  ${'#'.padStart(2)} ${'Candidate'.padEnd(44)} ${'Own'.padStart(6)} ${'Phase'.padStart(6)} ${'Reduct.'.padStart(7)} ${'Extra cost'.padStart(11)} ${'dB/1,000'.padStart(8)} ${'Cost/dB'.padStart(9)}  Notes`,
  ];
  for (const r of rows) {
    const cand = candidateById.get(r.candidateId)!;
    const notes = [
      r.isBaseline ? 'baseline' : '',
      r.freeWin ? FLAG_WORDS.freeWin : '',
      r.dominated ? FLAG_WORDS.dominated : '',
      r.overLimit ? 'phase over limit' : '',
      r.offBasis ? 'OFF BASIS (no K)' : '',
      ...checkNotes(own(checks, r.candidateId), cand.character),
    ]
      .filter(Boolean)
      .join(', ');
    const extra = Number.isNaN(r.extraCost)
      ? 'n/a'
      : r.extraCost === 0
        ? '0'
        : `${r.extraCost > 0 ? '+' : '−'}${money(Math.abs(r.extraCost))}`;
    lines.push(
      `  ${String(r.rank).padStart(2)} ${trim(cand.label, 44)} ${db(r.contributionDb)} ${db(r.phaseTotalDb)} ${signed(r.reductionDb).padStart(7)} ${extra.padStart(11)} ${(r.dbPer1000 === undefined ? '—' : signed2(r.dbPer1000)).padStart(8)} ${(r.costPerDb === undefined ? '—' : `${r.costPerDb < 0 ? '−' : ''}${money(Math.round(Math.abs(r.costPerDb)))}`).padStart(9)}  ${notes}`,
    );
  }
  lines.push(`  Within ±K: ${uncertainty.summary}`);
  for (const pair of uncertainty.closePairs) lines.push(`    ${pair.words}`);
  for (const r of rows) {
    const check = own(checks, r.candidateId);
    if (r.offBasis)
      lines.push(
        `  ${project.candidates.find((c) => c.id === r.candidateId)?.label ?? r.candidateId}: OFF BASIS: ${r.offBasis}`,
      );
    if (check?.permissibleNote && (check.overPermissible || check.standIn)) {
      lines.push(`  ${candidateById.get(r.candidateId)?.label ?? r.candidateId}: ${check.permissibleNote}`);
    }
  }
  return lines;
}

/** Hours as words: "2.0 h", "45 min", "more than 24 h". */
const hoursText = (h: number) =>
  !Number.isFinite(h) || h >= 24 ? 'more than 24 h' : h >= 1 ? `${h.toFixed(1)} h` : `${Math.round(h * 60)} min`;

/** Operator exposure rows, in project order: every candidate with an operator LpA and hours a day. */
function exposureRows(project: Project, checks: Record<string, CandidateCheck>) {
  return project.candidates.flatMap((c) => {
    const e = own(checks, c.id)?.exposure;
    if (!e) return [];
    return [
      {
        candidateId: c.id,
        dutyId: c.dutyId,
        label: c.label,
        lpaDb: c.operatorLpaDb as number,
        hoursPerDay: c.operatorHoursPerDay as number,
        lex8hDb: e.dailyExposureDb,
        reached: e.band,
        hoursTo85: e.hoursTo85,
      },
    ];
  });
}

function exposureText(rows: ReturnType<typeof exposureRows>): string[] {
  const lines = [
    'Operator exposure (LEX,8h by ISO 9612:2009; Directive 2003/10/EC values 80 / 85 / 87 dB(A); time to 85 dB(A) with a 3 dB exchange rate, NIOSH 98-126):',
  ];
  if (rows.length === 0) return [...lines, '  No candidate gives an operator-position LpA and hours a day.'];
  lines.push(
    `  ${'Candidate'.padEnd(44)} ${'LpA'.padStart(6)} ${'h/day'.padStart(5)} ${'LEX,8h'.padStart(6)}  ${'Value reached'.padEnd(24)} Time to 85 dB(A)`,
  );
  for (const r of rows) {
    lines.push(
      `  ${trim(r.label, 44)} ${db(r.lpaDb)} ${r.hoursPerDay.toFixed(1).padStart(5)} ${db(r.lex8hDb)}  ${r.reached.padEnd(24)} ${hoursText(r.hoursTo85)} a day`,
    );
  }
  return [...lines, `  ${EXPOSURE_CAUTION}`];
}

function complianceText(statement: ComplianceStatement): string[] {
  return [
    `Compliance statement for ${statement.fleet}:`,
    `  ${statement.summary}`,
    ...statement.lines.map((l) => `  ${l.sentence}`),
  ];
}

import { jsonPieces, writeInBlocks } from '../json-stream.ts';

const jsonNumbers = (_k: string, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v);

export const evaluateCommand: Command = {
  name: 'evaluate',
  summary: 'levels at every receiver per phase, and each duty’s candidates ranked',
  help: helpText(
    'Usage: ledger evaluate <project.json> [--fleet <name>] [--receiver <id>] [--json]',
    'Predicts the level of a fleet (the project’s assessed fleet unless --fleet names another) at every receiver in every phase (level, limit, margin) and ranks each duty’s candidates by their level and by dB of reduction per 1,000 of cost. ' +
      'An invalid file lists every problem with its JSON path and exits with code 2; otherwise the exit code is 0, whether or not the limits are met.\n\n' +
      CAUTION,
    specs,
  ),
  async run(argv, io) {
    const { values, positionals } = parseFlags(argv, specs, 1);
    const file = positionals[0];
    if (file === undefined)
      throw new UsageError('missing project file (give its path, e.g. ledger evaluate project.json)');
    const project = await loadProject(file, io, 'evaluate');
    if (!project) return 2;
    const chosen = typeof values.receiver === 'string' ? values.receiver : undefined;
    const receiverIds = project.receivers.map((r) => r.id);
    if (chosen !== undefined && chosen !== REFERENCE_RECEIVER_ID && !receiverIds.includes(chosen)) {
      throw new UsageError(
        `--receiver: ${JSON.stringify(chosen)} is not a receiver of this project (use one of ${[...receiverIds, REFERENCE_RECEIVER_ID].join(', ')})`,
      );
    }
    const flag = readFleetFlag(project, values.fleet, 'assessed');
    const baseline = evaluateProject(project, undefined, { skipValidation: true });
    if (baseline.problems.length > 0) {
      io.err(
        `ledger evaluate: ${file}: ${baseline.problems.length} problem${baseline.problems.length === 1 ? '' : 's'}; nothing computed.\n`,
      );
      for (const p of baseline.problems) io.err(`  ${p.path}  ${p.message}\n`);
      return 2;
    }
    let picked: { name: string; fleet: Fleet; outOfDate: boolean };
    if (flag.kind === 'best') {
      const best = optimiseFleet(project, baseline, { tradeOff: false }, await loadHighsSolver());
      picked = {
        name: best.feasible
          ? 'cheapest compliant (solved now)'
          : 'closest to compliance (solved now; no fleet meets every limit)',
        fleet: best.best.fleet,
        outOfDate: false,
      };
    } else picked = flag;
    const ev = evaluateProject(project, picked.fleet, { skipValidation: true });
    if (ev.problems.length > 0) {
      io.err(
        `ledger evaluate: ${file}: ${ev.problems.length} problem${ev.problems.length === 1 ? '' : 's'}; nothing computed.\n`,
      );
      for (const p of ev.problems) io.err(`  ${p.path}  ${p.message}\n`);
      return 2;
    }
    const checks = candidateChecks(project, ev);
    const candidateById = new Map(project.candidates.map((c) => [c.id, c] as const));
    const rankings = rankEveryDuty(project, ev, chosen).map((r) => ({
      ...r,
      uncertainty: rankingUncertainty(r.rows, candidateById),
    }));
    const exposure = exposureRows(project, checks);
    const basisWords =
      project.settings.levelBasis === 'measured'
        ? 'the measured value L (ISO 4871:1996)'
        : 'the guaranteed value Ld = L + K (ISO 4871:1996)';
    if (values.json) {
      const out = {
        project: project.name,
        currency: project.currency,
        fleetName: picked.name,
        fleetOutOfDate: picked.outOfDate,
        fleet: ev.fleet,
        fleetCost: ev.fleetCost,
        compliance: complianceStatement(project, ev, picked.name),
        matrix: ev.matrix,
        matrixQuantity:
          'each cell: levelDb is LAeq,T, or the rating level LAr,T (ISO 1996-1) when levelAeqDb and penaltyDb are given (levelDb = levelAeqDb + penaltyDb); the limit is compared with levelDb',
        notes: ev.notes,
        worstReceiverByPhase: ev.worstReceiverByPhase,
        costs: ev.costs,
        levelBasis: project.settings.levelBasis,
        characterPenaltyDb: project.settings.characterPenaltyDb,
        rankings,
        candidateChecks: checks,
        operatorExposure: { rows: exposure, caution: EXPOSURE_CAUTION },
        caution: CAUTION,
      };
      // Written as it is made, a block at a time (some 200 MB at 100,000 candidates), never as one string.
      writeInBlocks(jsonPieces(out, jsonNumbers, 2), (t) => io.out(t));
      io.out('\n');
      return 0;
    }
    const method =
      project.propagation.method === 'simple'
        ? `point source, Q = ${project.propagation.q}`
        : `ISO 9613-2:1996, ${project.propagation.groundMethod} ground method`;
    const lines = [
      `${project.name}`,
      `Propagation: ${method}. Fleet assessed: ${fleetLabel(picked)}, cost ${formatMoney(ev.fleetCost, project.currency)}.`,
      `Sound power rated on ${basisWords}; tonal or impulsive machines carry a character penalty of ${project.settings.characterPenaltyDb} dB at every receiver.`,
      '',
      ...matrixText(project, ev),
      '',
      ...complianceText(complianceStatement(project, ev, picked.name)),
      '',
      'Ranking of each duty’s candidates (own level and phase total at the receiver, dB; reduction of the phase total against the baseline):',
    ];
    // The rankings are written duty by duty, a block at a time, not gathered into one string.
    const loaded = project;
    function* text(): Generator<string> {
      yield lines.join('\n');
      for (let u = 0; u < rankings.length; u++) {
        const r = rankings[u] as (typeof rankings)[number];
        const duty = loaded.duties[u] as Duty;
        yield `\n\n${rankingText(loaded, candidateById, duty, r.receiverId, r.rows, checks, r.uncertainty).join('\n')}`;
      }
      yield `\n\n${[...exposureText(exposure), '', CAUTION, ''].join('\n')}`;
    }
    writeInBlocks(text(), (t) => io.out(t));
    return 0;
  },
};
