/**
 * What a buyer or reviewer checks on each candidate, beside its level at the receivers:
 * - the Directive 2000/14/EC permissible sound power level (Stage II, as amended by
 *   2005/88/EC) and whether the declared guaranteed level is over it;
 * - the LWA the predictions use, on the project's level basis (ISO 4871:1996: guaranteed
 *   Ld = L + K by default, or the measured L), and whether the permissible level stands in
 *   for a missing declared value;
 * - the character penalty it draws at receivers (tonal or impulsive, 0, 3 or 6 dB);
 * - the operator's daily exposure L_EX,8h (ISO 9612:2009) against Directive 2003/10/EC and
 *   the time a day until 85 dB(A) is reached (NIOSH 98-126, 3 dB exchange rate).
 *
 * Computed once per project for every candidate, so the grid, the results, the workbook
 * and the command line all show the same figures. Never throws: what cannot be computed is
 * NaN or absent, with words saying why.
 */
import type { Candidate, Project } from '../model/model.ts';
import { REFERENCE_RECEIVER_ID } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import type { PermissibleLevel } from '../../core/standards/directive-2000-14-ec/index.ts';
import { checkPermissible, type PermissibleCheck } from '../rating/permissible.ts';
import { characterPenaltyDb } from '../rating/rating.ts';
import { ratedLevel } from '../rating/rated-level.ts';
import { operatorExposure, type OperatorExposure } from './operator-exposure.ts';

/** Everything shown per candidate for the directive, declaration, penalty and exposure checks. */
export interface CandidateCheck {
  /** The Stage II permissible LWA (dB, rounded), its working and the stage whose figures apply; absent when none applies. */
  permissible?: { levelDb: number; working: string; stage: PermissibleLevel['stage'] };
  /** The declared guaranteed level (L + K for a measured pair) is strictly above the permissible level. */
  overPermissible: boolean;
  /** Words for the user: why no permissible level applies, by how much a level is over, or that it stands in. */
  permissibleNote?: string;
  /** No declared LWA (nor octave bands): the permissible level stands in, conservatively. */
  standIn: boolean;
  /** The LWA the predictions use, dB; NaN when nothing usable is known. */
  ratedLwaDb: number;
  /** How the rated LWA was obtained, e.g. "measured 101.0 + K 2.0 = 103.0". */
  ratedExplanation: string;
  /** The project's level basis the rated LWA follows. */
  basis: 'guaranteed' | 'measured';
  /** Set when the basis cannot be reached (no K given): what the candidate is compared on instead. */
  offBasis?: string;
  /** Character penalty added at every receiver, dB (0 unless tonal or impulsive). */
  penaltyDb: number;
  /** Operator exposure, when the operator-position LpA and hours a day are given and readable. */
  exposure?: OperatorExposure;
}

const fmt = (x: number) => x.toFixed(1);

function safePermissible(candidate: Candidate): PermissibleCheck {
  try {
    return checkPermissible(candidate);
  } catch (e) {
    return { overPermissible: false, note: `${candidate.directiveCategory}: ${(e as Error).message}` };
  }
}

/** The declared guaranteed level Ld (L + K for a measured pair), or undefined when none is declared or readable. */
function guaranteedDeclared(candidate: Candidate): number | undefined {
  const declared = candidate.lwaDb;
  if (declared === undefined || declared === null || !Number.isFinite(declared)) return undefined;
  const k = candidate.uncertaintyDb;
  return candidate.declaration === 'measured' && k !== undefined && Number.isFinite(k) ? declared + k : declared;
}

/**
 * The checks of one candidate. O(1).
 * @example checkCandidate(project, { lwaDb: 104, directiveCategory: 'excavator', netPowerKw: 100, … }).permissibleNote
 *   // "guaranteed 104.0 dB is over the permissible 102 dB by 2.0 dB (Directive 2000/14/EC, Stage II)"
 */
export function checkCandidate(project: Project, candidate: Candidate, usedLwaDb?: number): CandidateCheck {
  const settings = project.settings;
  const rated = ratedLevel(candidate, settings);
  const check = safePermissible(candidate);
  const out: CandidateCheck = {
    overPermissible: check.overPermissible,
    standIn: rated.standIn,
    ratedLwaDb: usedLwaDb !== undefined && !Number.isNaN(usedLwaDb) ? usedLwaDb : rated.lwaDb,
    ratedExplanation: rated.explanation,
    basis: rated.basis,
    penaltyDb: characterPenaltyDb(candidate, settings),
  };
  if (rated.offBasis) out.offBasis = rated.offBasis;
  const p = check.permissible;
  if (p) out.permissible = { levelDb: p.levelDb, working: p.working, stage: p.stage };
  const guaranteed = guaranteedDeclared(candidate);
  if (p && check.overPermissible && guaranteed !== undefined) {
    out.permissibleNote = `guaranteed ${fmt(guaranteed)} dB is over the permissible ${p.levelDb} dB by ${fmt(guaranteed - p.levelDb)} dB (Directive 2000/14/EC, Stage ${p.stage})`;
  } else if (p && rated.standIn) {
    out.permissibleNote = `no declared LWA: the permissible level stands in, conservatively (Directive 2000/14/EC, Stage ${p.stage}): ${p.working}`;
  } else if (!p && check.note && candidate.directiveCategory) {
    out.permissibleNote = check.note;
  }
  const exposure = operatorExposure(candidate);
  if (exposure) out.exposure = exposure;
  return out;
}

/**
 * The checks of every candidate of a project, by candidate id. O(candidates).
 *
 * With an evaluation, the rated LWA is the value its predictions used (the `lw` term at the
 * reference receiver), so the grid and the results cannot disagree; without one, it is
 * computed here by the same rating the evaluation calls.
 * @example candidateChecks(demoProject())['dump-unlisted'] // { standIn: true, ratedLwaDb: 101, permissible: { levelDb: 101, … }, … }
 */
export function candidateChecks(project: Project, evaluation?: Evaluation): Record<string, CandidateCheck> {
  const out: Record<string, CandidateCheck> = {};
  for (const candidate of project.candidates) {
    const used = evaluation?.contribution(candidate.id, REFERENCE_RECEIVER_ID).terms.find((t) => t.key === 'lw')?.db;
    out[candidate.id] = checkCandidate(project, candidate, used);
  }
  return out;
}
