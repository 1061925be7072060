/**
 * The per-candidate checks (Directive 2000/14/EC permissible level, rated LWA and stand-in,
 * character penalty, operator exposure) of a whole project, computed by the ledger's
 * `checkCandidate` and reused for candidates that did not change.
 *
 * The Workspace replaces an edited candidate by a new object and keeps the others, and a
 * check depends only on the candidate and the project settings. So a check is kept per
 * candidate object (WeakMap) with the settings object it was made with: after an edit of
 * one machine among 5,000, one check is recomputed and 4,999 are looked up. A settings
 * change (level basis, character penalty) recomputes them all.
 *
 * Cost: O(candidates) look-ups per call, plus O(1) ledger work per changed candidate.
 */
import type { Candidate, Project, ProjectSettings } from '../../ledger/model/model.ts';
import { checkCandidate, type CandidateCheck } from '../../ledger/checks/candidate-checks.ts';

export type CandidateChecks = Record<string, CandidateCheck>;

export class ChecksMemo {
  #kept = new WeakMap<Candidate, { settings: ProjectSettings; check: CandidateCheck }>();

  /** The checks of every candidate of the project, by candidate id. */
  checks(project: Project): CandidateChecks {
    const out: CandidateChecks = {};
    for (const candidate of project.candidates) out[candidate.id] = this.check(project, candidate);
    return out;
  }

  /** The check of one candidate (from the memo when the candidate and the settings are unchanged). */
  check(project: Project, candidate: Candidate): CandidateCheck {
    const kept = this.#kept.get(candidate);
    if (kept && kept.settings === project.settings) return kept.check;
    const check = checkCandidate(project, candidate);
    this.#kept.set(candidate, { settings: project.settings, check });
    return check;
  }
}
