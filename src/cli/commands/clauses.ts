/**
 * `ledger clauses <project.json> [--fleet <name>] [--json]`: the contractor's answer to the
 * tender's noise clauses, clause by clause, for a fleet: pass, fail, "stated" or
 * incomplete, the evidence (worst receiver or boundary point with level and margin, each
 * machine against a cap, each duty's hours, the share reached) and for a failure the
 * cheapest substitution that passes.
 * Without `--fleet` it answers for the project's assessed fleet; `--fleet baseline` for the
 * baselines, a stored fleet's name for that fleet, `--fleet best` solves afresh for the
 * cheapest fleet that meets every limit and clause (HiGHS) and answers for it.
 * Exit code 0 when every clause passes or is stated, 1 when one fails or cannot be judged,
 * 2 for an invalid file or flag.
 */
import type { Command } from '../command.ts';
import { helpText, parseFlags, UsageError, type FlagSpecs } from '../flags.ts';
import type { Fleet, Project } from '../../ledger/model/model.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';
import { answerClauses, type ClausesAnswer } from '../../ledger/clauses/answer.ts';
import { CLAUSE_KIND_WORDS } from '../../ledger/clauses/clause.ts';
import { optimiseFleet } from '../../ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../ledger/optimise/load-highs.ts';
import { CAUTION, loadProject } from './evaluate.ts';
import { fleetLabel, readFleetFlag } from '../fleet-flag.ts';

const specs: FlagSpecs = {
  fleet: {
    type: 'string',
    value: '<name>',
    help: 'the fleet answered for: baseline, best (the cheapest fleet that meets every limit and clause, solved afresh), or a fleet stored in the project; default: the project’s assessed fleet',
  },
  json: { type: 'boolean', help: 'print one JSON object' },
};

const STATUS_WORDS = { pass: 'PASS', fail: 'FAIL', stated: 'STATED', incomplete: 'NOT ASSESSED' } as const;
const jsonNumbers = (_k: string, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v);

/** Wraps words to a width, each line after the first indented. */
function wrap(text: string, width: number, indent: string): string[] {
  const out: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/)) {
    if (line && line.length + 1 + word.length > width) {
      out.push(line);
      line = word;
    } else line = line ? `${line} ${word}` : word;
  }
  if (line) out.push(line);
  return out.map((l) => `${indent}${l}`);
}

function humanText(project: Project, which: string, answer: ClausesAnswer): string {
  const lines = [`${project.name}`, `Answer to the tender’s noise clauses, for ${which}:`, ''];
  if (answer.answers.length === 0)
    lines.push('  The project has no clauses (add them in the app’s Clauses tab or the file’s "clauses" list).');
  for (const a of answer.answers) {
    lines.push(`  ${(a.ref || '—').padEnd(8)} ${STATUS_WORDS[a.status].padEnd(13)} ${CLAUSE_KIND_WORDS[a.kind]}`);
    if (a.text.trim()) lines.push(...wrap(`“${a.text.trim()}”`, 88, '             '));
    lines.push(...wrap(a.summary, 88, '             '));
    for (const e of a.evidence)
      lines.push(...wrap(`${e.ok ? '✓' : '✗'} ${e.subject}: ${e.figure}`, 88, '               '));
    if (a.fix) lines.push(...wrap(`To pass: ${a.fix.text}.`, 88, '             '));
    if (a.noFix) lines.push(...wrap(a.noFix, 88, '             '));
    if (a.statement) lines.push(...wrap(`Statement: ${a.statement}`, 88, '             '));
    lines.push('');
  }
  const c = answer.counts;
  lines.push(
    `${c.pass} pass, ${c.fail} fail, ${c.stated} stated, ${c.incomplete} not assessed.${answer.allMet ? ' Every clause is met or answered.' : ''}`,
    '',
    CAUTION,
    '',
  );
  return lines.join('\n');
}

export const clausesCommand: Command = {
  name: 'clauses',
  summary: 'the answer to the tender’s noise clauses, clause by clause, with evidence and fixes',
  help: helpText(
    'Usage: ledger clauses <project.json> [--fleet <name>] [--json]',
    'Answers each of the project’s tender clauses for a fleet: limits at receivers or along a boundary (worst point, level, margin), caps on each machine’s LWA or its level at a distance (hemispherical spreading), working-hour restrictions, the share of electric plant, and statements. ' +
      'A failing clause comes with the cheapest substitution that passes. ' +
      'Exit code 0 when every clause passes or is answered by a statement, 1 when a clause fails or cannot be assessed, 2 for an invalid file or flag.\n\n' +
      CAUTION,
    specs,
  ),
  async run(argv, io) {
    const { values, positionals } = parseFlags(argv, specs, 1);
    const file = positionals[0];
    if (file === undefined)
      throw new UsageError('missing project file (give its path, e.g. ledger clauses project.json)');
    const project = await loadProject(file, io, 'clauses');
    if (!project) return 2;
    const flag = readFleetFlag(project, values.fleet, 'assessed');
    const baseline = evaluateProject(project, undefined, { skipValidation: true });
    if (baseline.problems.length > 0) {
      io.err(
        `ledger clauses: ${file}: ${baseline.problems.length} problem${baseline.problems.length === 1 ? '' : 's'}; nothing answered.\n`,
      );
      for (const p of baseline.problems) io.err(`  ${p.path}  ${p.message}\n`);
      return 2;
    }
    let fleet: Fleet;
    let fleetName: string;
    let which: string;
    if (flag.kind === 'best') {
      const result = optimiseFleet(project, baseline, { tradeOff: false }, await loadHighsSolver());
      fleet = result.best.fleet;
      fleetName = 'best';
      which = result.feasible
        ? 'the cheapest fleet that meets every limit and clause (solved now)'
        : 'the fleet closest to every limit (solved now; no fleet meets them all)';
      if (result.clauses && result.clauses.unmet.length > 0)
        which += `; left out as not achievable: ${result.clauses.unmet.map((u) => `${u.name} (${u.reason})`).join('; ')}`;
    } else {
      fleet = flag.fleet;
      fleetName = flag.name;
      which = fleetLabel(flag);
    }
    const evaluation = evaluateProject(project, fleet, { skipValidation: true });
    const answer = answerClauses(project, evaluation);
    if (values.json) {
      io.out(`${JSON.stringify({ project: project.name, fleetName, ...answer, caution: CAUTION }, jsonNumbers, 2)}\n`);
    } else {
      io.out(humanText(project, which, answer));
    }
    return answer.allMet ? 0 : 1;
  },
};
