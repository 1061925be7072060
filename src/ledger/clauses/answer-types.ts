/**
 * The shapes of the clause-by-clause answer: what `answerClauses` returns and what the app,
 * the report, the workbook and the command line read. Types only.
 */
import type { Fleet } from '../model/model.ts';
import type { ClauseKind } from './clause.ts';

/** pass / fail; `stated` for a clause answered by the contractor's statement; `incomplete` when it cannot be judged yet. */
export type ClauseStatus = 'pass' | 'fail' | 'stated' | 'incomplete';

/** One line of evidence: the worst point of a phase, a machine against a cap, a duty's hours, a duty's part in a share. */
export interface ClauseEvidence {
  /** What the line is about, e.g. "Piling and groundworks at Riverside Cottages" or "Breaking: Hydraulic breaker HB-7". */
  subject: string;
  /** The figure in words, e.g. "68.2 dB LAeq,T, limit 70, margin 1.8 dB". */
  figure: string;
  /** This line meets the clause. */
  ok: boolean;
  dutyId?: string;
  candidateId?: string;
  phaseId?: string;
  /** Receiver id or boundary point id. */
  pointId?: string;
  /** The figure compared, dB or %. */
  value?: number;
  /** What it is compared with. */
  limit?: number;
}

/** One machine swapped for another of the same duty. */
export interface Substitution {
  dutyId: string;
  dutyName: string;
  fromCandidateId: string;
  fromLabel: string;
  toCandidateId: string;
  toLabel: string;
  /** Cost of the new machine − cost of the old one, for the duty. */
  extraCost: number;
}

/** What would make a failing clause pass: the cheapest substitutions (each needed). */
export interface ClauseFix {
  substitutions: Substitution[];
  extraCost: number;
  /** e.g. "Use Quiet breaker QB-2 instead of Hydraulic breaker HB-7 for Breaking (+£1,240)". */
  text: string;
}

export interface ClauseAnswer {
  clauseId: string;
  ref: string;
  kind: ClauseKind;
  /** The tender's words. */
  text: string;
  status: ClauseStatus;
  /** One line: the governing figure or the reason it cannot be judged. */
  summary: string;
  evidence: ClauseEvidence[];
  /** For a failure that one set of substitutions fixes. */
  fix?: ClauseFix;
  /** For a failure no substitution fixes, or no single one: what to do instead. */
  noFix?: string;
  /** The contractor's statement (the answer of a `statement` clause, a note for others). */
  statement?: string;
}

export interface ClausesAnswer {
  /** The fleet assessed (every duty). */
  fleet: Fleet;
  answers: ClauseAnswer[];
  counts: Record<ClauseStatus, number>;
  /** No clause fails and none is incomplete. */
  allMet: boolean;
}
