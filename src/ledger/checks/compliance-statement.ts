/**
 * The answer handed over: for the fleet being assessed, per phase and receiver, the
 * predicted level, the limit, the margin, and the measures the result relies on (the
 * machines chosen, screening, on-time, working hours). The app, the printed report and the
 * workbook show the same lines.
 */
import type { Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import { spanHours } from '../prediction/clock.ts';
import { BASELINE_FLEET, fleetWords } from '../model/fleets.ts';
import { SCREENING_WORDS as RULE_WORDS } from '../../core/screening-words.ts';

export type Verdict = 'complies' | 'over' | 'no-limit' | 'not-computed' | 'silent';

export interface ComplianceLine {
  phaseId: string;
  /** The period the line is for: the phase's own, or another its working hours run into. */
  periodId: string;
  receiverId: string;
  levelDb: number;
  limitDb?: number;
  marginDb?: number;
  verdict: Verdict;
  /** What the level relies on, each in a few words. */
  measures: string[];
  /** One sentence for a tender return. */
  sentence: string;
}

export interface ComplianceStatement {
  /** "the baseline fleet" or "fleet “…”". */
  fleet: string;
  /** True when every assessed cell is computed and at or under its limit (and at least one is assessed). */
  complies: boolean;
  /** One or two sentences over the whole project. */
  summary: string;
  lines: ComplianceLine[];
}

const one = (x: number) => x.toFixed(1);
/** Whole hours print without decimals, others with at most two (never 10.0000000000291). */
export function hoursText(hours: number): string {
  return String(Math.round(hours * 100) / 100);
}

const SCREENING_WORDS: Record<string, string> = {
  'top-visible': `${RULE_WORDS['top-visible'].long} (−5 dB)`,
  hidden: `${RULE_WORDS.hidden.long} (−10 dB)`,
};

/**
 * The compliance statement of an evaluation (made for the fleet named `fleetName`).
 * O(cells × duties of a phase).
 * @example complianceStatement(p, evaluateProject(p), 'baseline').lines[0].sentence
 * // "Predicted LAeq,12h at 2 Lantern Row during Demolition is 71.3 dB against a limit of 75 dB: complies with 3.7 dB to spare."
 */
export function complianceStatement(
  project: Project,
  evaluation: Evaluation,
  fleetName: string = BASELINE_FLEET,
): ComplianceStatement {
  const phases = new Map(project.phases.map((p) => [p.id, p] as const));
  const receivers = new Map(project.receivers.map((r) => [r.id, r] as const));
  const periods = new Map(project.periods.map((p) => [p.id, p] as const));
  const labels = new Map(project.candidates.map((c) => [c.id, c.label] as const));
  const lines: ComplianceLine[] = [];
  // What the fleet changes and the on-times are the same at every receiver of a phase: joined once per phase.
  const byPhase = new Map<string, { duties: Project['duties']; changed: string; onTime: string }>();
  for (const phase of project.phases) {
    if (byPhase.has(phase.id)) continue;
    const duties = project.duties.filter((d) => d.phaseId === phase.id);
    const changed: string[] = [];
    const onTime: string[] = [];
    for (const duty of duties) {
      const chosen = evaluation.fleet[duty.id] ?? duty.baselineCandidateId;
      if (chosen !== duty.baselineCandidateId) changed.push(`${labels.get(chosen) ?? 'no machine'} for ${duty.name}`);
      if (duty.onTimePct < 100) onTime.push(`${duty.name} ${duty.onTimePct} %`);
    }
    byPhase.set(phase.id, { duties, changed: changed.join(', '), onTime: onTime.join(', ') });
  }
  for (const cell of evaluation.matrix) {
    const phase = phases.get(cell.phaseId);
    const receiver = receivers.get(cell.receiverId);
    if (!phase || !receiver) continue;
    const period = periods.get(cell.periodId);
    const hours = period ? spanHours(period.start, period.end) : NaN;
    const { duties, changed, onTime } = byPhase.get(phase.id) as {
      duties: Project['duties'];
      changed: string;
      onTime: string;
    };
    const screens: string[] = [];
    for (const duty of duties) {
      const s = receiver.screening[duty.id];
      if (s && s.kind !== 'none') {
        const words =
          s.kind === 'explicit'
            ? `screened by ${s.db} dB`
            : s.kind === 'barrier'
              ? `behind a barrier (path difference ${s.pathDifferenceM} m)`
              : SCREENING_WORDS[s.kind];
        screens.push(`${duty.name} ${words}`);
      }
    }
    const measures: string[] = [];
    if (changed) measures.push(`machines in place of the baselines: ${changed}`);
    if (onTime) measures.push(`on-time at most: ${onTime}`);
    if (screens.length) measures.push(`screening from ${receiver.name}: ${screens.join(', ')}`);
    measures.push(`work only ${phase.start}–${phase.end}`);
    const level = cell.levelDb;
    const limit = cell.limitDb;
    let verdict: Verdict;
    if (Number.isNaN(level)) verdict = 'not-computed';
    else if (level === -Infinity) verdict = 'silent';
    else if (limit === undefined) verdict = 'no-limit';
    else if (cell.marginDb !== undefined && Number.isNaN(cell.marginDb)) verdict = 'not-computed';
    else verdict = cell.over ? 'over' : 'complies';
    const during = cell.ownPeriod
      ? phase.name
      : `${phase.name} (its ${hoursText(cell.hoursWorked)} h in the ${period?.name ?? cell.periodId} period)`;
    const where = `at ${receiver.name} during ${during}`;
    const t = Number.isFinite(hours) ? `${hoursText(hours)}h` : 'T';
    // With a character penalty the level is the rating level L_Ar,T of ISO 1996-1, with L_Aeq,T and the penalty said.
    const rated = cell.levelAeqDb !== undefined && Number.isFinite(cell.levelAeqDb) && Number.isFinite(level);
    const laeq = rated
      ? `rating level LAr,${t} (LAeq,${t} ${one(cell.levelAeqDb as number)} dB + character penalty ${one(cell.penaltyDb ?? level - (cell.levelAeqDb as number))} dB)`
      : `LAeq,${t}`;
    let sentence: string;
    if (verdict === 'not-computed')
      sentence = `Predicted ${laeq} ${where}: not computed, because an input it needs is missing or unreadable.`;
    else if (verdict === 'silent') sentence = `No machine works ${where}.`;
    else if (verdict === 'no-limit')
      sentence = `Predicted ${laeq} ${where} is ${one(level)} dB; no limit is set for this period.`;
    else {
      const margin = cell.marginDb ?? (limit as number) - level;
      sentence =
        verdict === 'complies'
          ? `Predicted ${laeq} ${where} is ${one(level)} dB against a limit of ${limit} dB: complies with ${one(margin)} dB to spare.`
          : `Predicted ${laeq} ${where} is ${one(level)} dB against a limit of ${limit} dB: ▲ over by ${one(-margin)} dB.`;
    }
    const line: ComplianceLine = {
      phaseId: phase.id,
      periodId: cell.periodId,
      receiverId: receiver.id,
      levelDb: level,
      verdict,
      measures,
      sentence,
    };
    if (limit !== undefined) line.limitDb = limit;
    if (cell.marginDb !== undefined) line.marginDb = cell.marginDb;
    lines.push(line);
  }
  const assessed = lines.filter((l) => l.verdict === 'complies' || l.verdict === 'over');
  const over = lines.filter((l) => l.verdict === 'over').length;
  const unknown = lines.filter((l) => l.verdict === 'not-computed').length;
  const complies = assessed.length > 0 && over === 0 && unknown === 0;
  const fleet = fleetWords(fleetName);
  const cost = Number.isFinite(evaluation.fleetCost)
    ? ` It costs ${project.currency} ${Math.round(evaluation.fleetCost).toLocaleString('en-GB')} for the duties as set.`
    : '';
  let summary: string;
  if (assessed.length === 0) summary = `No level of ${fleet} is compared with a limit yet.`;
  else if (complies)
    summary = `With ${fleet}, every one of the ${assessed.length} assessed phase and receiver pairs is predicted at or under its limit.${cost}`;
  else if (over)
    summary = `With ${fleet}, ${over} of the ${assessed.length} assessed phase and receiver pairs ${over === 1 ? 'is' : 'are'} predicted over the limit.${cost}`;
  else
    summary = `With ${fleet}, no computed level is over its limit, but ${unknown} ${unknown === 1 ? 'level is' : 'levels are'} not computed.${cost}`;
  summary +=
    ' Predictions carry an uncertainty of about ±3 dB (ISO 9613-2:1996); a competent acoustician and the local authority decide.';
  return { fleet, complies, summary, lines };
}
