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
import { assemble } from './evaluation-assembly.ts';
import { basisNotes } from '../rating/basis-notes.ts';
import type { Candidate, Fleet, Project } from '../model/model.ts';
import type { DataProblem, DutyCost, Evaluation } from '../model/results.ts';
import {
  characterPenaltyDb,
  declaredRatedLwaDb,
  type PermissibleLookup,
  type RatedSoundPower,
} from '../rating/rating.ts';
import { pathProblemAt, pathTableFor, pairsWithProblems, takeDonor, type PathTable } from './path-table.ts';
import { dutyTermsOf, type DutyTerms } from './duty-terms.ts';
import {
  dutyCostOf,
  knownMemo,
  memoOf,
  newMemo,
  ratedLevelOf,
  spectrumSharesInto,
  type CandidateMemo,
} from './candidate-memo.ts';
import { levelGrid } from './levels.ts';
import { validateProject } from '../validate/validate.ts';
import { unassessedHourNotes } from './phase-periods.ts';

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
  /** Each candidate's memo (./candidate-memo.ts), by position: kept here rather than under each object, one look-up fewer per candidate. */
  memos: CandidateMemo[];
  ids: unknown[];
  candidateIndex: Map<string, number>;
  costList: DutyCost[];
  /** The costs by id, written when first read. */
  costs: () => Record<string, DutyCost>;
  /** Every id is a string other than "__proto__": then the costs by id are those of candidateIndex (see KernelState). */
  plainIds: boolean;
}
const lastLists = new WeakMap<PathTable, ListState>();

/**
 * The numbers behind an evaluation: path table, kernel inputs, levels and costs.
 * O(candidates) with the per-candidate memos (./candidate-memo.ts) and the row sharing
 * of ./levels.ts; O(candidates × receivers × 8) when every row is new.
 */
function kernel(project: Project, permissible: PermissibleLookup | undefined, problems: DataProblem[]): KernelState {
  const table = pathTableFor(project);
  const cands = project.candidates;
  const nc = cands.length;
  const settings = project.settings;
  const donor = takeDonor(table);
  const last = lastLists.get(table) ?? (donor ? lastLists.get(donor.donor) : undefined);
  const dutyIndex = new Map(project.duties.map((d, i) => [d.id, i] as const));
  const receiverIndex = new Map(table.receiverIds.map((id, i) => [id, i] as const));
  const ids: unknown[] = new Array(nc);
  let sameIds = last !== undefined && last.ids.length === nc;
  let plainIds = true;
  for (let i = 0; i < nc; i++) {
    const id = (cands[i] as Candidate).id;
    ids[i] = id;
    if (typeof id !== 'string' || id === '__proto__') plainIds = false;
    if (sameIds && last!.ids[i] !== id) sameIds = false;
  }
  let candidateIndex: Map<string, number>;
  if (sameIds) candidateIndex = last!.candidateIndex;
  else {
    // As new Map(cands.map((c, i) => [c.id, i])), the last position of an id kept, without a pair per candidate.
    candidateIndex = new Map();
    for (let i = 0; i < nc; i++) candidateIndex.set((cands[i] as Candidate).id, i);
  }
  const dutyDb = project.duties.map((d) => dutyTermsOf(project, d));
  const dutyOf = new Int32Array(nc);
  const baseDb = new Float64Array(nc);
  const spectrum = new Float64Array(nc * 8);
  const withBands = new Uint8Array(nc);
  const bandsUsable = table.bandTransmission !== undefined;
  // Rated LWA with its words: written here only where the number needs the full rating, else on first read (ratedOf).
  const rated: (RatedSoundPower | undefined)[] = new Array(nc);
  const costList: DutyCost[] = new Array(nc);
  let sameCosts = sameIds;
  const context: CandidateContext = {
    settings,
    permissible,
    dutyIndex,
    dutyDb,
    bandsUsable,
    duties: project.duties,
    currency: project.currency,
  };
  const lwaProblems = new Map<number, DataProblem>();
  const into: CandidateArrays = { dutyOf, baseDb, spectrum, withBands, rated, costList, lwaProblems };
  const memos: CandidateMemo[] = new Array(nc);
  const memoAt = lastMemos(last);
  for (let i = 0; i < nc; i++) {
    const c = cands[i] as Candidate;
    const memo = (memos[i] = memoAt(c, i));
    const cost = candidateInputs(context, into, i, c, memo);
    if (sameCosts && last!.costList[i] !== cost) sameCosts = false;
  }
  for (const p of lwaProblems.values()) problems.push(p);
  const otherFindings = dutyAndPathFindings(project, table, dutyDb);
  for (const p of otherFindings) problems.push(p);
  const levels = levelGrid(table, { dutyOf, baseDb, spectrum, withBands }, donor?.sameColumns ? donor : undefined);
  // The costs by id, an object with a key per candidate, written when first read: most of its cost is making each id
  // a property name, which a ranking or a text report does not need (they read costList by position).
  const costs = sameCosts ? last!.costs : costsById(ids, costList);
  const list = cands.slice();
  lastLists.set(table, { candidates: list, memos, ids, candidateIndex, costList, costs, plainIds });
  return {
    context,
    table,
    receiverIndex,
    candidateIndex,
    dutyOf,
    baseDb,
    spectrum,
    withBands,
    levels,
    dutyDb,
    rated,
    ratedOf: ratedReader(list, rated, settings, permissible),
    costList,
    get costs() {
      return costs();
    },
    plainIds,
    lwaProblems,
    otherFindings,
  };
}

/**
 * The memo for candidate c at position i, from the last evaluation on the table (`last`): the memo at the same
 * position when the object is the same; else the memo of the same object elsewhere in the last list or kept under the
 * object (an edit's); else a copy of the memo of the candidate it replaces at that position (each part is checked
 * against the candidate before use, ./candidate-memo.ts), or a new one. O(1) per candidate; O(candidates) once when
 * the list has shifted.
 */
function lastMemos(last: ListState | undefined): (c: Candidate, i: number) => CandidateMemo {
  let byObject: Map<Candidate, CandidateMemo> | undefined;
  return (c, i) => {
    if (!last) return newMemo();
    const before = last.candidates[i];
    if (before === c) return last.memos[i] as CandidateMemo;
    if (byObject === undefined) {
      byObject = new Map();
      for (let j = 0; j < last.candidates.length; j++)
        byObject.set(last.candidates[j] as Candidate, last.memos[j] as CandidateMemo);
    }
    const found = byObject.get(c) ?? knownMemo(c);
    if (found) return found;
    return newMemo(before === undefined ? undefined : last.memos[i]);
  };
}

/** The costs by candidate id (an id used twice: its last candidate's), made on the first call and kept. O(candidates) once. */
function costsById(ids: readonly unknown[], costList: readonly DutyCost[]): () => Record<string, DutyCost> {
  let costs: Record<string, DutyCost> | undefined;
  return () => {
    if (costs === undefined) {
      costs = {};
      for (let i = 0; i < ids.length; i++) costs[ids[i] as string] = costList[i] as DutyCost;
    }
    return costs;
  };
}

/** What {@link kernel} derives, kept with an evaluation so an edit can be applied to it (./evaluate-edit.ts). */
export interface KernelState extends CandidateArrays {
  context: CandidateContext;
  table: PathTable;
  receiverIndex: Map<string, number>;
  candidateIndex: Map<string, number>;
  /** levels[candidate × receivers + receiver], dB. */
  levels: Float64Array;
  dutyDb: DutyTerms[];
  ratedOf: (i: number) => RatedSoundPower | undefined;
  /** The costs by id (written when first read; a copy of KernelState made with a spread holds them as a plain field). */
  costs: Record<string, DutyCost>;
  /**
   * Every candidate id is a string other than "__proto__", so the cost by id is costList at candidateIndex's position
   * (both keep an id's last candidate) and can be read without making the object of costs by id.
   */
  plainIds: boolean;
  /** Duty and path findings (./evaluate.ts dutyAndPathFindings). */
  otherFindings: DataProblem[];
}

/** The rated LWA with its words of candidate i of `list`, written on first read where the kernel did not need it. */
export function ratedReader(
  list: readonly Candidate[],
  rated: (RatedSoundPower | undefined)[],
  settings: Project['settings'],
  permissible: PermissibleLookup | undefined,
): (i: number) => RatedSoundPower | undefined {
  return (i) => {
    const c = list[i];
    if (c === undefined) return undefined;
    return (rated[i] ??= ratedLevelOf(memoOf(c), c, settings, permissible));
  };
}

/** What {@link candidateInputs} reads besides the candidate: the same for every candidate of an evaluation. */
export interface CandidateContext {
  settings: Project['settings'];
  permissible: PermissibleLookup | undefined;
  dutyIndex: Map<string, number>;
  dutyDb: DutyTerms[];
  bandsUsable: boolean;
  duties: Project['duties'];
  currency: string;
}

/** The per-candidate arrays {@link candidateInputs} writes, by candidate index. */
export interface CandidateArrays {
  dutyOf: Int32Array;
  baseDb: Float64Array;
  /** Spectrum shares, 8 per candidate. */
  spectrum: Float64Array;
  withBands: Uint8Array;
  /** The rated LWA with its words, where the number needed it (else written on first read). */
  rated: (RatedSoundPower | undefined)[];
  costList: DutyCost[];
  lwaProblems: Map<number, DataProblem>;
}

/**
 * Writes what candidate i alone gives into the arrays — duty row, base level (and the
 * problem when its LWA is not computable), spectrum shares, cost — reusing the memo of the
 * candidate it replaces (`memo`, see ./candidate-memo.ts). The one place these are computed, for a whole
 * evaluation and for an edit alike (every slot of i is written). Returns the cost. O(1).
 */
export function candidateInputs(
  k: CandidateContext,
  into: CandidateArrays,
  i: number,
  c: Candidate,
  memo: CandidateMemo,
): DutyCost {
  const u = k.dutyIndex.get(c.dutyId) ?? -1;
  into.dutyOf[i] = u;
  into.rated[i] = undefined;
  into.lwaProblems.delete(i);
  let lwa = declaredRatedLwaDb(c, k.settings.levelBasis);
  if (lwa === undefined) {
    const r = (into.rated[i] = ratedLevelOf(memo, c, k.settings, k.permissible));
    lwa = r.lwaDb;
    if (Number.isNaN(lwa)) {
      into.lwaProblems.set(i, {
        path: `$.candidates[${i}].lwaDb`,
        message: `Candidate ${JSON.stringify(c.label)}, LWA: ${r.explanation} (give the declared LWA in dB, e.g. 104.5, octave bands, or a directive category with its power)`,
      });
    }
  }
  into.baseDb[i] = u < 0 ? NaN : lwa + characterPenaltyDb(c, k.settings) + (k.dutyDb[u]?.db ?? NaN);
  if (k.bandsUsable && spectrumSharesInto(c, into.spectrum, i * 8)) {
    into.withBands[i] = 1;
  } else {
    into.withBands[i] = 0;
    into.spectrum.fill(0, i * 8, i * 8 + 8);
  }
  // The duty a cost is for: the last duty with the id (dutyIndex keeps the last).
  const duty = u < 0 ? undefined : k.duties[u];
  return (into.costList[i] = duty ? dutyCostOf(memo, c, duty, k.currency) : missingDutyCost(c));
}

/** The findings about duties (terms not computable) and paths (a pair not computable), in project order. O(duties + problems). */
export function dutyAndPathFindings(project: Project, table: PathTable, dutyDb: readonly DutyTerms[]): DataProblem[] {
  const nr = table.receiverIds.length;
  const problems: DataProblem[] = [];
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
  return problems;
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
export function mergeFindings(problems: DataProblem[], found: readonly DataProblem[]): void {
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
  const notes = {
    hours: unassessedHourNotes(project),
    basis: basisNotes(project),
    accuracy: pathAccuracyNotes(project),
  };
  return assemble(project, fleet, k, problems, notes, options);
}
