/**
 * Where a project's ISO 9613-2:1996 predictions lie outside the range for which the standard
 * states its accuracy (Table 5: 1 km or more, mean height above 30 m, screened or reflected
 * paths — a façade counts as a reflection) or the atmosphere outside ISO 9613-1:1993's
 * stated range: notes shown beside the matrix, in `ledger evaluate` and in the workbook,
 * grouped by reason so a large site gives a few lines. O(duties × receivers).
 */
import type { Duty, Project, Receiver } from '../model/model.ts';
import type { DataProblem } from '../model/results.ts';
import { pathGeometry, sourceHeightOf } from './geometry.ts';
import { own } from '../model/own.ts';
import {
  ACCURACY_MAX_DISTANCE_M,
  ACCURACY_MAX_MEAN_HEIGHT_M,
  table5AccuracyDb,
} from '../../core/standards/iso9613-2-1996/accuracy.ts';
import { absorptionAccuracyNote } from '../../core/standards/iso9613-1-1993.ts';

/** Paths named in one note before "and N more". */
const NAMED = 4;

/** The path from a duty to a receiver is screened (a barrier term, a rule of thumb or a stated reduction other than 0). */
function isScreened(duty: Duty, receiver: Receiver): boolean {
  const s = own(receiver.screening, duty.id);
  return !!s && s.kind !== 'none' && !(s.kind === 'explicit' && s.db === 0);
}

/**
 * The ± accuracy ISO 9613-2:1996 Table 5 states for the path from a duty to a receiver
 * (3-D distance, mean height (h_s + h_r)/2, screening, façade reflection), or undefined where
 * it states none — the same reading as the notes below. O(1).
 */
export function pathTable5AccuracyDb(project: Project, duty: Duty, receiver: Receiver): number | undefined {
  const hs = sourceHeightOf(duty, project.propagation);
  return table5AccuracyDb({
    distanceM: pathGeometry(duty, receiver, hs).distanceM,
    meanHeightM: (hs + receiver.heightM) / 2,
    screened: isScreened(duty, receiver),
    reflected: receiver.facade === true,
  });
}

/** Paths of one reason: how many, and the names of the first {@link NAMED}. */
interface Listing {
  named: string[];
  count: number;
}

const listing = (): Listing => ({ named: [], count: 0 });

/** The notes, empty for the simple method or when every path is inside the stated range. Never throws. */
export function pathAccuracyNotes(project: Project): DataProblem[] {
  const prop = project.propagation;
  if (!prop || prop.method !== 'iso9613-2:1996') return [];
  const notes: DataProblem[] = [];
  try {
    const atmosphere = absorptionAccuracyNote(prop.temperatureC, prop.humidityPct, prop.pressureKPa);
    if (atmosphere) notes.push({ path: '$.propagation', message: atmosphere });
  } catch {
    // An atmosphere the core refuses is a validation problem, named there.
  }
  // Each reason keeps the count and the first few names: a large site has hundreds of thousands of paths.
  const far = listing();
  const high = listing();
  const screened = listing();
  const reflected = listing();
  const duties = Array.isArray(project.duties) ? project.duties : [];
  const receivers = Array.isArray(project.receivers) ? project.receivers : [];
  for (const duty of duties) {
    const hs = sourceHeightOf(duty, prop);
    for (const receiver of receivers) {
      const d = pathGeometry(duty, receiver, hs).distanceM;
      if (Number.isFinite(d) && d >= ACCURACY_MAX_DISTANCE_M && far.count++ < NAMED)
        far.named.push(`${duty.name} → ${receiver.name} (${Math.round(d)} m)`);
      if ((hs + receiver.heightM) / 2 > ACCURACY_MAX_MEAN_HEIGHT_M && high.count++ < NAMED)
        high.named.push(`${duty.name} → ${receiver.name}`);
      if (isScreened(duty, receiver) && screened.count++ < NAMED)
        screened.named.push(`${duty.name} → ${receiver.name}`);
      if (receiver.facade === true && reflected.count++ < NAMED)
        reflected.named.push(`${duty.name} → ${receiver.name}`);
    }
  }
  const add = ({ named, count }: Listing, why: string) => {
    if (count === 0) return;
    const listed = named.join('; ') + (count > NAMED ? `; and ${count - NAMED} more` : '');
    notes.push({
      path: '$.receivers',
      message: `ISO 9613-2:1996 Table 5 states no accuracy for ${why}, so no ±3 dB is quoted for ${count === 1 ? 'this path' : `these ${count} paths`}: ${listed}`,
    });
  };
  add(far, 'paths of 1 km or more');
  add(high, 'mean heights (h_s + h_r)/2 above 30 m');
  add(screened, 'screened paths');
  add(reflected, 'paths with a reflection (receiver 1 m in front of a façade)');
  return notes;
}
