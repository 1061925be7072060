/**
 * Per receiver, for the fleet being assessed: the cell (phase and period) with the least
 * margin, its level, limit and margin, how many cells are over, and the machine of the fleet
 * that contributes most there. The printed report's per-receiver table reads these rows.
 */
import type { Project } from '../model/model.ts';
import type { Evaluation, MatrixCell } from '../model/results.ts';
import { own } from '../model/own.ts';

export interface ReceiverSummary {
  receiverId: string;
  /** Cells of this receiver with a limit, and how many are over it. */
  assessed: number;
  over: number;
  /** The cell with the least margin (or, with no limit anywhere, the highest level); undefined with no computed cell. */
  worst?: MatrixCell;
  /** The fleet's machine contributing most at this receiver in the worst cell's phase, with its contribution, dB. */
  loudest?: { dutyId: string; candidateId: string; levelDb: number };
}

/** True when `a` is a worse cell than `b`: less margin, or with neither limited, a higher level. */
function worse(a: MatrixCell, b: MatrixCell): boolean {
  const ma = a.marginDb;
  const mb = b.marginDb;
  if (ma !== undefined && mb !== undefined) return ma < mb;
  if (ma !== undefined) return true;
  if (mb !== undefined) return false;
  return a.levelDb > b.levelDb;
}

/** One row per receiver, in project order. O(cells + duties · receivers). */
export function receiverSummaries(project: Project, evaluation: Evaluation): ReceiverSummary[] {
  return project.receivers.map((r) => {
    const cells = evaluation.matrix.filter(
      (c) =>
        c.receiverId === r.id && Number.isFinite(c.levelDb) && (c.marginDb === undefined || !Number.isNaN(c.marginDb)),
    );
    const limited = cells.filter((c) => c.limitDb !== undefined);
    const row: ReceiverSummary = {
      receiverId: r.id,
      assessed: limited.length,
      over: limited.filter((c) => c.over).length,
    };
    let worst: MatrixCell | undefined;
    for (const c of cells) if (!worst || worse(c, worst)) worst = c;
    if (!worst) return row;
    row.worst = worst;
    for (const d of project.duties) {
      if (d.phaseId !== worst.phaseId) continue;
      const candidateId = own(evaluation.fleet, d.id);
      if (candidateId === undefined) continue;
      const levelDb = evaluation.contributionDb(candidateId, r.id);
      if (Number.isFinite(levelDb) && (!row.loudest || levelDb > row.loudest.levelDb))
        row.loudest = { dutyId: d.id, candidateId, levelDb };
    }
    return row;
  });
}
