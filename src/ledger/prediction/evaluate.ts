/**
 * Evaluation of a project: every candidate's contribution at every receiver, every phase
 * total for a fleet, the margins to the limits and the cost of every candidate.
 *
 * Contribution of candidate c of duty u at receiver r, dB LAeq,T:
 *   L = LWA(rated) + path(u, r) + 10·lg n + 10·lg η + 10·lg(T_work / T) + façade − screening + penalty
 * where path(u, r) is the simple spreading term 10·lg(Q/(4πr²)) or the ISO 9613-2:1996 path
 * (−A + D_Ω − C_met; with octave-band sound power and the general ground method each band is
 * attenuated separately and A-weighted after propagation). Phase total at a receiver: the
 * energetic sum of the contributions of the fleet's candidates for the phase's duties.
 *
 * Cost: the path table is built once per geometry, O(duties × receivers × 8) path
 * evaluations (./path-table.ts); the contributions then take O(candidates × receivers)
 * (× 8 multiply-adds for candidates with octave bands) and sit in one Float64Array,
 * levels[candidate × receivers + receiver], so `contributionDb` is an O(1) look-up
 * (./levels.ts). After an edit of a few candidates only their rows are recomputed (the
 * others copied), and what each candidate alone gives (rated LWA, cost) is reused for the
 * unchanged ones (./candidate-memo.ts): a re-evaluation is then O(candidates × receivers)
 * copied + O(phases × receivers × duties), results unchanged.
 * Terms for display are assembled on demand by `contribution`.
 * Never throws on bad data: what cannot be computed is NaN, with a DataProblem.
 */
import { pathAccuracyNotes } from './path-accuracy.ts';
import { basisNotes } from '../rating/basis-notes.ts';
import type { Candidate, Fleet, Project, Receiver } from '../model/model.ts';
import { REFERENCE_RECEIVER_ID } from '../model/model.ts';
import type { Contribution, DataProblem, DutyCost, Evaluation, MatrixCell, Term } from '../model/results.ts';
import {
  characterPenaltyDb,
  declaredRatedLwaDb,
  type PermissibleLookup,
  type RatedSoundPower,
} from '../rating/rating.ts';
import {
  pathEntryAt,
  pathProblemAt,
  pathTableFor,
  pairsWithProblems,
  takeDonor,
  type PathTable,
} from './path-table.ts';
import { dutyTermsOf } from './duty-terms.ts';
import { dutyCostOf, memoOf, ratedLevelOf, spectrumSharesInto } from './candidate-memo.ts';
import { levelGrid } from './levels.ts';
import { penaltyTerm } from '../../core/working-day-terms.ts';
import { validateProject } from '../validate/validate.ts';
import { dbSumOrNaN } from './safe.ts';
import { own } from '../model/own.ts';
import { phasePeriods, unassessedHourNotes, type PhasePeriod } from './phase-periods.ts';
import { limitOf } from '../model/limits.ts';

export { computeLevels } from './levels.ts';

export interface EvaluateOptions {
  /** Permissible level standing in for a missing LWA; defaults to the Directive 2000/14/EC Stage II level (./permissible.ts). */
  permissible?: PermissibleLookup;
  /** Skip validation (the caller has validated already); problems then hold evaluation findings only. */
  skipValidation?: boolean;
}

/** What the last evaluation on a path table derived from the candidate list: shared by the next one where the list gives the same again. */
interface ListState {
  /** The candidate objects, by position (a copy of the list). */
  candidates: Candidate[];
  ids: unknown[];
  candidateIndex: Map<string, number>;
  costList: DutyCost[];
  costs: Record<string, DutyCost>;
}
const lastLists = new WeakMap<PathTable, ListState>();

/**
 * The numbers behind an evaluation: path table, kernel inputs, levels and costs.
 * O(candidates) with the per-candidate memos (./candidate-memo.ts) and the row sharing
 * of ./levels.ts; O(candidates × receivers × 8) when every row is new.
 */
function kernel(project: Project, permissible: PermissibleLookup | undefined, problems: DataProblem[]) {
  const table = pathTableFor(project);
  const nr = table.receiverIds.length;
  const cands = project.candidates;
  const nc = cands.length;
  const settings = project.settings;
  const donor = takeDonor(table);
  const last = lastLists.get(table) ?? (donor ? lastLists.get(donor.donor) : undefined);
  const dutyIndex = new Map(project.duties.map((d, i) => [d.id, i] as const));
  const receiverIndex = new Map(table.receiverIds.map((id, i) => [id, i] as const));
  const ids: unknown[] = new Array(nc);
  let sameIds = last !== undefined && last.ids.length === nc;
  for (let i = 0; i < nc; i++) {
    const id = (cands[i] as Candidate).id;
    ids[i] = id;
    if (sameIds && last!.ids[i] !== id) sameIds = false;
  }
  const candidateIndex = sameIds ? last!.candidateIndex : new Map(cands.map((c, i) => [c.id, i] as const));
  const dutyDb = project.duties.map((d) => dutyTermsOf(project, d));
  const dutyOf = new Int32Array(nc);
  const baseDb = new Float64Array(nc);
  const spectrum = new Float64Array(nc * 8);
  const withBands = new Uint8Array(nc);
  const bandsUsable = table.bandTransmission !== undefined;
  // Rated LWA with its words: written here only where the number needs the full rating, else on first read (ratedOf).
  const rated: (RatedSoundPower | undefined)[] = new Array(nc);
  const basis = settings.levelBasis;
  const costList: DutyCost[] = new Array(nc);
  let sameCosts = sameIds;
  for (let i = 0; i < nc; i++) {
    const c = cands[i] as Candidate;
    const memo = memoOf(c, last?.candidates[i]);
    const u = dutyIndex.get(c.dutyId) ?? -1;
    dutyOf[i] = u;
    let lwa = declaredRatedLwaDb(c, basis);
    if (lwa === undefined) {
      const r = (rated[i] = ratedLevelOf(memo, c, settings, permissible));
      lwa = r.lwaDb;
      if (Number.isNaN(lwa)) {
        problems.push({
          path: `$.candidates[${i}].lwaDb`,
          message: `Candidate ${JSON.stringify(c.label)}, LWA: ${r.explanation} (give the declared LWA in dB, e.g. 104.5, octave bands, or a directive category with its power)`,
        });
      }
    }
    baseDb[i] = u < 0 ? NaN : lwa + characterPenaltyDb(c, settings) + (dutyDb[u]?.db ?? NaN);
    if (bandsUsable && spectrumSharesInto(c, spectrum, i * 8)) withBands[i] = 1;
    // The duty a cost is for: the last duty with the id (dutyIndex keeps the last).
    const duty = u < 0 ? undefined : project.duties[u];
    const cost = (costList[i] = duty ? dutyCostOf(memo, c, duty, project.currency) : missingDutyCost(c));
    if (sameCosts && last!.costList[i] !== cost) sameCosts = false;
  }
  dutyDb.forEach((d, u) => {
    if (d.problem)
      problems.push({
        path: `$.duties[${u}]`,
        message: `Duty ${JSON.stringify(project.duties[u]?.name)}: ${d.problem}`,
      });
  });
  for (const i of pairsWithProblems(table)) {
    const u = Math.floor(i / nr);
    const r = i % nr;
    const receiver = project.receivers[r];
    const problem = pathProblemAt(table, i) as string;
    problems.push({
      path: receiver ? `$.receivers[${r}]` : '$.settings.referenceDistanceM',
      message: receiver
        ? `Path from duty ${JSON.stringify(project.duties[u]?.name)} to receiver ${JSON.stringify(receiver.name)}: ${problem}`
        : problem,
    });
  }
  const levels = levelGrid(table, { dutyOf, baseDb, spectrum, withBands }, donor?.sameColumns ? donor : undefined);
  let costs: Record<string, DutyCost>;
  if (sameCosts) {
    costs = last!.costs;
  } else {
    costs = {};
    for (let i = 0; i < nc; i++) costs[ids[i] as string] = costList[i] as DutyCost;
  }
  const list = cands.slice();
  lastLists.set(table, { candidates: list, ids, candidateIndex, costList, costs });
  const ratedOf = (i: number): RatedSoundPower | undefined => {
    const c = list[i];
    if (c === undefined) return undefined;
    return (rated[i] ??= ratedLevelOf(memoOf(c), c, settings, permissible));
  };
  return { table, receiverIndex, candidateIndex, dutyOf, baseDb, withBands, levels, dutyDb, ratedOf, costs };
}

/** The cost of a candidate whose duty does not exist: not computed. */
function missingDutyCost(c: Candidate): DutyCost {
  return {
    candidateId: c.id,
    total: NaN,
    explanation: `not computed: duty ${JSON.stringify(c.dutyId)} does not exist`,
  };
}

/** Every prefix of a JSON path that ends before a "." or "[", and the path itself. O(length). */
function pathPrefixes(path: string, into: Set<string>): void {
  for (let i = 0; i < path.length; i++) {
    const ch = path[i];
    if (ch === '.' || ch === '[') into.add(path.slice(0, i));
  }
  into.add(path);
}

/**
 * Adds the evaluation's findings to the validation's problems, leaving out a finding
 * when a problem at its path or inside it (a longer path starting with it and "." or "[")
 * is already listed. O((problems + findings) × path length).
 */
function mergeFindings(problems: DataProblem[], found: readonly DataProblem[]): void {
  if (found.length === 0) return;
  const listed = new Set<string>();
  for (const q of problems) pathPrefixes(q.path, listed);
  for (const p of found) {
    if (listed.has(p.path)) continue;
    problems.push(p);
    pathPrefixes(p.path, listed);
  }
}

/**
 * Evaluates a project for a fleet (the baselines by default; duties the fleet leaves out
 * use their baseline).
 * @example evaluateProject(demoProject()).matrix[0] // { phaseId: 'ph-demolition', receiverId: 'r-terrace', levelDb: 76.9, limitDb: 75, marginDb: -1.9, over: true, … }
 */
export function evaluateProject(project: Project, fleet?: Fleet, options: EvaluateOptions = {}): Evaluation {
  const problems: DataProblem[] = options.skipValidation ? [] : validateProject(project);
  const found: DataProblem[] = [];
  const k = kernel(project, options.permissible, found);
  mergeFindings(problems, found);
  const nr = k.table.receiverIds.length;

  const chosen: Fleet = {};
  project.duties.forEach((d) => {
    const pick = own(fleet, d.id);
    if (pick !== undefined) {
      const ci = k.candidateIndex.get(pick);
      if (ci === undefined || project.candidates[ci]?.dutyId !== d.id) {
        problems.push({
          path: `fleet[${JSON.stringify(d.id)}]`,
          message: `Fleet, duty ${JSON.stringify(d.name)}: ${JSON.stringify(pick)} is not a candidate of this duty (use one of ${candidatesOf(project, d.id).join(', ')})`,
        });
      }
      chosen[d.id] = pick;
    } else {
      chosen[d.id] = d.baselineCandidateId;
    }
  });

  const costs = k.costs;
  const levels = k.levels;

  const contributionDb = (candidateId: string, receiverId: string): number => {
    const c = k.candidateIndex.get(candidateId);
    const r = k.receiverIndex.get(receiverId);
    if (c === undefined || r === undefined) return NaN;
    return levels[c * nr + r] as number;
  };

  const contribution = (candidateId: string, receiverId: string): Contribution => {
    const c = k.candidateIndex.get(candidateId);
    const r = k.receiverIndex.get(receiverId);
    if (c === undefined || r === undefined) return { candidateId, receiverId, levelDb: NaN, terms: [] };
    const cand = project.candidates[c] as Candidate;
    const u = k.dutyOf[c] as number;
    const terms: Term[] = [
      { key: 'lw', label: `Sound power LWA: ${k.ratedOf(c)?.explanation ?? ''}`, db: k.ratedOf(c)?.lwaDb ?? NaN },
    ];
    const entry = u >= 0 ? pathEntryAt(k.table, u * nr + r) : undefined;
    if (entry) {
      if (k.withBands[c] === 1 && k.table.hasBands[u * nr + r]) {
        terms.push({
          key: 'octavePath',
          label: 'Octave-band path, ISO 9613-2:1996 general method, A-weighted over this machine’s spectrum',
          db: (levels[c * nr + r] as number) - (k.baseDb[c] as number) - (k.table.receiverDb[u * nr + r] as number),
        });
      } else {
        terms.push(...entry.pathTerms);
      }
    }
    if (u >= 0) terms.push(...(k.dutyDb[u]?.terms ?? []));
    if (entry) terms.push(...entry.receiverTerms);
    terms.push(...penaltyTerm(characterPenaltyDb(cand, project.settings), cand.character));
    return { candidateId, receiverId, levelDb: levels[c * nr + r] as number, terms };
  };

  const matrix: MatrixCell[] = [];
  const worstReceiverByPhase: Record<string, string> = {};
  const realReceivers = project.receivers.length > 0 ? project.receivers.map((r) => r.id) : [REFERENCE_RECEIVER_ID];
  // Look-ups done once rather than per cell: each receiver's column, its limits (the first receiver with the id, as a search would find).
  const columns = realReceivers.map((id) => k.receiverIndex.get(id) ?? -1);
  const receiverById = new Map<string, Receiver>();
  for (const r of project.receivers) if (!receiverById.has(r.id)) receiverById.set(r.id, r);
  for (const phase of project.phases) {
    const chosenRows = project.duties
      .filter((d) => d.phaseId === phase.id)
      .map((d) => k.candidateIndex.get(own(chosen, d.id) as string) ?? -1);
    const here: number[] = new Array(chosenRows.length);
    const withoutPenalty: number[] = new Array(chosenRows.length);
    const penalties = chosenRows.map((row) =>
      row < 0 ? 0 : characterPenaltyDb(project.candidates[row] as Candidate, project.settings),
    );
    const penaltyApplies = penalties.some((x) => x !== 0);
    const assessed = periodsOfPhase(project, phase);
    let worst: { id: string; key: number } | undefined;
    for (let j = 0; j < realReceivers.length; j++) {
      const receiverId = realReceivers[j] as string;
      const col = columns[j] as number;
      for (let q = 0; q < chosenRows.length; q++) {
        const row = chosenRows[q] as number;
        here[q] = row < 0 || col < 0 ? NaN : (levels[row * nr + col] as number);
        withoutPenalty[q] = (here[q] as number) - (penalties[q] as number);
      }
      const ownLevelDb = dbSumOrNaN(here);
      const ownAeqDb = penaltyApplies ? dbSumOrNaN(withoutPenalty) : ownLevelDb;
      for (const period of assessed) {
        const levelDb = ownLevelDb === -Infinity ? ownLevelDb : ownLevelDb + period.shiftDb;
        const limitDb = limitOf(receiverById.get(receiverId), period.periodId);
        const hasLimit = limitDb !== undefined;
        const cell: MatrixCell = {
          phaseId: phase.id,
          receiverId,
          periodId: period.periodId,
          ownPeriod: period.own,
          hoursWorked: period.hoursWorked,
          periodHours: period.periodHours,
          levelDb,
          over: hasLimit && levelDb > (limitDb as number),
        };
        if (hasLimit) {
          cell.limitDb = limitDb;
          cell.marginDb = (limitDb as number) - levelDb;
        }
        if (penaltyApplies) {
          cell.levelAeqDb = ownAeqDb === -Infinity ? ownAeqDb : ownAeqDb + period.shiftDb;
          cell.penaltyDb = levelDb - cell.levelAeqDb;
        }
        matrix.push(cell);
        // Least margin first; receivers without a limit only by level, after those with one.
        const key = hasLimit ? -(cell.marginDb as number) : levelDb - 1e6;
        if (!Number.isNaN(key) && (worst === undefined || key > worst.key)) worst = { id: receiverId, key };
      }
    }
    if (worst) worstReceiverByPhase[phase.id] = worst.id;
  }

  let fleetCost = 0;
  for (const d of project.duties) fleetCost += own(costs, own(chosen, d.id) as string)?.total ?? NaN;

  return {
    fleet: chosen,
    costs,
    contributionDb,
    contribution,
    matrix,
    worstReceiverByPhase,
    fleetCost,
    problems,
    notes: [...unassessedHourNotes(project), ...basisNotes(project), ...pathAccuracyNotes(project)],
  };
}

/**
 * The periods a phase is assessed in (./phase-periods.ts); when its own period is not
 * among them (its hours miss it: a validation problem) the own period still gets a cell,
 * not computed.
 */
function periodsOfPhase(project: Project, phase: Project['phases'][number]): PhasePeriod[] {
  const found = phasePeriods(project, phase).periods;
  if (found.some((p) => p.own)) return found;
  return [
    { periodId: phase.periodId, hoursWorked: 0, periodHours: NaN, own: true, shiftDb: NaN },
    ...found.map((p) => ({ ...p, shiftDb: NaN })),
  ];
}

function candidatesOf(project: Project, dutyId: string): string[] {
  return project.candidates.filter((c) => c.dutyId === dutyId).map((c) => c.id);
}
