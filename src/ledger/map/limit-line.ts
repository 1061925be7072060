/**
 * The level at which the map draws a receiver's limit as a heavier line. The map is a
 * free-field level (no façade term); a receiver assessed 1 m in front of a façade gets +3 dB
 * there, so for it the line is drawn at its limit less the façade correction, and the words
 * say so.
 */
import type { Project } from '../model/model.ts';
import { FACADE_CORRECTION_DB } from '../../core/corrections.ts';
import { limitOf } from '../model/limits.ts';

export interface LimitLine {
  levelDb: number;
  words: string;
}

/** The limit line of a receiver for a phase (its own period), or undefined when it has no limit there. */
export function limitLine(project: Project, receiverId: string, phaseId: string): LimitLine | undefined {
  const r = project.receivers.find((x) => x.id === receiverId);
  const phase = project.phases.find((p) => p.id === phaseId);
  if (!r || !phase) return undefined;
  const limit = limitOf(r, phase.periodId);
  if (limit === undefined) return undefined;
  if (r.facade) {
    return {
      levelDb: limit - FACADE_CORRECTION_DB,
      words: `Limit of ${r.name}: ${limit} dB at the façade, drawn at ${limit - FACADE_CORRECTION_DB} dB free field (less the ${FACADE_CORRECTION_DB} dB façade correction)`,
    };
  }
  return { levelDb: limit, words: `Limit of ${r.name}: ${limit} dB` };
}
