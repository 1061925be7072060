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
 * (× 8 multiply-adds for candidates with octave bands) and sit in a Float64Array, so
 * `contributionDb` is an O(1) look-up (./levels.ts). After an edit of a few candidates
 * only their rows are recomputed, and what each candidate alone gives (rated LWA,
 * spectrum shares, cost) is reused for the unchanged ones (./candidate-memo.ts): a
 * re-evaluation is then O(candidates + phases × receivers × duties), results unchanged.
 * Terms for display are assembled on demand by `contribution`.
 * Never throws on bad data: what cannot be computed is NaN, with a DataProblem.
 */
import type { Candidate, Fleet, Project } from './model.ts';
import { REFERENCE_RECEIVER_ID } from './model.ts';
import type { Contribution, DataProblem, DutyCost, Evaluation, MatrixCell, Term } from './results.ts';
import { characterPenaltyDb, type PermissibleLookup, type RatedSoundPower } from './rating.ts';
import { pathTableFor, BAND_COUNT } from './path-table.ts';
import { dutyTerms } from './duty-terms.ts';
import { dutyCostOf, ratedLevelOf, spectrumShares } from './candidate-memo.ts';
import { levelsFor } from './levels.ts';
import { validateProject } from './validate.ts';
import { dbSumOrNaN } from './safe.ts';

export { computeLevels } from './levels.ts';

export interface EvaluateOptions {
  /** Permissible level standing in for a missing LWA; defaults to the Directive 2000/14/EC Stage II level (./permissible.ts). */
  permissible?: PermissibleLookup;
  /** Skip validation (the caller has validated already); problems then hold evaluation findings only. */
  skipValidation?: boolean;
}

/** What the last evaluation on a path table built from the candidate list, to share when the list gives the same again. */
interface ListState {
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
  const last = lastLists.get(table);
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
  const dutyDb = project.duties.map((d) => dutyTerms(project, d));
  const dutyOf = new Int32Array(nc);
  const baseDb = new Float64Array(nc);
  const spectrum = new Float64Array(nc * BAND_COUNT);
  const withBands = new Uint8Array(nc);
  const bandsUsable = table.bandTransmission !== undefined;
  const rated: RatedSoundPower[] = new Array(nc);
  const costList: DutyCost[] = new Array(nc);
  let sameCosts = sameIds;
  for (let i = 0; i < nc; i++) {
    const c = cands[i] as Candidate;
    const memo = memoOf(c);
    const r = (rated[i] = ratedLevelOf(memo, c, settings, permissible));
    const u = dutyIndex.get(c.dutyId) ?? -1;
    dutyOf[i] = u;
    const lwa = r.lwaDb;
    if (Number.isNaN(lwa)) {
      problems.push({
        path: `$.candidates[${i}].lwaDb`,
        message: `Candidate ${JSON.stringify(c.label)}, LWA: ${r.explanation} (give the declared LWA in dB, e.g. 104.5, octave bands, or a directive category with its power)`,
      });
    }
    baseDb[i] = u < 0 ? NaN : lwa + characterPenaltyDb(c, settings) + (dutyDb[u]?.db ?? NaN);
    const shares = bandsUsable ? spectrumShares(memo, c) : undefined;
    if (shares) {
      withBands[i] = 1;
      spectrum.set(shares, i * BAND_COUNT);
    }
    // The duty a cost is for: the last duty with the id (dutyIndex keeps the last).
    const duty = u < 0 ? undefined : project.duties[u];
    const cost = (costList[i] = duty ? dutyCostOf(memo, c, duty, project.currency) : missingDutyCost(c));
    if (sameCosts && last!.costList[i] !== cost) sameCosts = false;
  }
  dutyDb.forEach((d, u) => {
    if (d.problem) problems.push({ path: `$.duties[${u}]`, message: `Duty ${JSON.stringify(project.duties[u]?.name)}: ${d.problem}` });
  });
  const entries = table.entries;
  for (let i = 0; i < entries.length; i++) {
    const e = entries[i];
    if (!e?.problem) continue;
    const u = Math.floor(i / nr);
    const r = i % nr;
    const receiver = project.receivers[r];
    problems.push({
      path: receiver ? `$.receivers[${r}]` : '$.settings.referenceDistanceM',
      message: receiver
        ? `Path from duty ${JSON.stringify(project.duties[u]?.name)} to receiver ${JSON.stringify(receiver.name)}: ${e.problem}`
        : e.problem,
    });
  }
  const levels = levelsFor(table, { dutyOf, baseDb, spectrum, withBands });
  return { table, receiverIndex, candidateIndex, dutyOf, baseDb, spectrum, withBands, levels, dutyDb, rated };
}

