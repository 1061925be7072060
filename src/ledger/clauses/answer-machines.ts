/**
 * Answers to the clauses judged machine by machine: caps on L_WA or on the level at a
 * distance (./machine-caps.ts), and working-hour restrictions (./working-hours.ts).
 * A failure is fixed by the cheapest machine of each failing duty that meets the clause.
 * O(duties covered + candidates of the failing duties).
 */
import type { Candidate, Duty } from '../model/model.ts';
import type { Clause } from './clause.ts';
import { CLAUSE_DEFAULTS } from './clause.ts';
import type { ClauseAnswer, ClauseEvidence, Substitution } from './answer-types.ts';
import {
  alternativesOf,
  costOf,
  labelOf,
  substitution,
  substitutionText,
  type AnswerContext,
} from './answer-context.ts';
import { capFigure, meetsCap } from './machine-caps.ts';
import { hoursOutside } from './working-hours.ts';
import { dutiesCovered } from './scope.ts';
import { own } from '../model/own.ts';

/** The cheapest candidate of a duty that `ok` accepts, or undefined. */
function cheapest(ctx: AnswerContext, duty: Duty, ok: (c: Candidate) => boolean): Candidate | undefined {
  let best: Candidate | undefined;
  for (const c of alternativesOf(ctx, duty)) if (ok(c) && (!best || costOf(ctx, c.id) < costOf(ctx, best.id))) best = c;
  return best;
}

/** Fix of a machine-by-machine failure: one substitution per failing duty, or what stops it. */
function fixDuties(
  ctx: AnswerContext,
  failing: readonly Duty[],
  ok: (c: Candidate) => boolean,
  none: (d: Duty) => string,
): Pick<ClauseAnswer, 'fix' | 'noFix'> {
  const subs: Substitution[] = [];
  for (const duty of failing) {
    const to = cheapest(ctx, duty, ok);
    if (!to) return { noFix: none(duty) };
    subs.push(substitution(ctx, duty, to));
  }
  return {
    fix: {
      substitutions: subs,
      extraCost: subs.reduce((s, x) => s + x.extraCost, 0),
      text: substitutionText(ctx, subs),
    },
  };
}

export function answerCap(ctx: AnswerContext, clause: Clause, base: ClauseAnswer): ClauseAnswer {
  const cap = clause.maxDb as number;
  const what = clause.kind === 'lp-cap' ? `Lp at ${clause.distanceM ?? CLAUSE_DEFAULTS.distanceM} m` : 'LWA';
  const figure = (c: Candidate) => capFigure(clause, c, ctx.project.settings, ctx.permissible);
  const evidence: ClauseEvidence[] = [];
  const failing: Duty[] = [];
  let uncomputed = false;
  for (const duty of dutiesCovered(ctx.project, clause)) {
    const c = ctx.byId.get(own(ctx.fleet, duty.id) as string);
    if (!c) continue;
    const f = figure(c);
    const ok = meetsCap(f.figureDb, cap);
    if (Number.isNaN(f.figureDb)) uncomputed = true;
    else if (!ok) failing.push(duty);
    evidence.push({
      subject: `${duty.name}: ${c.label || c.id}`,
      figure: `${f.explanation}; cap ${cap.toFixed(1)} dB`,
      ok,
      dutyId: duty.id,
      candidateId: c.id,
      value: f.figureDb,
      limit: cap,
    });
  }
  if (uncomputed)
    return { ...base, status: 'incomplete', summary: `Not assessed: a machine’s ${what} is not known.`, evidence };
  if (evidence.length === 0)
    return { ...base, status: 'pass', summary: 'No machine falls under this clause.', evidence };
  const top = evidence.reduce((a, b) => ((b.value as number) > (a.value as number) ? b : a));
  if (failing.length === 0)
    return {
      ...base,
      status: 'pass',
      summary: `Every machine within ${cap.toFixed(1)} dB; highest ${what} ${(top.value as number).toFixed(1)} dB (${top.subject}).`,
      evidence,
    };
  return {
    ...base,
    status: 'fail',
    summary: `${failing.length} machine${failing.length === 1 ? '' : 's'} over the cap of ${cap.toFixed(1)} dB ${what}; highest ${(top.value as number).toFixed(1)} dB (${top.subject}).`,
    evidence,
    ...fixDuties(
      ctx,
      failing,
      (c) => meetsCap(figure(c).figureDb, cap),
      (d) => `No machine offered for ${d.name} meets the cap: add one that does.`,
    ),
  };
}

/** True when an hours clause restricts this machine: its character matches (or the clause restricts any work). */
function restricts(clause: Clause, c: Candidate): boolean {
  const character = clause.character ?? CLAUSE_DEFAULTS.character;
  return character === 'any' || c.character === character;
}

export function answerHours(ctx: AnswerContext, clause: Clause, base: ClauseAnswer): ClauseAnswer {
  const start = clause.start as string;
  const end = clause.end as string;
  const character = clause.character ?? CLAUSE_DEFAULTS.character;
  const evidence: ClauseEvidence[] = [];
  const failing: Duty[] = [];
  for (const duty of dutiesCovered(ctx.project, clause)) {
    const id = own(ctx.fleet, duty.id) as string;
    const c = ctx.byId.get(id);
    const phase = ctx.project.phases.find((p) => p.id === duty.phaseId);
    if (!c || !phase || !restricts(clause, c)) continue;
    const outside = hoursOutside(phase.start, phase.end, start, end);
    const ok = outside === 0;
    if (!ok) failing.push(duty);
    const kind = character === 'any' ? 'works' : `${c.character} work`;
    evidence.push({
      subject: `${duty.name}: ${labelOf(ctx, id)}`,
      figure: `${kind} ${phase.start}–${phase.end} (${phase.name}); ${ok ? 'within' : `${outside.toFixed(1)} h outside`} ${start}–${end}`,
      ok,
      dutyId: duty.id,
      candidateId: id,
      phaseId: phase.id,
      value: outside,
      limit: 0,
    });
  }
  const words = character === 'any' ? 'Work' : `${character[0]!.toUpperCase()}${character.slice(1)} work`;
  if (failing.length === 0) {
    return {
      ...base,
      status: 'pass',
      summary:
        evidence.length === 0
          ? `No machine of the fleet does ${character === 'any' ? 'work' : `${character} work`} under this clause.`
          : `${words} stays within ${start}–${end}.`,
      evidence,
    };
  }
  const fix =
    character === 'any'
      ? {
          noFix: `Move the working hours of ${[...new Set(failing.map((d) => ctx.project.phases.find((p) => p.id === d.phaseId)?.name))].join(', ')} within ${start}–${end}; no machine changes this.`,
        }
      : fixDuties(
          ctx,
          failing,
          (c) => !restricts(clause, c),
          (d) =>
            `No machine without ${character} character is offered for ${d.name}: move its hours within ${start}–${end}, or add one.`,
        );
  return {
    ...base,
    status: 'fail',
    summary: `${failing.length} dut${failing.length === 1 ? 'y works' : 'ies work'} outside ${start}–${end}.`,
    evidence,
    ...fix,
  };
}
