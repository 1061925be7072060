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
 * Cost: the path table is built once, O(duties × receivers × 8) path evaluations; the
 * contributions then take O(candidates × receivers) (× 8 multiply-adds for candidates with
 * octave bands) and sit in a Float64Array, so `contributionDb` is an O(1) look-up.
 * Terms for display are assembled on demand by `contribution`.
 * Never throws on bad data: what cannot be computed is NaN, with a DataProblem.
 */
import type { Candidate, Fleet, Project } from './model.ts';
import { REFERENCE_RECEIVER_ID } from './model.ts';
import type { Contribution, DataProblem, DutyCost, Evaluation, MatrixCell, Term } from './results.ts';
import { characterPenaltyDb, type PermissibleLookup } from './rating.ts';
import { hasBands, ratedLevel } from './rated-level.ts';
import { pathTableFor, BAND_COUNT, type PathTable } from './path-table.ts';
import { dutyTerms } from './duty-terms.ts';
import { dutyCost } from './cost.ts';
import { validateProject } from './validate.ts';
import { A_WEIGHTING_OCTAVE_DB } from '../core/standards/iec61672-1-2013.ts';
import { dbFromRatio, ratioFromDb } from '../core/decibel.ts';
import { dbSumOrNaN } from './safe.ts';

export interface EvaluateOptions {
  /** Permissible level standing in for a missing LWA; defaults to the Directive 2000/14/EC Stage II level (./permissible.ts). */
  permissible?: PermissibleLookup;
  /** Skip validation (the caller has validated already); problems then hold evaluation findings only. */
  skipValidation?: boolean;
}

function kernel(project: Project, permissible: PermissibleLookup | undefined, problems: DataProblem[]) {
  const table = pathTableFor(project);
  const nr = table.receiverIds.length;
  const cands = project.candidates;
  const nc = cands.length;
  const dutyIndex = new Map(project.duties.map((d, i) => [d.id, i] as const));
  const receiverIndex = new Map(table.receiverIds.map((id, i) => [id, i] as const));
  const candidateIndex = new Map(cands.map((c, i) => [c.id, i] as const));
  const dutyDb = project.duties.map((d) => dutyTerms(project, d));
  const dutyOf = new Int32Array(nc);
  const baseDb = new Float64Array(nc);
  const spectrum = new Float64Array(nc * BAND_COUNT);
  const withBands = new Uint8Array(nc);
  const rated = cands.map((c) => ratedLevel(c, project.settings, permissible));
  cands.forEach((c, i) => {
    const u = dutyIndex.get(c.dutyId) ?? -1;
    dutyOf[i] = u;
    const lwa = rated[i]?.lwaDb ?? NaN;
    if (Number.isNaN(lwa)) {
      problems.push({
        path: `$.candidates[${i}].lwaDb`,
        message: `Candidate ${JSON.stringify(c.label)}, LWA: ${rated[i]?.explanation ?? 'missing'} (give the declared LWA in dB, e.g. 104.5, octave bands, or a directive category with its power)`,
      });
    }
    baseDb[i] = u < 0 ? NaN : lwa + characterPenaltyDb(c, project.settings) + (dutyDb[u]?.db ?? NaN);
    if (hasBands(c) && table.bandTransmission) {
      withBands[i] = 1;
      let total = 0;
      for (let b = 0; b < BAND_COUNT; b++) total += spectrum[i * BAND_COUNT + b] = ratioFromDb((c.bandsDb[b] as number) + (A_WEIGHTING_OCTAVE_DB[b] as number));
      for (let b = 0; b < BAND_COUNT; b++) spectrum[i * BAND_COUNT + b] = (spectrum[i * BAND_COUNT + b] as number) / total;
    }
  });
  dutyDb.forEach((d, u) => {
    if (d.problem) problems.push({ path: `$.duties[${u}]`, message: `Duty ${JSON.stringify(project.duties[u]?.name)}: ${d.problem}` });
  });
  table.entries.forEach((e, i) => {
    if (!e.problem) return;
    const u = Math.floor(i / nr);
    const r = i % nr;
    const receiver = project.receivers[r];
    problems.push({
      path: receiver ? `$.receivers[${r}]` : '$.settings.referenceDistanceM',
      message: receiver
        ? `Path from duty ${JSON.stringify(project.duties[u]?.name)} to receiver ${JSON.stringify(receiver.name)}: ${e.problem}`
        : e.problem,
    });
  });
  const levels = computeLevels(table, dutyOf, baseDb, spectrum, withBands);
  return { table, receiverIndex, candidateIndex, dutyOf, baseDb, spectrum, withBands, levels, dutyDb, rated };
}

/**
 * The contribution kernel: L[c, r] = base[c] + path[u(c), r], or with octave bands
 * base[c] + 10·lg Σ_b s[c, b]·τ[u, r, b] + receiver terms[u, r], s the A-weighted spectrum
 * shares (Σ s = 1) and τ the band transmissions. O(candidates × receivers × 8).
 */
export function computeLevels(table: PathTable, dutyOf: Int32Array, baseDb: Float64Array, spectrum: Float64Array, withBands: Uint8Array): Float64Array {
  const nr = table.receiverIds.length;
  const nc = dutyOf.length;
  const levels = new Float64Array(nc * nr);
  const toDb = dbFromRatio; // a local binding: the hot loop calls it 250,000 times
  const B = BAND_COUNT;
  const broad = table.broadbandDb;
  const recv = table.receiverDb;
  const tau = table.bandTransmission;
  const hasBands = table.hasBands;
  for (let c = 0; c < nc; c++) {
    const u = dutyOf[c] as number;
    const base = baseDb[c] as number;
    const out = c * nr;
    if (u < 0) {
      levels.fill(NaN, out, out + nr);
      continue;
    }
    const row = u * nr;
    if (withBands[c] && tau) {
      const s = c * B;
      const s0 = spectrum[s] as number, s1 = spectrum[s + 1] as number, s2 = spectrum[s + 2] as number, s3 = spectrum[s + 3] as number;
      const s4 = spectrum[s + 4] as number, s5 = spectrum[s + 5] as number, s6 = spectrum[s + 6] as number, s7 = spectrum[s + 7] as number;
      for (let r = 0; r < nr; r++) {
        const i = row + r;
        if (hasBands[i]) {
          const t = i * B;
          const energy = s0 * (tau[t] as number) + s1 * (tau[t + 1] as number) + s2 * (tau[t + 2] as number) + s3 * (tau[t + 3] as number)
            + s4 * (tau[t + 4] as number) + s5 * (tau[t + 5] as number) + s6 * (tau[t + 6] as number) + s7 * (tau[t + 7] as number);
          levels[out + r] = base + toDb(energy) + (recv[i] as number);
        } else {
          levels[out + r] = base + (broad[i] as number);
        }
      }
    } else {
      for (let r = 0; r < nr; r++) levels[out + r] = base + (broad[row + r] as number);
    }
  }
  return levels;
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
  for (const p of found) if (!problems.some((q) => q.path === p.path || q.path.startsWith(`${p.path}.`) || q.path.startsWith(`${p.path}[`))) problems.push(p);
  const nr = k.table.receiverIds.length;

  const chosen: Fleet = {};
  project.duties.forEach((d) => {
    const pick = fleet?.[d.id];
    if (pick !== undefined) {
      const ci = k.candidateIndex.get(pick);
      if (ci === undefined || project.candidates[ci]?.dutyId !== d.id) {
        problems.push({ path: `fleet[${JSON.stringify(d.id)}]`, message: `Fleet, duty ${JSON.stringify(d.name)}: ${JSON.stringify(pick)} is not a candidate of this duty (use one of ${candidatesOf(project, d.id).join(', ')})` });
      }
      chosen[d.id] = pick;
    } else {
      chosen[d.id] = d.baselineCandidateId;
    }
  });

  const costs: Record<string, DutyCost> = {};
  const dutyById = new Map(project.duties.map((d) => [d.id, d] as const));
  for (const c of project.candidates) {
    const duty = dutyById.get(c.dutyId);
    costs[c.id] = duty ? dutyCost(c, duty, project.currency) : { candidateId: c.id, total: NaN, explanation: `not computed: duty ${JSON.stringify(c.dutyId)} does not exist` };
  }

  const contributionDb = (candidateId: string, receiverId: string): number => {
    const c = k.candidateIndex.get(candidateId);
    const r = k.receiverIndex.get(receiverId);
    if (c === undefined || r === undefined) return NaN;
    return k.levels[c * nr + r] as number;
  };

  const contribution = (candidateId: string, receiverId: string): Contribution => {
    const c = k.candidateIndex.get(candidateId);
    const r = k.receiverIndex.get(receiverId);
    if (c === undefined || r === undefined) return { candidateId, receiverId, levelDb: NaN, terms: [] };
    const cand = project.candidates[c] as Candidate;
    const u = k.dutyOf[c] as number;
    const terms: Term[] = [{ key: 'lw', label: `Sound power LWA: ${k.rated[c]?.explanation ?? ''}`, db: k.rated[c]?.lwaDb ?? NaN }];
    const entry = u >= 0 ? k.table.entries[u * nr + r] : undefined;
    if (entry) {
      if (k.withBands[c] && k.table.hasBands[u * nr + r]) {
        terms.push({ key: 'octavePath', label: 'Octave-band path, ISO 9613-2:1996 general method, A-weighted over this machine’s spectrum', db: (k.levels[c * nr + r] as number) - (k.baseDb[c] as number) - (k.table.receiverDb[u * nr + r] as number) });
      } else {
        terms.push(...entry.pathTerms);
      }
    }
    if (u >= 0) terms.push(...(k.dutyDb[u]?.terms ?? []));
    if (entry) terms.push(...entry.receiverTerms);
    const penalty = characterPenaltyDb(cand, project.settings);
    if (penalty !== 0) terms.push({ key: 'penalty', label: `Character penalty (${cand.character})`, db: penalty });
    return { candidateId, receiverId, levelDb: k.levels[c * nr + r] as number, terms };
  };

  const matrix: MatrixCell[] = [];
  const worstReceiverByPhase: Record<string, string> = {};
  const realReceivers = project.receivers.length > 0 ? project.receivers.map((r) => r.id) : [REFERENCE_RECEIVER_ID];
  const limitOf = (receiverId: string, periodId: string) => project.receivers.find((r) => r.id === receiverId)?.limitsDb?.[periodId];
  for (const phase of project.phases) {
    const chosenHere = project.duties.filter((d) => d.phaseId === phase.id).map((d) => chosen[d.id] as string);
    let worst: { id: string; key: number } | undefined;
    for (const receiverId of realReceivers) {
      const levelDb = dbSumOrNaN(chosenHere.map((cid) => contributionDb(cid, receiverId)));
      const limitDb = limitOf(receiverId, phase.periodId);
      const hasLimit = typeof limitDb === 'number' && Number.isFinite(limitDb);
      const cell: MatrixCell = { phaseId: phase.id, receiverId, periodId: phase.periodId, levelDb, over: hasLimit && levelDb > (limitDb as number) };
      if (hasLimit) {
        cell.limitDb = limitDb;
        cell.marginDb = (limitDb as number) - levelDb;
      }
      matrix.push(cell);
      // Least margin first; receivers without a limit only by level, after those with one.
      const key = hasLimit ? -(cell.marginDb as number) : levelDb - 1e6;
      if (!Number.isNaN(key) && (worst === undefined || key > worst.key)) worst = { id: receiverId, key };
    }
    if (worst) worstReceiverByPhase[phase.id] = worst.id;
  }

  let fleetCost = 0;
  for (const d of project.duties) fleetCost += costs[chosen[d.id] as string]?.total ?? NaN;

  return { fleet: chosen, costs, contributionDb, contribution, matrix, worstReceiverByPhase, fleetCost, problems };
}

function candidatesOf(project: Project, dutyId: string): string[] {
  return project.candidates.filter((c) => c.dutyId === dutyId).map((c) => c.id);
}
