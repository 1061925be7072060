/**
 * The printed report's level maps: for the fleet being assessed, one map per phase that has
 * a duty placed on the site grid, each worked from the project by the map's kernel
 * (../../ledger/map/level-grid.ts) and drawn by {@link mapSvg} — the same picture as
 * `ledger map -o out.svg`. Nothing here depends on the Site plan tab having been opened.
 *
 * Each map covers the plan (every placed point with a margin), about
 * {@link REPORT_MAP_POINTS_ACROSS} points across, at {@link REPORT_MAP_HEIGHT_M} above ground,
 * with isolines every {@link DEFAULT_ISOLINE_STEP_DB} dB and the limit line of the phase's
 * worst receiver (the matrix's), when it has a limit in the phase's period.
 */
import type { Fleet, Project } from '../../ledger/model/model.ts';
import { levelGrid } from '../../ledger/map/level-grid.ts';
import { DEFAULT_ISOLINE_STEP_DB, isolineLevels } from '../../ledger/map/contours.ts';
import { limitLine, type LimitLine } from '../../ledger/map/limit-line.ts';
import { defaultSpacingM, fitBox, gridOver, placedPoints } from '../../ledger/map/map-bounds.ts';
import { dutiesLeftOff } from '../../ledger/map/map-project.ts';
import { mapSvg } from './map-svg.ts';

/** Points across a report map (the app's and command line's default is 100; a printed page needs fewer). */
export const REPORT_MAP_POINTS_ACROSS = 80;
/** Height of the report map's points above ground, m (the app's and command line's default). */
export const REPORT_MAP_HEIGHT_M = 4;

/** One phase's map for the report. */
export interface PhaseMap {
  phaseId: string;
  phaseName: string;
  /** "L_Aeq,T" or "L_Ar,T" (a machine of the fleet draws the character penalty). */
  quantity: 'L_Aeq,T' | 'L_Ar,T';
  /** The SVG document: bands, isolines, the limit line, barriers, duties, receivers, legend, cautions. */
  svg: string;
  heightM: number;
  spacingM: number;
  /** Isolines every so many dB. */
  stepDb: number;
  /** The limit line drawn, if any. */
  limit?: LimitLine;
  /** Duties of the phase known only by stated distances, left off the map, by name. */
  leftOff: string[];
}

/**
 * The report's map of each phase for `fleet` (named `fleetName`), in project order; phases
 * with no duty on the site grid are left out. `worstReceiverByPhase` (the evaluation's) picks
 * each phase's limit line. O(phases × points × machines × barrier segments).
 * @example phaseMaps(demoProject(), baselineChoice(demo), 'baseline', ev.worstReceiverByPhase).length // 3
 */
export function phaseMaps(
  project: Project,
  fleet: Fleet,
  fleetName: string,
  worstReceiverByPhase: Readonly<Record<string, string>> = {},
): PhaseMap[] {
  const box = fitBox(placedPoints(project), 0.08);
  const spacingM = defaultSpacingM(box, REPORT_MAP_POINTS_ACROSS);
  const heightM = REPORT_MAP_HEIGHT_M;
  const out: PhaseMap[] = [];
  for (const phase of project.phases) {
    if (!project.duties.some((d) => d.phaseId === phase.id && d.location.kind !== 'distances')) continue;
    const grid = levelGrid(project, { phaseId: phase.id, fleet, heightM, spacingM, ...gridOver(box, spacingM) });
    const worst = worstReceiverByPhase[phase.id];
    const limit = worst === undefined ? undefined : limitLine(project, worst, phase.id);
    const svg = mapSvg(project, grid, {
      box,
      levels: isolineLevels(grid, DEFAULT_ISOLINE_STEP_DB),
      ...(limit ? { limit } : {}),
      title: `${project.name}: ${phase.name}, ${fleetName} fleet`,
    });
    const map: PhaseMap = {
      phaseId: phase.id,
      phaseName: phase.name,
      quantity: grid.quantity,
      svg,
      heightM,
      spacingM,
      stepDb: DEFAULT_ISOLINE_STEP_DB,
      leftOff: dutiesLeftOff(project, phase.id),
    };
    if (limit) map.limit = limit;
    out.push(map);
  }
  return out;
}
