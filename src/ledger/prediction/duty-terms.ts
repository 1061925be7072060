/**
 * The terms a duty adds to each of its candidates' levels, whatever the receiver: the
 * prediction engine's working-day terms (../../core/working-day-terms.ts) — number of units
 * 10·lg n, on-time 10·lg(η), and the working hours spread over the assessment period
 * 10·lg(hours worked inside the period / period length) — with the hours looked up from the
 * duty's phase and the phase's period.
 */
import type { Duty, Project } from '../model/model.ts';
import type { Term } from '../model/results.ts';
import { workingDayTerms } from '../../core/working-day-terms.ts';
import { overlapHours, spanHours } from './clock.ts';

export interface DutyTerms {
  terms: Term[];
  /** Sum of the terms, dB; NaN when one is not computable. */
  db: number;
  /** Why not computable, when it is not. */
  problem?: string;
}

/** Terms of one duty. Never throws. O(phases + periods) for the look-ups. */
export function dutyTerms(project: Project, duty: Duty): DutyTerms {
  const terms: Term[] = [];
  try {
    const phase = project.phases.find((p) => p.id === duty.phaseId);
    const period = phase ? project.periods.find((p) => p.id === phase.periodId) : undefined;
    if (!phase || !period) {
      workingDayTerms({ count: duty.count, onTimePct: duty.onTimePct }, terms);
      if (!phase) return { terms, db: NaN, problem: `phase ${JSON.stringify(duty.phaseId)} does not exist` };
      return { terms, db: NaN, problem: `period ${JSON.stringify(phase.periodId)} does not exist` };
    }
    workingDayTerms(
      {
        count: duty.count,
        onTimePct: duty.onTimePct,
        hoursWorked: overlapHours(phase.start, phase.end, period.start, period.end),
        periodHours: spanHours(period.start, period.end),
      },
      terms,
    );
  } catch (e) {
    return { terms, db: NaN, problem: (e as Error).message };
  }
  return { terms, db: terms.reduce((s, t) => s + t.db, 0) };
}

interface DutyTermsMemo {
  /** count, on-time, phase id; the phase found and its period id and hours; the period found and its hours. */
  inputs: unknown[];
  terms: DutyTerms;
}
const memos = new WeakMap<Duty, DutyTermsMemo>();

/** Every value {@link dutyTerms} reads for a duty, in a fixed order. O(phases + periods). */
function inputsOf(project: Project, duty: Duty): unknown[] {
  const phase = project.phases.find((p) => p.id === duty.phaseId);
  const period = phase ? project.periods.find((p) => p.id === phase.periodId) : undefined;
  return [
    duty.count,
    duty.onTimePct,
    duty.phaseId,
    phase,
    phase?.periodId,
    phase?.start,
    phase?.end,
    period,
    period?.start,
    period?.end,
  ];
}

/**
 * {@link dutyTerms}, reused (the same object) while the duty's units, on-time, phase and
 * the phase's and period's hours are unchanged; checked on every call, so a duty changed
 * in place is computed again. O(phases + periods).
 */
export function dutyTermsOf(project: Project, duty: Duty): DutyTerms {
  if (typeof duty !== 'object' || duty === null) return dutyTerms(project, duty);
  let inputs: unknown[];
  try {
    inputs = inputsOf(project, duty);
  } catch {
    return dutyTerms(project, duty); // a shapeless project: dutyTerms reports what is wrong
  }
  const memo = memos.get(duty);
  if (memo && memo.inputs.every((x, i) => Object.is(x, inputs[i]))) return memo.terms;
  const terms = dutyTerms(project, duty);
  memos.set(duty, { inputs, terms });
  return terms;
}
