/**
 * The level map: the free-field level of one phase's fleet on a grid of points over the
 * site, computed by the same engine as the matrix.
 *
 * Each grid point is a receiver of its own (no façade, no typed screening, at the chosen
 * height). {@link levelGrid} computes the points by the map's kernel (./map-kernel.ts: the
 * engine's path functions, no matrix objects per point); {@link levelsAtPoints} cuts the
 * project down to the phase's duties with the fleet's chosen machine for each
 * (./map-project.ts) and evaluates it with `evaluateProject` — the matrix itself, used for
 * a few points and to check the kernel. Either way a point's level is the matrix level a
 * receiver placed there would get: L_Aeq,T in the phase's own period, or the rating level
 * L_Ar,T where a character penalty applies. Plan barriers screen grid points as they
 * screen receivers.
 *
 * Cost: O(points × duties × 8) path evaluations, in blocks of {@link MAP_BLOCK_POINTS} so a
 * caller can report progress or stop between blocks.
 */
import type { Fleet, Project, SitePoint } from '../model/model.ts';
import { evaluateProject } from '../prediction/evaluate.ts';
import { mapProject, MAP_RECEIVER_PREFIX } from './map-project.ts';
import { kernelLevels, prepareMapKernel } from './map-kernel.ts';

/** Points computed between two progress reports. */
export const MAP_BLOCK_POINTS = 2048;

/** What a map is asked for. */
export interface MapRequest {
  phaseId: string;
  /** The fleet assessed: a candidate id per duty id (duties left out use their baselines). */
  fleet: Fleet;
  /** Height of the grid points above ground, m. */
  heightM: number;
  /** Grid spacing, m. */
  spacingM: number;
  /** South-west corner of the grid, m. */
  x0: number;
  y0: number;
  /** Points east and north. */
  nx: number;
  ny: number;
}

/** Levels on a grid: levelsDb[j · nx + i] at (x0 + i·spacing, y0 + j·spacing); NaN where not computable. */
export interface LevelGrid {
  x0: number;
  y0: number;
  spacingM: number;
  nx: number;
  ny: number;
  heightM: number;
  phaseId: string;
  /** The period the levels are given in (the phase's own). */
  periodId: string;
  /** L_Ar,T when a machine of the fleet draws a character penalty, else L_Aeq,T. */
  quantity: 'L_Aeq,T' | 'L_Ar,T';
  levelsDb: Float64Array;
}

/**
 * The phase's levels at `points` (height `heightM`), in order. O(points × duties × 8).
 * @example levelsAtPoints(project, 'ph1', fleet, [{ x: 0, y: 0 }], 1.5) // Float64Array [71.9]
 */
export function levelsAtPoints(
  project: Project,
  phaseId: string,
  fleet: Fleet,
  points: readonly SitePoint[],
  heightM: number,
): Float64Array {
  const out = new Float64Array(points.length);
  const phase = project.phases.find((p) => p.id === phaseId);
  if (!phase) return out.fill(NaN);
  const cut = mapProject(project, phaseId, fleet, points, heightM);
  const ev = evaluateProject(cut, undefined, { skipValidation: true });
  const byId = new Map<string, number>();
  for (const cell of ev.matrix)
    if (cell.phaseId === phaseId && cell.periodId === phase.periodId && cell.ownPeriod)
      byId.set(cell.receiverId, cell.levelDb);
  for (let i = 0; i < points.length; i++) out[i] = byId.get(`${MAP_RECEIVER_PREFIX}${i}`) ?? NaN;
  return out;
}

/** Whether the fleet's machines in the phase draw a character penalty (the map is then a rating level). */
export function mapQuantity(project: Project, phaseId: string, fleet: Fleet): 'L_Aeq,T' | 'L_Ar,T' {
  if (project.settings.characterPenaltyDb === 0) return 'L_Aeq,T';
  for (const d of project.duties) {
    if (d.phaseId !== phaseId) continue;
    const id = fleet[d.id] ?? d.baselineCandidateId;
    const c = project.candidates.find((x) => x.id === id);
    if (c && c.character !== 'none') return 'L_Ar,T';
  }
  return 'L_Aeq,T';
}

/**
 * Computes a level grid block by block. `onBlock(done, total)` is called after each block;
 * returning false stops the work (the grid is returned with the rest NaN). O(points × duties × 8).
 */
export function levelGrid(
  project: Project,
  request: MapRequest,
  onBlock?: (donePoints: number, totalPoints: number) => boolean | void,
): LevelGrid {
  const { nx, ny, spacingM, x0, y0 } = request;
  const total = nx * ny;
  const levelsDb = new Float64Array(total).fill(NaN);
  const phase = project.phases.find((p) => p.id === request.phaseId);
  const grid: LevelGrid = {
    x0,
    y0,
    spacingM,
    nx,
    ny,
    heightM: request.heightM,
    phaseId: request.phaseId,
    periodId: phase?.periodId ?? '',
    quantity: mapQuantity(project, request.phaseId, request.fleet),
    levelsDb,
  };
  if (!phase) return grid;
  const kernel = prepareMapKernel(project, request.phaseId, request.fleet);
  const xs = new Float64Array(MAP_BLOCK_POINTS);
  const ys = new Float64Array(MAP_BLOCK_POINTS);
  for (let start = 0; start < total; start += MAP_BLOCK_POINTS) {
    const end = Math.min(total, start + MAP_BLOCK_POINTS);
    for (let k = start; k < end; k++) {
      xs[k - start] = x0 + (k % nx) * spacingM;
      ys[k - start] = y0 + Math.floor(k / nx) * spacingM;
    }
    kernelLevels(kernel, xs.subarray(0, end - start), ys.subarray(0, end - start), request.heightM, levelsDb, start);
    if (onBlock && onBlock(end, total) === false) break;
  }
  return grid;
}
