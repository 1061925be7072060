/**
 * The contractor's answer to a tender's noise clauses, clause by clause, for the fleet
 * being assessed: pass, fail, "stated" (a clause answered by the contractor's statement)
 * or incomplete (cannot be judged yet, with the reason), the evidence, and for a failure
 * the cheapest substitution that passes.
 *
 * A clause whose own data has a problem (listed by validation, ./validate-clauses.ts) is
 * incomplete and says so; the others are judged. Never throws on bad data.
 * Cost: one evaluation of the boundary points when a limit applies along a boundary
 * (./limit-levels.ts), then O(clauses × duties × points).
 */
import type { Fleet, Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import type { PermissibleLookup } from '../rating/rating.ts';
import type { Clause } from './clause.ts';
import type { ClauseAnswer, ClausesAnswer, ClauseStatus } from './answer-types.ts';
import type { AnswerContext } from './answer-context.ts';
import { limitSettings, type LimitSetting } from './limit-levels.ts';
import { answerLimit } from './answer-limit.ts';
import { answerCap, answerHours } from './answer-machines.ts';
import { answerShare } from './answer-share.ts';
import { candidateIndex } from './scope.ts';

export interface AnswerOptions {
  permissible?: PermissibleLookup;
  /** Limit settings already built for this project and evaluation (the optimiser shares them). */
  limits?: ReadonlyMap<string, LimitSetting>;
}

/** The problems of the project's data that belong to clause `index` ("$.clauses[i]…"). */
function clauseProblems(evaluation: Evaluation, index: number): string[] {
  const prefix = `$.clauses[${index}]`;
  return evaluation.problems
    .filter((p) => p.path === prefix || p.path.startsWith(`${prefix}.`) || p.path.startsWith(`${prefix}[`))
    .map((p) => p.message);
}

function answerOne(ctx: AnswerContext, clause: Clause, index: number): ClauseAnswer {
  const base: ClauseAnswer = {
    clauseId: clause.id,
    ref: clause.ref,
    kind: clause.kind,
    text: clause.text,
    status: 'incomplete',
    summary: '',
    evidence: [],
  };
  const statement =
    typeof clause.statement === 'string' && clause.statement.trim() !== '' ? clause.statement : undefined;
  if (statement !== undefined) base.statement = statement;
  const problems = clauseProblems(ctx.evaluation, index);
  if (problems.length > 0) return { ...base, summary: `Not assessed: ${problems.join('; ')}` };
  switch (clause.kind) {
    case 'limit':
      return answerLimit(ctx, clause, base);
    case 'lwa-cap':
    case 'lp-cap':
      return answerCap(ctx, clause, base);
    case 'hours':
      return answerHours(ctx, clause, base);
    case 'share':
      return answerShare(ctx, clause, base);
    case 'statement':
      return statement !== undefined
        ? { ...base, status: 'stated', summary: 'Answered by the contractor’s statement.' }
        : {
            ...base,
            status: 'incomplete',
            summary: 'No statement written yet: write how the contractor meets this clause.',
          };
  }
}

/**
 * Answers every clause of the project for the fleet of `evaluation` (evaluate the fleet
 * being assessed first: `evaluateProject(project, fleet)`).
 * @example answerClauses(project, evaluateProject(project, fleet)).answers[0].status // 'pass'
 */
export function answerClauses(project: Project, evaluation: Evaluation, options: AnswerOptions = {}): ClausesAnswer {
  const fleet: Fleet = { ...evaluation.fleet };
  const ctx: AnswerContext = {
    project,
    evaluation,
    fleet,
    byId: candidateIndex(project),
    limits:
      options.limits ??
      limitSettings(project, evaluation, options.permissible ? { permissible: options.permissible } : {}),
  };
  if (options.permissible) ctx.permissible = options.permissible;
  const answers = (project.clauses ?? []).map((c, i) => answerOne(ctx, c, i));
  const counts: Record<ClauseStatus, number> = { pass: 0, fail: 0, stated: 0, incomplete: 0 };
  for (const a of answers) counts[a.status] += 1;
  return { fleet, answers, counts, allMet: counts.fail === 0 && counts.incomplete === 0 };
}

export type {
  ClauseAnswer,
  ClausesAnswer,
  ClauseStatus,
  ClauseEvidence,
  ClauseFix,
  Substitution,
} from './answer-types.ts';
