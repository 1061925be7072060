/**
 * The uncertainty model of one fleet: for each assessed cell (phase × period × receiver with
 * a limit), the uncertain terms of its energetic sum, and which spreads they share.
 *
 * A term is a duty's contribution at the receiver, centred on its mean level:
 *   centre = contribution (as the ledger rates it) + period shift + the machine's centre shift
 * (./machine-spread.ts: −K when the rated level holds K). It varies by
 *   - the machine's error, σ = K/f: one per duty, shared by every cell (same machine);
 *   - the path's error (./path-spread.ts): one per place and receiver, shared by every
 *     phase and period (and by duties working at the same point);
 *   - the on-time, when the duty gives a range: uniform between its lowest and highest,
 *     one per duty, shared by every cell; the energy scales by η/η₀.
 * Spreads of different duties, places and receivers are independent. Not modelled: the
 * spread of a machine's position over a work area (the project holds points only), the
 * spread of screening and façade terms, weather beyond the method's own accuracy.
 *
 * Building it is O(duties × receivers + cells × duties per phase).
 */
import type { Candidate, Fleet, Project, UncertaintySettings } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import { own } from '../model/own.ts';
import { phasePeriods } from '../prediction/phase-periods.ts';
import { ratedLevel } from '../rating/rated-level.ts';
import { dbSumOrNaN } from '../prediction/safe.ts';
import { onTimeFactorMoments } from '../../core/energetic-sum-spread.ts';
import { machineSpread, type MachineSpread } from './machine-spread.ts';
import { pathSpread, type PathSpread } from './path-spread.ts';
import { uncertaintySettingsOf } from './settings.ts';
import { positionSpread, type PositionSpread } from './position-spread.ts';
import { limitOf } from '../model/limits.ts';

/** The uncertain on-time of a duty. */
export interface OnTimeSpread {
  nominalPct: number;
  lowPct: number;
  highPct: number;
  /** E[η/η₀] and E[(η/η₀)²] for η uniform on [low, high]. */
  mean: number;
  squareMean: number;
}

/** One duty of the fleet in the model. */
export interface DutySpread {
  dutyId: string;
  dutyName: string;
  candidateId: string;
  candidateLabel: string;
  machine: MachineSpread;
  onTime?: OnTimeSpread;
  /** Main working position over a line or area of the site plan (./position-spread.ts). */
  position?: PositionSpread;
}

/** One duty's term in a cell. */
export interface SpreadCellTerm {
  /** Index into `duties`. */
  duty: number;
  /** Index into `paths` (the shared path error). */
  path: number;
  /** Index of the receiver in the project (for the position factors). */
  receiver: number;
  /** Centre of the term's level, dB (mean machine, nominal on-time, in this cell's period). */
  centreDb: number;
}

/** One assessed cell. */
export interface SpreadCell {
  phaseId: string;
  periodId: string;
  receiverId: string;
  ownPeriod: boolean;
  limitDb: number;
  /** The ledger's level for the fleet (rated levels, nominal on-time), dB. */
  levelDb: number;
  terms: SpreadCellTerm[];
  /** Every term is computable. */
  computable: boolean;
}

export interface SpreadModel {
  settings: UncertaintySettings;
  duties: DutySpread[];
  paths: PathSpread[];
  cells: SpreadCell[];
}

/** The on-time spread of a duty with a usable range, else undefined. */
export function onTimeSpread(duty: Project['duties'][number]): OnTimeSpread | undefined {
  const r = duty.onTimeRangePct;
  const nominal = duty.onTimePct;
  if (!r || typeof r !== 'object') return undefined;
  const { lowPct, highPct } = r;
  if (!(lowPct > 0 && highPct >= lowPct && highPct <= 100 && nominal > 0)) return undefined;
  return { nominalPct: nominal, lowPct, highPct, ...onTimeFactorMoments(lowPct, highPct, nominal) };
}

/** A duty's position spread, built once per duty object and receiver list (it does not depend on the fleet). */
const positionMemo = new WeakMap<
  Project['duties'][number],
  { receivers: Project['receivers']; spread: PositionSpread | undefined }
>();
function positionOf(project: Project, duty: Project['duties'][number]): PositionSpread | undefined {
  const memo = positionMemo.get(duty);
  if (memo && memo.receivers === project.receivers) return memo.spread;
  const spread = positionSpread(project, duty);
  positionMemo.set(duty, { receivers: project.receivers, spread });
  return spread;
}

/**
 * The model for a fleet (the evaluation's own fleet by default; duties the fleet leaves
 * out use their baseline). Contributions are read from the evaluation, so any fleet of its
 * candidates can be modelled without evaluating again.
 */
export function buildSpreadModel(
  project: Project,
  evaluation: Evaluation,
  fleet: Fleet = evaluation.fleet,
): SpreadModel {
  const settings = uncertaintySettingsOf(project);
  const candidates = new Map<string, Candidate>(project.candidates.map((c) => [c.id, c]));
  const dutyIndex = new Map<string, number>();
  const duties: DutySpread[] = [];
  for (const d of project.duties) {
    const candidateId = own(fleet, d.id) ?? d.baselineCandidateId;
    const c = candidates.get(candidateId);
    const rated = c
      ? ratedLevel(c, project.settings)
      : { lwaDb: NaN, basis: project.settings.levelBasis, standIn: false, explanation: '' };
    const machine: MachineSpread = c
      ? machineSpread(c, rated, project.settings, settings)
      : {
          candidateId,
          kDb: NaN,
          kAssumed: false,
          sigmaDb: NaN,
          centreShiftDb: NaN,
          words: 'not a candidate of the project',
        };
    const onTime = onTimeSpread(d);
    const position = positionOf(project, d);
    dutyIndex.set(d.id, duties.length);
    duties.push({
      dutyId: d.id,
      dutyName: d.name,
      candidateId,
      candidateLabel: c?.label ?? candidateId,
      machine,
      ...(onTime ? { onTime } : {}),
      ...(position ? { position } : {}),
    });
  }

  const paths: PathSpread[] = [];
  const pathIndex = new Map<string, number>();
  const pathOf = (dutyI: number, receiverI: number): number => {
    const duty = project.duties[dutyI] as Project['duties'][number];
    const receiver = project.receivers[receiverI] as Project['receivers'][number];
    const spread = pathSpread(project, duty, receiver, settings);
    const known = pathIndex.get(spread.shareKey);
    if (known !== undefined) return known;
    pathIndex.set(spread.shareKey, paths.length);
    paths.push(spread);
    return paths.length - 1;
  };

  const cells: SpreadCell[] = [];
  for (const phase of project.phases) {
    const phaseDuties = project.duties.flatMap((d, i) => (d.phaseId === phase.id ? [i] : []));
    const assessed = phasePeriods(project, phase).periods;
    project.receivers.forEach((receiver, ri) => {
      const termPaths = phaseDuties.map((di) => pathOf(di, ri));
      for (const period of assessed) {
        const limit = limitOf(receiver, period.periodId);
        if (limit === undefined) continue;
        const terms: SpreadCellTerm[] = [];
        const levels: number[] = [];
        let computable = Number.isFinite(period.shiftDb);
        phaseDuties.forEach((di, q) => {
          const duty = duties[
            dutyIndex.get((project.duties[di] as Project['duties'][number]).id) as number
          ] as DutySpread;
          const level = evaluation.contributionDb(duty.candidateId, receiver.id) + period.shiftDb;
          levels.push(level);
          const centreDb = level + duty.machine.centreShiftDb;
          if (!Number.isFinite(centreDb) || !Number.isFinite(duty.machine.sigmaDb)) computable = false;
          terms.push({
            duty: dutyIndex.get(duty.dutyId) as number,
            path: termPaths[q] as number,
            receiver: ri,
            centreDb,
          });
        });
        cells.push({
          phaseId: phase.id,
          periodId: period.periodId,
          receiverId: receiver.id,
          ownPeriod: period.own,
          limitDb: limit,
          levelDb: dbSumOrNaN(levels),
          terms,
          computable,
        });
      }
    });
  }
  return { settings, duties, paths, cells };
}
