/**
 * A tender's clauses as constraints of the fleet model (./problem.ts), so the optimiser
 * finds the cheapest fleet that meets every limit and every clause:
 * - a per-machine cap (L_WA, or Lp at a distance) leaves out the candidates over it in the
 *   duties it covers;
 * - a working-hour restriction leaves out the candidates whose character it restricts in
 *   the duties whose phase works outside the allowed hours;
 * - a share clause adds Σ weight·x ≥ least share × Σ weight over the duties covered
 *   (weights are units or machine-hours, which do not depend on the machine: ../clauses/share.ts);
 * - a limit clause adds one cell Σ ρ·x ≤ 1 per phase in its period × receiver or boundary
 *   point, ρ = 10^((L − limit)/10), L in the clause's quantity (../clauses/limit-levels.ts).
 * A clause that cannot be met whatever the fleet (a cap no machine of a duty meets, a
 * restriction of all work outside the hours, a share above what the offered machines can
 * reach, a limit that cannot be assessed) is left out and named with the reason.
 * Statement clauses are not constraints.
 * O(clauses × (candidates + phases × points × candidates)).
 */
import type { Candidate, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import type { Clause } from '../clauses/clause.ts';
import type { FleetProblem, ProblemCell, ProblemDuty, ProblemShare, CellTerm } from './problem.ts';
import type { PermissibleLookup } from '../rating/rating.ts';
import { capFigure, meetsCap } from '../clauses/machine-caps.ts';
import { hoursOutside } from '../clauses/working-hours.ts';
import { coversDuty, candidateIndex, clauseName } from '../clauses/scope.ts';
import { countedEnergies, dutyWeight } from '../clauses/share.ts';
import { CLAUSE_DEFAULTS } from '../clauses/clause.ts';
import type { LimitSetting } from '../clauses/limit-levels.ts';
import { ratioFromDb } from '../../core/decibel.ts';

export interface UnmetClause {
  clauseId: string;
  name: string;
  reason: string;
}

export interface ClauseConstraints {
  problem: FleetProblem;
  /** Names of the clauses the model honours. */
  honoured: string[];
  unmet: UnmetClause[];
}

/** Why a candidate may not be chosen for its duty under a clause, or undefined when it may. */
function breaks(project: Project, clause: Clause, c: Candidate, permissible?: PermissibleLookup): boolean {
  if (!coversDuty(clause, c.dutyId)) return false;
  if (clause.kind === 'lwa-cap' || clause.kind === 'lp-cap')
    return !meetsCap(capFigure(clause, c, project.settings, permissible).figureDb, clause.maxDb as number);
  if (clause.kind === 'hours') {
    const character = clause.character ?? CLAUSE_DEFAULTS.character;
    if (character !== 'any' && c.character !== character) return false;
    const duty = project.duties.find((d) => d.id === c.dutyId);
    const phase = duty && project.phases.find((p) => p.id === duty.phaseId);
    return (
      phase !== undefined && hoursOutside(phase.start, phase.end, clause.start as string, clause.end as string) !== 0
    );
  }
  return false;
}

/**
 * Adds the project's clauses to a fleet model. `invalid` holds the ids of clauses whose
 * data has a problem (they are named and left out). Returns a new problem; the input is
 * not changed.
 */
export function addClauseConstraints(
  base: FleetProblem,
  project: Project,
  limits: ReadonlyMap<string, LimitSetting>,
  invalid: ReadonlySet<string>,
  permissible?: PermissibleLookup,
): ClauseConstraints {
  const byId = candidateIndex(project);
  let duties: ProblemDuty[] = base.duties;
  const cells: ProblemCell[] = [...base.cells];
  const shares: ProblemShare[] = [...(base.shares ?? [])];
  const honoured: string[] = [];
  const unmet: UnmetClause[] = [];
  const clauses = project.clauses ?? [];

  // Caps and hours first: they only take options away, so later clauses see what is left.
  clauses.forEach((clause, index) => {
    const name = clauseName(clause, index);
    if (clause.kind !== 'lwa-cap' && clause.kind !== 'lp-cap' && clause.kind !== 'hours') return;
    if (invalid.has(clause.id))
      return void unmet.push({ clauseId: clause.id, name, reason: 'its data has a problem (see the data problems)' });
    const next = duties.map((d) => ({
      ...d,
      options: d.options.filter((o) => !breaks(project, clause, byId.get(o.candidateId) as Candidate, permissible)),
    }));
    const emptied = next.filter((d) => d.options.length === 0);
    if (emptied.length > 0) {
      const why =
        clause.kind === 'hours' && (clause.character ?? CLAUSE_DEFAULTS.character) === 'any'
          ? `${emptied.map((d) => d.name).join(', ')} works outside ${clause.start}–${clause.end} whatever the machine`
          : `no machine the optimiser may choose for ${emptied.map((d) => d.name).join(', ')} meets it${unmet.length + honoured.length > 0 ? ' together with the clauses before it' : ''}`;
      unmet.push({ clauseId: clause.id, name, reason: why });
      return;
    }
    duties = next;
    honoured.push(name);
  });

  // Option indexes changed: re-map the cells' terms to the options left.
  const remap = duties.map((d, i) => {
    const old = base.duties[i] as ProblemDuty;
    return old.options.map((o) => d.options.findIndex((n) => n.candidateId === o.candidateId));
  });
  const remapTerms = (terms: readonly CellTerm[]) =>
    terms.flatMap((t) => {
      const k = remap[t.duty]?.[t.option] ?? -1;
      return k < 0 ? [] : [{ ...t, option: k }];
    });
  for (let i = 0; i < cells.length; i++)
    cells[i] = { ...(cells[i] as ProblemCell), terms: remapTerms((cells[i] as ProblemCell).terms) };
  for (let i = 0; i < shares.length; i++) {
    const s = shares[i] as ProblemShare;
    shares[i] = {
      ...s,
      terms: s.terms.flatMap((t) => {
        const k = remap[t.duty]?.[t.option] ?? -1;
        return k < 0 ? [] : [{ ...t, option: k }];
      }),
    };
  }

  clauses.forEach((clause, index) => {
    const name = clauseName(clause, index);
    if (clause.kind === 'share') {
      if (invalid.has(clause.id))
        return void unmet.push({ clauseId: clause.id, name, reason: 'its data has a problem (see the data problems)' });
      const energies = countedEnergies(clause);
      const terms: ProblemShare['terms'] = [];
      let total = 0;
      let reachable = 0;
      duties.forEach((d, di) => {
        if (!coversDuty(clause, d.id)) return;
        const duty = project.duties.find((x) => x.id === d.id);
        if (!duty) return;
        const w = dutyWeight(project, clause, duty);
        total += w;
        let any = false;
        d.options.forEach((o, k) => {
          const energy = byId.get(o.candidateId)?.energy;
          if (energy !== undefined && energies.includes(energy)) {
            terms.push({ duty: di, option: k, weight: w });
            any = true;
          }
        });
        if (any) reachable += w;
      });
      const least = ((clause.minPct as number) / 100) * total;
      if (!Number.isFinite(total))
        return void unmet.push({ clauseId: clause.id, name, reason: 'a duty’s machine-hours are not computable' });
      if (reachable < least * (1 - 1e-12)) {
        return void unmet.push({
          clauseId: clause.id,
          name,
          reason: `at most ${total > 0 ? ((100 * reachable) / total).toFixed(1) : '0'} % ${energies.join(' or ')} can be reached with the machines the optimiser may choose; ${clause.minPct} % asked`,
        });
      }
      shares.push({ clauseId: clause.id, clause: name, terms, least });
      honoured.push(name);
    } else if (clause.kind === 'limit') {
      const setting = limits.get(clause.id);
      if (invalid.has(clause.id) || !setting)
        return void unmet.push({ clauseId: clause.id, name, reason: 'its data has a problem (see the data problems)' });
      if (setting.problem)
        return void unmet.push({ clauseId: clause.id, name, reason: `it cannot be assessed: ${setting.problem}` });
      const limit = clause.limitDb as number;
      const period = project.periods.find((p) => p.id === clause.periodId);
      const added: ProblemCell[] = [];
      for (const phase of setting.phases) {
        const dutyIndexes = duties.flatMap((d, i) => (d.phaseId === phase.id ? [i] : []));
        if (dutyIndexes.length === 0) continue;
        for (const point of setting.points) {
          const terms: CellTerm[] = [];
          let computable = true;
          for (const di of dutyIndexes) {
            (duties[di] as ProblemDuty).options.forEach((o, k) => {
              const level = setting.contributionDb(o.candidateId, point.id);
              if (Number.isNaN(level) || level === Infinity) computable = false;
              const ratio = ratioFromDb(level - limit);
              if (ratio > 0) terms.push({ duty: di, option: k, ratio });
            });
          }
          if (!computable)
            return void unmet.push({
              clauseId: clause.id,
              name,
              reason: `a level at ${point.name} in ${phase.name} is not computable`,
            });
          added.push({
            phaseId: phase.id,
            phaseName: phase.name,
            periodId: period?.id ?? clause.periodId ?? '',
            periodName: period?.name ?? clause.periodId ?? '',
            ownPeriod: phase.periodId === clause.periodId,
            receiverId: point.id,
            receiverName: `${point.name} (${name}, ${limit} dB ${clause.metric === 'rating' ? 'LAr,T' : 'LAeq,T'})`,
            limitDb: limit,
            // The clause's contribution already carries the phase's shift into the clause's period.
            shiftDb: 0,
            terms,
            clause: name,
            contributionDb: (candidateId) => setting.contributionDb(candidateId, point.id),
          });
        }
      }
      cells.push(...added);
      honoured.push(name);
    }
  });

  const problem: FleetProblem = { ...base, duties, cells };
  if (shares.length > 0) problem.shares = shares;
  return { problem, honoured, unmet };
}

/** Ids of clauses with a problem in the evaluation's data problems. */
export function invalidClauseIds(project: Project, evaluation: Evaluation): Set<string> {
  const out = new Set<string>();
  (project.clauses ?? []).forEach((c, i) => {
    const prefix = `$.clauses[${i}]`;
    if (
      evaluation.problems.some(
        (p) => p.path === prefix || p.path.startsWith(`${prefix}.`) || p.path.startsWith(`${prefix}[`),
      )
    )
      out.add(c.id);
  });
  return out;
}
