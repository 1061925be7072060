/**
 * The paths a barrier on the plan screens, for the report: duty, receiver, barrier, the path
 * difference z (ISO 9613-2:1996 eq. 16) and the barrier term the path carries, dB (negative:
 * the level falls), in project order.
 */
import type { Project } from '../model/model.ts';
import { pathEntryAt, pathTableFor } from '../prediction/path-table.ts';

export interface ScreenedPath {
  dutyName: string;
  receiverName: string;
  barrierName: string;
  pathDifferenceM: number;
  /** The barrier term on the path, dB (A_bar under the ISO method, D_z at 500 Hz under the simple method), negative. */
  termDb: number;
  termLabel: string;
}

/** Every duty–receiver path screened by a barrier on the plan. O(duties × receivers). */
export function screenedPaths(project: Project): ScreenedPath[] {
  if (!project.barriers || project.barriers.length === 0) return [];
  const table = pathTableFor(project);
  const nr = table.receiverIds.length;
  const out: ScreenedPath[] = [];
  project.duties.forEach((d, u) => {
    project.receivers.forEach((r, k) => {
      const entry = pathEntryAt(table, u * nr + k);
      const b = entry?.barrier;
      if (!entry || !b) return;
      const term = entry.pathTerms.find((t) => t.key === 'abar');
      out.push({
        dutyName: d.name,
        receiverName: r.name,
        barrierName: b.barrierName,
        pathDifferenceM: b.pathDifferenceM,
        termDb: term?.db ?? 0,
        termLabel: term?.label ?? '',
      });
    });
  });
  return out;
}
