/**
 * What the ledger works out from the project as a whole: the evaluation of the assessed
 * fleet (the baseline unless the user chose another; src/ledger/model/fleets.ts, evaluate.ts), or why it could not be made, and every candidate's checks
 * (permissible level, rated LWA and stand-in, character penalty, operator exposure),
 * reused for candidates that did not change (./checks-memo.ts). After an edit the evaluation
 * is made from the previous one (src/ledger/prediction/evaluate-edit.ts: only what the edit
 * reached is computed again; geometry, periods, receivers and the method evaluate in full).
 */
import type { Candidate, Project } from '../../ledger/model/model.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import type { Evaluation } from '../../ledger/model/results.ts';
import { evaluateAfterEdit } from '../../ledger/prediction/evaluate-edit.ts';
import { assessedFleet } from '../../ledger/model/fleets.ts';
import { ChecksMemo, type CandidateChecks } from './checks-memo.ts';

export class ProjectResults {
  #project: () => Project;
  #checksMemo = new ChecksMemo();
  /** The last evaluation made, which the next one starts from (not reactive: a cache). */
  #last: Evaluation | undefined;

  /** @param project reads the current project (reactive). */
  constructor(project: () => Project) {
    this.#project = project;
  }

  readonly #evaluated = $derived.by((): { evaluation?: Evaluation; error?: string } => {
    try {
      const project = this.#project();
      const evaluation = evaluateAfterEdit(this.#last, project, assessedFleet(project).fleet, { skipValidation: true });
      this.#last = evaluation;
      return { evaluation };
    } catch (error) {
      return { error: error instanceof Error ? error.message : String(error) };
    }
  });

  readonly #checks = $derived.by(() => this.#checksMemo.checks(this.#project()));

  /** The evaluation of the assessed fleet, or undefined when the ledger could not evaluate. */
  get evaluation(): Evaluation | undefined {
    return this.#evaluated.evaluation;
  }

  /** Why the ledger could not evaluate, when it could not. */
  get evaluationError(): string | undefined {
    return this.#evaluated.error;
  }

  /** One candidate's checks, kept per candidate object (the same as `checks[candidate.id]`). */
  checkOf(candidate: Candidate): CandidateCheck {
    return this.#checksMemo.check(this.#project(), candidate);
  }

  /** The checks of every candidate, by candidate id. */
  get checks(): CandidateChecks {
    return this.#checks;
  }
}
