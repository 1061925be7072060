/**
 * Which barrier screens a duty–receiver path, and its geometry over the top edge.
 *
 * Rule (stated in the assumptions): a barrier screens a path when, in plan, the line from
 * the source point to the receiver crosses one of its segments and the path difference z over
 * that segment's top edge (ISO 9613-2:1996 eq. 16, core/standards/iso9613-2-1996/
 * barrier-path-difference.ts) is above {@link GRAZING_FADE_M}: z is positive where the top
 * is above the line of sight, 0 where it grazes it and negative (−(path over the edge − d))
 * where the line of sight passes over. When several segments or barriers screen a path, the
 * one with the largest z is used alone (single diffraction, C3 = 1); double diffraction over
 * two barriers (eq. 17) is not modelled, which errs on the side of less screening.
 *
 * Near grazing: D_z of eq. 14, continued for negative z (core/standards/iso9613-2-1996/
 * barrier.ts), is 10·lg 3 = 4.8 dB at z = 0 and falls to 0 dB at z = −λ/10, so as a receiver
 * rises out of a barrier's shadow its level changes smoothly, with no step where the line of
 * sight is first cleared; a barrier whose edge is below the line of sight by more than
 * −GRAZING_FADE_M of path difference (0.54 m, where D_z is 0 in every band) screens nothing and
 * is not named. Past the end of a barrier the path is no longer crossed in plan and the
 * screening stops (diffraction round a vertical edge, eq. 13, is not modelled): a level map
 * steps there, along the line from the source through the barrier's end, and nowhere else.
 */
import type { Barrier } from '../model/model.ts';
import {
  topEdgePath,
  type PlanPoint3,
  type TopEdgePath,
} from '../../core/standards/iso9613-2-1996/barrier-path-difference.ts';
import { GRAZING_FADE_M } from '../../core/standards/iso9613-2-1996/barrier.ts';

/** The rule above in words, for the assumptions of the report, the workbook and the Site plan tab. */
export const BARRIER_RULE_WORDS =
  'A barrier on the plan screens each path whose plan line crosses it: z is the path difference over its top edge ' +
  '(ISO 9613-2:1996 eq. 16), negative where the line of sight passes over the top, and D_z = 10·lg(3 + (20/λ)·z·K_met) (eq. 14) ' +
  'is continued for negative z down to 0 dB at z = −λ/10, as CNOSSOS-EU does (Directive (EU) 2015/996): the level changes ' +
  'smoothly where the line of sight is first cut (D_z = 4.8 dB at z = 0), with no step. Where several barriers cross a path the ' +
  'largest z screens alone (no double diffraction). Past a barrier’s end screening stops (diffraction round its end is not ' +
  'modelled): the level steps there by the barrier’s term, along the line from the source through the end.';

/** The barrier screening a path, with its top-edge geometry. */
export interface ScreeningBarrier extends TopEdgePath {
  /** Path difference z of eq. 16, m, signed: negative when the line of sight passes over the edge (near grazing). */
  pathDifferenceM: number;
  barrierId: string;
  barrierName: string;
  /** Index of the segment (from point i to point i + 1) the path crosses. */
  segment: number;
  topHeightM: number;
}

/**
 * The barrier that screens the path source → receiver, or undefined when none cuts the line
 * of sight. Barriers with unreadable points or heights are passed over (validation names
 * them). O(barrier segments).
 * @example screeningBarrier([{ id: 'b1', name: 'Hoarding', heightM: 3, points: [{x:10,y:-50},{x:10,y:50}] }], {x:0,y:0,heightM:1}, {x:20,y:0,heightM:1})?.pathDifferenceM // 0.396
 */
export function screeningBarrier(
  barriers: readonly Barrier[] | undefined,
  source: PlanPoint3,
  receiver: PlanPoint3,
): ScreeningBarrier | undefined {
  if (!barriers) return undefined;
  let best: ScreeningBarrier | undefined;
  // The path's extent in plan: a barrier wholly outside it cannot be crossed (most barriers of a map's paths).
  const minX = Math.min(source.x, receiver.x);
  const maxX = Math.max(source.x, receiver.x);
  const minY = Math.min(source.y, receiver.y);
  const maxY = Math.max(source.y, receiver.y);
  for (const barrier of barriers) {
    if (!barrier || !Array.isArray(barrier.points) || !(barrier.heightM >= 0)) continue;
    if (outsideBox(barrier.points, minX, maxX, minY, maxY)) continue;
    best = screeningOver(barrier, source, receiver, best);
  }
  return best;
}

/**
 * The screening of the path over one barrier's segments, or `best` when none screens it
 * better (a larger z): the step of {@link screeningBarrier} for one barrier, without its
 * extent check (a level map checks the extent against the barrier's box, kept once).
 * The barrier must have an array of points and a height ≥ 0. O(segments).
 */
export function screeningOver(
  barrier: Barrier,
  source: PlanPoint3,
  receiver: PlanPoint3,
  best: ScreeningBarrier | undefined,
): ScreeningBarrier | undefined {
  const minX = Math.min(source.x, receiver.x);
  const maxX = Math.max(source.x, receiver.x);
  const minY = Math.min(source.y, receiver.y);
  const maxY = Math.max(source.y, receiver.y);
  for (let i = 1; i < barrier.points.length; i++) {
    const a = barrier.points[i - 1];
    const b = barrier.points[i];
    if (!a || !b || !Number.isFinite(a.x) || !Number.isFinite(a.y) || !Number.isFinite(b.x) || !Number.isFinite(b.y))
      continue;
    // A segment wholly west, east, south or north of the path's box cannot cross it (NaN: never passed over).
    if (
      (a.x < minX && b.x < minX) ||
      (a.x > maxX && b.x > maxX) ||
      (a.y < minY && b.y < minY) ||
      (a.y > maxY && b.y > maxY)
    )
      continue;
    const path = topEdgePath(source, receiver, a, b, barrier.heightM);
    if (!path) continue;
    // z signed: negative where the line of sight passes over the edge (the edge grazes or is below it).
    const z = path.clearanceM >= 0 ? path.pathDifferenceM : -path.pathDifferenceM;
    if (!(z > GRAZING_FADE_M)) continue;
    if (!best || z > best.pathDifferenceM) {
      // Written out (no spread): a level map builds one for most paths behind a barrier.
      best = {
        pathDifferenceM: z,
        sourceToEdgeM: path.sourceToEdgeM,
        edgeToReceiverM: path.edgeToReceiverM,
        lateralM: path.lateralM,
        distanceM: path.distanceM,
        crossing: path.crossing,
        clearanceM: path.clearanceM,
        barrierId: barrier.id,
        barrierName: barrier.name,
        segment: i - 1,
        topHeightM: barrier.heightM,
      };
    }
  }
  return best;
}

/**
 * Whether every point of a polyline lies on one side of the box (all west, east, south or
 * north of it), so no segment of it can cross a line inside the box. A point that is not a
 * finite number answers false (the segment check then passes it over). O(points).
 */
function outsideBox(
  points: readonly { x: number; y: number }[],
  minX: number,
  maxX: number,
  minY: number,
  maxY: number,
): boolean {
  let west = true;
  let east = true;
  let south = true;
  let north = true;
  for (const p of points) {
    if (!p || !Number.isFinite(p.x) || !Number.isFinite(p.y)) return false;
    west &&= p.x < minX;
    east &&= p.x > maxX;
    south &&= p.y < minY;
    north &&= p.y > maxY;
  }
  return west || east || south || north;
}
