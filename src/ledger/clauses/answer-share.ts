/**
 * The answer to a share clause: the share of electric (or other named energy) plant the
 * fleet reaches, by count or by machine-hours (./share.ts), against the least share asked.
 * A failure is fixed by the cheapest single substitution to a counted machine that reaches
 * the share. O(duties + candidates).
 */
import type { Clause } from './clause.ts';
import { CLAUSE_DEFAULTS } from './clause.ts';
import type { ClauseAnswer, ClauseEvidence } from './answer-types.ts';
import {
  alternativesOf,
  costOf,
  labelOf,
  substitution,
  substitutionText,
  type AnswerContext,
} from './answer-context.ts';
import { countedEnergies, shareOf, SHARE_TOLERANCE_PCT } from './share.ts';

const num = (x: number) => (Number.isInteger(x) ? String(x) : x.toFixed(1));

export function answerShare(ctx: AnswerContext, clause: Clause, base: ClauseAnswer): ClauseAnswer {
  const least = clause.minPct as number;
  const byHours = (clause.basis ?? CLAUSE_DEFAULTS.basis) === 'hours';
  const unit = byHours ? 'machine-hours' : 'units';
  const energies = countedEnergies(clause).join(' or ');
  const s = shareOf(ctx.project, clause, ctx.fleet, ctx.byId);
  const dutyName = new Map(ctx.project.duties.map((d) => [d.id, d.name] as const));
  const evidence: ClauseEvidence[] = s.rows.map((r) => ({
    subject: `${dutyName.get(r.dutyId) ?? r.dutyId}: ${labelOf(ctx, r.candidateId)}`,
    figure: `${num(r.weight)} ${r.weight === 1 && !byHours ? 'unit' : unit}, ${r.counted ? energies : `not ${energies}`}`,
    ok: r.counted,
    dutyId: r.dutyId,
    candidateId: r.candidateId,
    value: r.weight,
  }));
  if (Number.isNaN(s.sharePct))
    return {
      ...base,
      status: 'incomplete',
      summary:
        s.rows.length === 0
          ? 'Not assessed: no duty falls under this clause.'
          : `Not assessed: a duty’s ${unit} are not computable.`,
      evidence,
    };
  const reached = `${s.sharePct.toFixed(1)} % ${energies} (${num(s.countedWeight)} of ${num(s.totalWeight)} ${unit}); at least ${num(least)} % asked`;
  if (s.sharePct + SHARE_TOLERANCE_PCT >= least)
    return { ...base, status: 'pass', summary: `Share reached ${reached}.`, evidence };
  // Cheapest single swap of an uncounted duty to a counted machine that reaches the share.
  let best: { row: (typeof s.rows)[number]; to: string; extra: number } | undefined;
  for (const row of s.rows) {
    if (row.counted) continue;
    const after = (100 * (s.countedWeight + row.weight)) / s.totalWeight;
    if (after + SHARE_TOLERANCE_PCT < least) continue;
    const duty = ctx.project.duties.find((d) => d.id === row.dutyId);
    if (!duty) continue;
    for (const alt of alternativesOf(ctx, duty)) {
      if (!countedEnergies(clause).includes(alt.energy)) continue;
      const extra = costOf(ctx, alt.id) - costOf(ctx, row.candidateId);
      if (!best || extra < best.extra) best = { row, to: alt.id, extra };
    }
  }
  const out: ClauseAnswer = { ...base, status: 'fail', summary: `Share reached ${reached}.`, evidence };
  if (!best)
    return {
      ...out,
      noFix: `No single substitution reaches ${num(least)} %: find the cheapest fleet that meets every clause with the optimiser, or offer more ${energies} machines.`,
    };
  const duty = ctx.project.duties.find((d) => d.id === best.row.dutyId)!;
  const sub = substitution(ctx, duty, ctx.byId.get(best.to)!);
  return { ...out, fix: { substitutions: [sub], extraCost: sub.extraCost, text: substitutionText(ctx, [sub]) } };
}
