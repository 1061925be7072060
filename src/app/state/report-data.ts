/**
 * Everything the printed report shows that is worked out from the project: the compliance
 * statement, the clause-by-clause answer, how sure compliance is, each duty's ranking (with
 * how firm it is), every candidate's checks, the per-receiver rows and the level map of each phase, all for the fleet
 * being assessed. Worked here, once, when the report is printed or previewed; the report's
 * components only place and format these figures.
 */
import { REFERENCE_RECEIVER_ID, type Project } from '../../ledger/model/model.ts';
import type { Evaluation, RankingRow } from '../../ledger/model/results.ts';
import { rankEveryDuty } from '../../ledger/ranking/rank-every-duty.ts';
import { candidateChecks, type CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import { complianceStatement, type ComplianceStatement } from '../../ledger/checks/compliance-statement.ts';
import { receiverSummaries, type ReceiverSummary } from '../../ledger/checks/receiver-summary.ts';
import { answerClauses, type ClausesAnswer } from '../../ledger/clauses/answer.ts';
import { validateProject } from '../../ledger/validate/validate.ts';
import { complianceConfidence, type ComplianceConfidence } from '../../ledger/uncertainty/confidence.ts';
import { screenedPaths, type ScreenedPath } from '../../ledger/map/screened-paths.ts';
import { phaseMaps, type PhaseMap } from '../../io/map/phase-maps.ts';
import { rankingFirmness, type RankingFirmness } from './ranking-firmness.ts';

export interface ReportRanking {
  dutyId: string;
  receiverId: string;
  rows: RankingRow[];
  firmness: RankingFirmness;
}

export interface ReportData {
  statement: ComplianceStatement;
  clauses?: ClausesAnswer;
  confidence?: ComplianceConfidence;
  rankings: ReportRanking[];
  checks: Record<string, CandidateCheck>;
  receivers: ReceiverSummary[];
  /** Each path a barrier on the plan screens (empty with no barrier). */
  screened: ScreenedPath[];
  /** The level map of each phase with a duty on the site grid, for the fleet assessed (empty when it cannot be drawn). */
  maps: PhaseMap[];
}

/**
 * Each duty ranked at its phase's worst receiver for the baseline, or the reference receiver when there is none —
 * `rankEveryDuty`, the rule the workbook and `ledger evaluate` use too (a project that cannot be ranked gets no rows).
 */
export function defaultRankings(
  project: Project,
  evaluation: Evaluation,
): { dutyId: string; receiverId: string; rows: RankingRow[] }[] {
  try {
    return rankEveryDuty(project, evaluation);
  } catch {
    return project.duties.map((duty) => ({ dutyId: duty.id, receiverId: REFERENCE_RECEIVER_ID, rows: [] }));
  }
}

/**
 * The report's figures for `fleetName` (whose evaluation is given). `rankings`, when the
 * caller has them, replace the default ones. Parts that cannot be worked (e.g. the
 * simulation on a project with bad data) are left out rather than stopping the report.
 */
export function reportData(
  project: Project,
  evaluation: Evaluation,
  fleetName: string,
  rankings?: { dutyId: string; receiverId: string; rows: RankingRow[] }[],
): ReportData {
  const attempt = <T>(work: () => T): T | undefined => {
    try {
      return work();
    } catch {
      return undefined;
    }
  };
  const data: ReportData = {
    statement: complianceStatement(project, evaluation, fleetName),
    rankings: (rankings ?? defaultRankings(project, evaluation)).map((r) => ({
      ...r,
      firmness: rankingFirmness(r.rows, project.candidates),
    })),
    checks: candidateChecks(project, evaluation),
    receivers: receiverSummaries(project, evaluation),
    screened: (project.barriers ?? []).length > 0 ? (attempt(() => screenedPaths(project)) ?? []) : [],
    maps: attempt(() => phaseMaps(project, evaluation.fleet, fleetName, evaluation.worstReceiverByPhase)) ?? [],
  };
  // The clauses' own problems come from validation: the app's evaluation skips it.
  const clauses =
    (project.clauses ?? []).length === 0
      ? undefined
      : attempt(() =>
          answerClauses(project, { ...evaluation, problems: [...validateProject(project), ...evaluation.problems] }),
        );
  if (clauses) data.clauses = clauses;
  const confidence = attempt(() => complianceConfidence(project, evaluation));
  if (confidence) data.confidence = confidence;
  return data;
}
