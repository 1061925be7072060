/**
 * The answer to a limit clause: per phase in the clause's period, the worst receiver or
 * boundary point with its level, the limit and the margin (limit − level); the clause
 * passes when no level is above the limit. A failure in one phase is fixed by the cheapest
 * single substitution in that phase that brings every point of it under the limit.
 * O(phases × points × duties) for the answer; O(candidates of the phase × points × duties) for the fix.
 */
import type { Clause } from './clause.ts';
import { CLAUSE_DEFAULTS } from './clause.ts';
import type { ClauseAnswer, ClauseEvidence } from './answer-types.ts';
import { alternativesOf, costOf, substitution, substitutionText, type AnswerContext } from './answer-context.ts';
import { limitCells, type LimitSetting } from './limit-levels.ts';
import { dbSum } from '../../core/decibel.ts';
import { LIMIT_TOLERANCE_DB } from '../optimise/outcome.ts';
import { own } from '../model/own.ts';

/** The quantity's name: "LAeq,T" or "LAr,T". */
export function metricWords(clause: Clause): string {
  return (clause.metric ?? CLAUSE_DEFAULTS.metric) === 'rating' ? 'LAr,T' : 'LAeq,T';
}

const fmt = (x: number) => (Number.isFinite(x) ? x.toFixed(1).replace('-', '−') : 'not computed');

export function answerLimit(ctx: AnswerContext, clause: Clause, base: ClauseAnswer): ClauseAnswer {
  const setting = ctx.limits.get(clause.id) as LimitSetting;
  const limit = clause.limitDb as number;
  const q = metricWords(clause);
  const period = ctx.project.periods.find((p) => p.id === clause.periodId);
  if (setting.problem) return { ...base, status: 'incomplete', summary: `Not assessed: ${setting.problem}.` };
  if (setting.phases.length === 0) {
    return {
      ...base,
      status: 'pass',
      summary: `No phase of the works falls in ${period?.name ?? clause.periodId}: nothing is assessed against this limit.`,
    };
  }
  const cells = limitCells(ctx.project, setting, ctx.fleet);
  const pointName = new Map(setting.points.map((p) => [p.id, p.name] as const));
  const evidence: ClauseEvidence[] = [];
  let uncomputed = false;
  let worst: ClauseEvidence | undefined;
  const failing: string[] = [];
  for (const phase of setting.phases) {
    const here = cells.filter((c) => c.phaseId === phase.id);
    if (here.some((c) => Number.isNaN(c.levelDb))) {
      uncomputed = true;
      evidence.push({
        subject: phase.name,
        figure: 'not computed (a level it needs is not computable)',
        ok: false,
        phaseId: phase.id,
      });
      continue;
    }
    const top = here.reduce((a, b) => (b.levelDb > a.levelDb ? b : a));
    const ok = top.levelDb <= limit + LIMIT_TOLERANCE_DB;
    if (!ok) failing.push(phase.id);
    const row: ClauseEvidence = {
      subject: `${phase.name} at ${pointName.get(top.pointId) ?? top.pointId}`,
      figure: `${fmt(top.levelDb)} dB ${q}, limit ${fmt(limit)}, margin ${fmt(limit - top.levelDb)} dB`,
      ok,
      phaseId: phase.id,
      pointId: top.pointId,
      value: top.levelDb,
      limit,
    };
    evidence.push(row);
    if (!worst || (row.value as number) > (worst.value as number)) worst = row;
  }
  if (uncomputed)
    return {
      ...base,
      status: 'incomplete',
      summary: 'Not assessed: a level it needs is not computable (see the data problems).',
      evidence,
    };
  const w = worst as ClauseEvidence;
  const status = failing.length === 0 ? 'pass' : 'fail';
  const summary = `Worst: ${w.subject}, ${w.figure}.`;
  if (status === 'pass') return { ...base, status, summary, evidence };
  if (failing.length > 1)
    return {
      ...base,
      status,
      summary,
      evidence,
      noFix:
        'Over the limit in more than one phase: no single substitution meets it; find the cheapest fleet that meets every clause with the optimiser.',
    };
  return { ...base, status, summary, evidence, ...fixOnePhase(ctx, setting, failing[0] as string, limit) };
}

/** The cheapest single substitution in a phase that brings every point under the limit. */
function fixOnePhase(
  ctx: AnswerContext,
  setting: LimitSetting,
  phaseId: string,
  limit: number,
): Pick<ClauseAnswer, 'fix' | 'noFix'> {
  const duties = ctx.project.duties.filter((d) => d.phaseId === phaseId);
  let best: { duty: (typeof duties)[number]; candidateId: string; extra: number } | undefined;
  for (const duty of duties) {
    const current = own(ctx.fleet, duty.id) as string;
    const currentCost = costOf(ctx, current);
    for (const alt of alternativesOf(ctx, duty)) {
      if (alt.id === current) continue;
      const extra = costOf(ctx, alt.id) - currentCost;
      if (best && extra >= best.extra) continue;
      const passes = setting.points.every((p) => {
        const level = dbSum(
          duties.map((d) => setting.contributionDb(d.id === duty.id ? alt.id : (own(ctx.fleet, d.id) as string), p.id)),
        );
        return level <= limit + LIMIT_TOLERANCE_DB;
      });
      if (passes) best = { duty, candidateId: alt.id, extra };
    }
  }
  if (!best)
    return {
      noFix:
        'No single substitution in this phase meets the limit; find the cheapest fleet that meets every clause with the optimiser, or add quieter machines or screening.',
    };
  const sub = substitution(ctx, best.duty, ctx.byId.get(best.candidateId)!);
  return { fix: { substitutions: [sub], extraCost: sub.extraCost, text: substitutionText(ctx, [sub]) } };
}
