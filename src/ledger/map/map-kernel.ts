/**
 * The level map's kernel: the level of one phase's fleet at many points, by the one
 * prediction engine's path functions, without the matrix's tables and result objects.
 *
 * Each machine of the phase (the fleet's chosen candidate of each duty placed on the site
 * grid) is prepared once — its base level (rated LWA + the duty's working-day terms + the
 * character penalty, as the matrix's contribution kernel takes it, ../prediction/levels.ts)
 * and, with octave bands under the ISO 9613-2:1996 general ground method, its A-weighted
 * band energies 10^(base/10)·s_b. At each point, each machine's path is the engine's:
 * `pathSpecOf` (geometry, work-area point, barrier on the plan) and then
 *   - octave bands: `pathBandNumbers` (../../core/path-prediction.ts) — the band attenuations
 *     A_b and the receiver terms, no A-weighted single figure — and the energy
 *     Σ_b E_b·10^(−A_b/10)·10^(recv/10), the matrix's 10^(L/10) for that machine;
 *   - otherwise `pathNumbers`: L = base + path + receiver terms, as the matrix.
 * The point's level is 10·lg of the energies' sum, plus the own period's shift (0), so it
 * equals the matrix level of a receiver there (the property tests check it to 0.01 dB).
 * A path the engine refuses makes the point NaN, as a NaN contribution makes the matrix cell.
 *
 * Cost O(points × machines × (8 + barrier segments near the path)), no object per point
 * but the engine's path spec; a barrier whose box misses the path's box is passed over.
 */
import type { Barrier, Candidate, Duty, Fleet, Project, Receiver } from '../model/model.ts';
import { pathBandNumbers, pathNumbers } from '../../core/path-prediction.ts';
import { pathSpecOf } from '../prediction/path-pair.ts';
import { dutyTermsOf } from '../prediction/duty-terms.ts';
import { memoOf, ratedLevelOf, spectrumSharesInto } from '../prediction/candidate-memo.ts';
import { characterPenaltyDb } from '../rating/rating.ts';
import { phasePeriods } from '../prediction/phase-periods.ts';
import { sourcePoint } from '../prediction/work-area.ts';

/** Number of octave bands, 63 Hz … 8 kHz. */
const B = 8;

/** 10^(x/10) = e^(x · ln 10 / 10). */
const DB_TO_NEPER = Math.LN10 / 10;

/** One machine of the map, prepared once. */
interface MapSource {
  duty: Duty;
  /** The source point when it is the same for every point (a point, or a line's or area's centroid). */
  fixedAt?: { x: number; y: number };
  /** base level, dB (NaN: not computable, every point NaN). */
  baseDb: number;
  /** A-weighted band energies 10^(base/10)·s_b, when the machine has bands under the general method. */
  energies?: Float64Array;
}

/** What a map of one phase and fleet computes with, prepared once per map. */
export interface MapKernel {
  sources: MapSource[];
  /** The own period's shift, dB (0; NaN when the phase misses its own period). */
  shiftDb: number;
  project: Project;
  barriers: readonly Barrier[] | undefined;
  /** Each barrier's box in plan (min x, max x, min y, max y); NaN when a point is unreadable (never passed over). */
  boxes: Float64Array;
}

/** The box of each barrier: 4 numbers each, NaN when it cannot be passed over by its box. O(points). */
function barrierBoxes(barriers: readonly Barrier[] | undefined): Float64Array {
  const list = barriers ?? [];
  const boxes = new Float64Array(list.length * 4).fill(NaN);
  list.forEach((b, i) => {
    if (!b || !Array.isArray(b.points) || b.points.length === 0) return;
    let minX = Infinity,
      maxX = -Infinity,
      minY = Infinity,
      maxY = -Infinity;
    for (const p of b.points) {
      if (!p || !Number.isFinite(p.x) || !Number.isFinite(p.y)) return;
      minX = Math.min(minX, p.x);
      maxX = Math.max(maxX, p.x);
      minY = Math.min(minY, p.y);
      maxY = Math.max(maxY, p.y);
    }
    boxes.set([minX, maxX, minY, maxY], i * 4);
  });
  return boxes;
}

/** A fixed source point of a location, if it has one. */
function fixedPoint(d: Duty): { x: number; y: number } | undefined {
  const loc = d.location;
  if (loc.kind === 'point')
    return Number.isFinite(loc.x) && Number.isFinite(loc.y) ? { x: loc.x, y: loc.y } : undefined;
  if (loc.kind === 'line' || loc.kind === 'polygon') {
    if (loc.distanceBy !== 'centroid') return undefined;
    const at = sourcePoint(loc, { x: 0, y: 0 });
    return at && Number.isFinite(at.x) && Number.isFinite(at.y) ? at : undefined;
  }
  return undefined;
}

/** The machines of a phase for a fleet, with their base levels and band energies. O(duties + candidates). */
export function prepareMapKernel(project: Project, phaseId: string, fleet: Fleet): MapKernel {
  const phase = project.phases.find((p) => p.id === phaseId);
  const own = phase ? phasePeriods(project, phase).periods.find((p) => p.own) : undefined;
  const general = project.propagation.method === 'iso9613-2:1996' && project.propagation.groundMethod === 'general';
  const duties = project.duties.filter((d) => d.phaseId === phaseId && d.location.kind !== 'distances');
  // As the matrix finds them: the last candidate and the last duty with an id.
  const candidateById = new Map(project.candidates.map((c) => [c.id, c] as const));
  const dutyById = new Map(duties.map((d) => [d.id, d] as const));
  const sources: MapSource[] = [];
  for (const d of duties) {
    const c: Candidate | undefined = candidateById.get(fleet[d.id] ?? d.baselineCandidateId);
    const duty = c ? dutyById.get(c.dutyId) : undefined;
    if (!c || !duty) {
      sources.push({ duty: d, baseDb: NaN });
      continue;
    }
    const memo = memoOf(c);
    const lwa = ratedLevelOf(memo, c, project.settings).lwaDb;
    const baseDb = lwa + characterPenaltyDb(c, project.settings) + dutyTermsOf(project, duty).db;
    const shares = general ? new Float64Array(8) : undefined;
    const withBands = shares !== undefined && spectrumSharesInto(c, shares, 0);
    const source: MapSource = { duty, baseDb };
    const at = fixedPoint(duty);
    if (at) source.fixedAt = at;
    if (withBands) {
      const e = 10 ** (baseDb / 10);
      source.energies = Float64Array.from(shares, (s) => e * s);
    }
    sources.push(source);
  }
  const barriers = project.barriers;
  return { sources, shiftDb: own ? own.shiftDb : NaN, project, barriers, boxes: barrierBoxes(barriers) };
}

/**
 * The map's level at each point (x[i], y[i]) at height `heightM`, written into `out`.
 * O(points × machines × 8).
 */
export function kernelLevels(
  k: MapKernel,
  xs: Float64Array,
  ys: Float64Array,
  heightM: number,
  out: Float64Array,
  from = 0,
): void {
  const prop = k.project.propagation;
  const bands = new Float64Array(B);
  const receiver: Receiver = {
    id: '@map',
    name: 'Map point',
    kind: 'other',
    x: 0,
    y: 0,
    heightM,
    facade: false,
    limitsDb: {},
    screening: {},
  };
  const near: Barrier[] = [];
  const n = xs.length;
  for (let i = 0; i < n; i++) {
    receiver.x = xs[i] as number;
    receiver.y = ys[i] as number;
    let energy = 0;
    for (const s of k.sources) {
      if (Number.isNaN(s.baseDb)) {
        energy = NaN;
        break;
      }
      try {
        const spec = pathSpecOf(prop, s.duty, receiver, nearBarriers(k, s, receiver, near)).spec;
        const e = s.energies;
        if (e) {
          const recv = pathBandNumbers(spec, bands);
          // Σ_b E_b·10^(−A_b/10)·10^(recv/10), with 10^(x/10) written as e^(x·ln10/10).
          let sum = 0;
          for (let b = 0; b < B; b++) sum += (e[b] as number) * Math.exp(-(bands[b] as number) * DB_TO_NEPER);
          energy += sum * Math.exp(recv * DB_TO_NEPER);
        } else {
          const p = pathNumbers(spec);
          energy += 10 ** ((s.baseDb + p.pathDb + p.receiverDb) / 10);
        }
      } catch {
        energy = NaN;
        break;
      }
    }
    out[from + i] = energy === 0 ? -Infinity : 10 * Math.log10(energy) + k.shiftDb;
  }
}

/**
 * The barriers that may screen the path from a source to the point: those whose box meets
 * the path's box (the others the screening passes over anyway, ../prediction/barrier-screening.ts),
 * gathered in `into`; all of them when the source point depends on the point. O(barriers).
 */
function nearBarriers(
  k: MapKernel,
  s: MapSource,
  at: { x: number; y: number },
  into: Barrier[],
): readonly Barrier[] | undefined {
  const all = k.barriers;
  if (!all || all.length === 0) return undefined;
  const src = s.fixedAt;
  if (!src) return all;
  const minX = Math.min(src.x, at.x);
  const maxX = Math.max(src.x, at.x);
  const minY = Math.min(src.y, at.y);
  const maxY = Math.max(src.y, at.y);
  const box = k.boxes;
  into.length = 0;
  for (let i = 0, j = 0; i < all.length; i++, j += 4) {
    // Passed over only when wholly west, east, south or north of the path's box (NaN: never).
    if (box[j + 1]! < minX || box[j]! > maxX || box[j + 3]! < minY || box[j + 2]! > maxY) continue;
    into.push(all[i] as Barrier);
  }
  return into.length > 0 ? into : undefined;
}
