/**
 * What the level-versus-distance chart of the results shows for one duty at one receiver:
 * which machines are drawn (the baseline and the quietest of the ranking, up to a number a
 * reader can tell apart), each machine's curve from 5 m to 1 km and its level at the duty's
 * present distance (levelVersusDistance), and the phase total at that receiver that the
 * receiver's limit is compared with — the energetic sum over every duty of the phase for the
 * assessed fleet (the matrix cell of the phase in its own period), not the one machine.
 *
 * Cost: one levelVersusDistance (O(drawn machines × distances)) and a scan of the matrix.
 */
import type { Project } from '../model/model.ts';
import type { Evaluation } from '../model/results.ts';
import { levelVersusDistance, logSpacedDistances, type DistanceCurves } from './distance-curve.ts';

/** Lines the chart can tell apart by dash pattern and colour. */
export const CHART_LINES = 6;
/** Distances of the chart: 5 m to 1 km, 10 steps a decade (24 steps, 25 points). */
export const CHART_DISTANCES_M: readonly number[] = logSpacedDistances(5, 1000, 10);

/** The phase total at the receiver, which the limit line is compared with. */
export interface ChartPhaseTotal {
  phaseName: string;
  periodName: string;
  /** Phase total of the assessed fleet at the receiver, dB (L_Aeq,T, or L_Ar,T with a character penalty); NaN when not computed. */
  levelDb: number;
  /** Number of duties working in the phase (the total sums all of them). */
  duties: number;
  /** True when the phase total is strictly above the limit (the matrix's verdict). */
  over: boolean;
}

export interface DistanceChartData extends DistanceCurves {
  /** The phase total at the receiver for the assessed fleet; absent without a receiver or an evaluation. */
  phaseTotal?: ChartPhaseTotal;
  /** Words on which machines are drawn, when not all of the duty's are. */
  note?: string;
}

export interface DistanceChartOptions {
  /** The duty's machines in ranking order (quietest first); by default the duty's machines in project order. */
  rankedIds?: readonly string[];
  /** The evaluation of the assessed fleet, for the phase total. */
  evaluation?: Evaluation;
  /** At most this many lines, the baseline first. Default {@link CHART_LINES}. */
  lines?: number;
  /** Distances of the curves, m. Default {@link CHART_DISTANCES_M}. */
  distancesM?: readonly number[];
}

/**
 * The chart's figures for a duty at a receiver (or at a free-standing point without one).
 * Throws InputError for an unknown duty or receiver, like levelVersusDistance.
 * @example distanceChart(p, 'dig', 'home', { evaluation }).curves[0].atCurrentDb // 65.0 (LWA 105, Q = 2, 40 m)
 */
export function distanceChart(
  project: Project,
  dutyId: string,
  receiverId: string | undefined,
  options: DistanceChartOptions = {},
): DistanceChartData {
  const duty = project.duties.find((d) => d.id === dutyId);
  const ranked = options.rankedIds?.length
    ? options.rankedIds
    : project.candidates.filter((c) => c.dutyId === dutyId).map((c) => c.id);
  const lines = options.lines ?? CHART_LINES;
  const ids = duty?.baselineCandidateId ? [duty.baselineCandidateId] : [];
  for (const id of ranked) {
    if (ids.length >= lines) break;
    if (!ids.includes(id)) ids.push(id);
  }
  const curves = levelVersusDistance(project, dutyId, options.distancesM ?? CHART_DISTANCES_M, receiverId, {
    candidateIds: ids,
  });
  const data: DistanceChartData = { ...curves };
  const drawn = curves.curves.length;
  if (ranked.length > drawn)
    data.note = `Showing the baseline and the ${drawn - 1} quietest of the ${ranked.length} machines of this duty, by the ranking.`;
  const phase = project.phases.find((p) => p.id === duty?.phaseId);
  const cell =
    phase && receiverId !== undefined
      ? options.evaluation?.matrix.find(
          (c) => c.phaseId === phase.id && c.periodId === phase.periodId && c.receiverId === receiverId,
        )
      : undefined;
  if (phase && cell)
    data.phaseTotal = {
      phaseName: phase.name,
      periodName: project.periods.find((p) => p.id === phase.periodId)?.name ?? phase.periodId,
      levelDb: cell.levelDb,
      duties: project.duties.filter((d) => d.phaseId === phase.id).length,
      over: cell.over,
    };
  return data;
}
