/**
 * What every clause check reads: the project, its evaluation for the fleet assessed, the
 * candidates by id, the limit clauses' settings, costs and names.
 */
import type { Candidate, Duty, Fleet, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import type { PermissibleLookup } from '../rating/rating.ts';
import type { LimitSetting } from './limit-levels.ts';
import type { Substitution } from './answer-types.ts';
import { formatMoney } from '../costs/money.ts';
import { own } from '../model/own.ts';

export interface AnswerContext {
  project: Project;
  evaluation: Evaluation;
  /** The fleet assessed, one candidate for every duty. */
  fleet: Fleet;
  byId: ReadonlyMap<string, Candidate>;
  limits: ReadonlyMap<string, LimitSetting>;
  permissible?: PermissibleLookup;
}

/** A candidate's cost for its duty (NaN when not computable). */
export function costOf(ctx: AnswerContext, candidateId: string): number {
  return own(ctx.evaluation.costs, candidateId)?.total ?? NaN;
}

/** A candidate's label, or its id when it has none. */
export function labelOf(ctx: AnswerContext, candidateId: string): string {
  const c = ctx.byId.get(candidateId);
  return c ? c.label || c.id : candidateId;
}

export function money(ctx: AnswerContext, amount: number): string {
  return formatMoney(amount, ctx.project.currency);
}

/** The candidates a substitution may pick for a duty: offered for it, not excluded, cost computable. */
export function alternativesOf(ctx: AnswerContext, duty: Duty): Candidate[] {
  return ctx.project.candidates.filter(
    (c) => c.dutyId === duty.id && !c.excluded && Number.isFinite(costOf(ctx, c.id)),
  );
}

/** A substitution record for duty `duty`, from its fleet machine to `to`. */
export function substitution(ctx: AnswerContext, duty: Duty, to: Candidate): Substitution {
  const from = own(ctx.fleet, duty.id) ?? duty.baselineCandidateId;
  return {
    dutyId: duty.id,
    dutyName: duty.name,
    fromCandidateId: from,
    fromLabel: labelOf(ctx, from),
    toCandidateId: to.id,
    toLabel: to.label || to.id,
    extraCost: costOf(ctx, to.id) - costOf(ctx, from),
  };
}

/** Words for a set of substitutions: "Use B instead of A for Breaking (+£1,240); …". */
export function substitutionText(ctx: AnswerContext, subs: readonly Substitution[]): string {
  const signed = (x: number) => (x >= 0 ? `+${money(ctx, x)}` : `−${money(ctx, -x)}`);
  return subs
    .map((s) => `Use ${s.toLabel} instead of ${s.fromLabel} for ${s.dutyName} (${signed(s.extraCost)})`)
    .join('; ');
}
