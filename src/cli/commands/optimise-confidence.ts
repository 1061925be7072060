/**
 * `ledger optimise <project.json> --confidence <p>`: the cheapest fleet that meets every
 * limit at once with probability p (src/ledger/optimise/confidence-fleet.ts), how that was
 * verified, and what the confidence costs over the deterministic optimum. Exit code 0 when
 * such a fleet is found, 1 when none is.
 */
import type { Io } from '../command.ts';
import type { Project } from '../../ledger/model/model.ts';
import type { Evaluation } from '../../ledger/model/results.ts';
import type { LpSolver } from '../../ledger/optimise/solver.ts';
import {
  CONFIDENCE_LEVELS,
  confidenceCosts,
  confidenceFleet,
  type ConfidenceFleetOptions,
} from '../../ledger/optimise/confidence-fleet.ts';
import { formatMoney } from '../../ledger/costs/money.ts';
import { own } from '../../ledger/model/own.ts';
import { complianceConfidence } from '../../ledger/uncertainty/confidence.ts';
import { evaluateProject } from '../../ledger/prediction/evaluate.ts';
import { CONFIDENCE_CAUTION } from '../../ledger/uncertainty/assumptions.ts';
import { percent, simulatedWords } from '../../ledger/uncertainty/words.ts';
import { CAUTION } from './evaluate.ts';

/** The range --confidence accepts. */
export const CONFIDENCE_RULE = { min: 0.01, max: 0.9999, accepted: 'a probability from 0.01 to 0.9999, e.g. 0.9' };

const jsonNumbers = (_k: string, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v);

export async function runConfidence(
  project: Project,
  baseline: Evaluation,
  options: ConfidenceFleetOptions,
  solver: LpSolver,
  json: boolean,
  io: Io,
): Promise<number> {
  const r = confidenceFleet(project, baseline, options, solver);
  const assumptions = complianceConfidence(
    project,
    r.fleet ? evaluateProject(project, r.fleet, { skipValidation: true }) : baseline,
    { analyticOnly: true },
  ).assumptions;
  const clausesIgnored = (project.clauses ?? []).length > 0;
  const { confidence: _c, ...rest } = options;
  const costOfConfidence = confidenceCosts(project, baseline, CONFIDENCE_LEVELS, solver, rest);
  if (json) {
    io.out(
      `${JSON.stringify({ project: project.name, currency: project.currency, ...r, costOfConfidence, ...(clausesIgnored ? { clausesIgnored: true } : {}), assumptions, caution: CONFIDENCE_CAUTION }, jsonNumbers, 2)}\n`,
    );
    return r.found ? 0 : 1;
  }
  const money = (x: number) => formatMoney(x, project.currency);
  const label = new Map(project.candidates.map((c) => [c.id, c.label]));
  const lines = [project.name, '', r.message, ''];
  if (r.fleet) {
    lines.push(`Fleet at ${percent(r.confidence)} confidence:`);
    for (const d of project.duties) {
      const id = own(r.fleet, d.id) as string;
      const det = r.deterministic ? own(r.deterministic.fleet, d.id) : undefined;
      lines.push(
        `  ${d.name.padEnd(36).slice(0, 36)} ${(label.get(id) ?? id).padEnd(40).slice(0, 40)}${det !== undefined && det !== id ? `  (deterministic optimum: ${label.get(det) ?? det})` : ''}`,
      );
    }
    lines.push('');
  }
  if (r.verified)
    lines.push(
      `Verified: every limit met at once in ${simulatedWords(r.verified.probability, r.verified.standardError, r.verified.draws)} of ${r.verified.draws.toLocaleString('en-GB')} draws (seed ${r.verified.seed}).`,
    );
  if (r.check)
    lines.push(
      `Independent check: ${simulatedWords(r.check.probability, r.check.standardError, r.check.draws)} of ${r.check.draws.toLocaleString('en-GB')} draws (seed ${r.check.seed}).`,
    );
  if (r.deterministic)
    lines.push(
      `Deterministic optimum (every limit met as rated): ${money(r.deterministic.cost)}, every limit met at once with probability ${simulatedWords(r.deterministic.probability, r.deterministic.standardError, r.deterministic.draws)}.`,
    );
  lines.push('', 'Search rounds (probability asked of each cell → fleet cost, probability of every limit at once):');
  for (const round of r.rounds)
    lines.push(
      `  ${percent(round.cellTarget, 2).padStart(8)} → ${round.cost === undefined ? 'no fleet within the tightened limits' : `${money(round.cost)}, ${percent(round.probability ?? NaN)}`}`,
    );
  lines.push(
    '',
    'What more confidence costs (cheapest fleet found and verified at each level; deterministic optimum for comparison):',
  );
  if (r.deterministic)
    lines.push(
      `  ${'as rated'.padStart(8)}  ${money(r.deterministic.cost).padStart(14)}  every limit at once ${simulatedWords(r.deterministic.probability, r.deterministic.standardError, r.deterministic.draws)}`,
    );
  for (const c of costOfConfidence) {
    lines.push(
      `  ${percent(c.confidence, 0).padStart(8)}  ${(c.found ? money(c.cost as number) : 'not reached').padStart(14)}${c.found ? `  every limit at once ${simulatedWords(c.probability as number, c.standardError as number, r.verified?.draws ?? 10000)}` : ''}`,
    );
  }
  lines.push('', `How: ${r.method}`);
  if (clausesIgnored)
    lines.push('The project’s tender clauses are not honoured in this search; check the fleet with ledger clauses.');
  lines.push('', 'Model:');
  for (const a of assumptions) lines.push(`  - ${a}`);
  lines.push('', CONFIDENCE_CAUTION, CAUTION, '');
  io.out(lines.join('\n'));
  return r.found ? 0 : 1;
}
