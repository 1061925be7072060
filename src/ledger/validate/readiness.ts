/**
 * What a project still needs before its results can be computed, in the order a new user
 * fills it in: an assessment period, a phase, receivers with a limit, duties with a place
 * and a baseline machine, and machines with a level. Each item names the list to open, so
 * the app can link to it and the command line can say where to look.
 */
import type { Project } from '../model/model.ts';

/** The part of the project an item is filled in. */
export type ReadinessPlace = 'periods' | 'phases' | 'receivers' | 'duties' | 'candidates';

export interface MissingItem {
  place: ReadinessPlace;
  /** What is missing, as a sentence with the names of the rows concerned. */
  message: string;
}

const finite = (x: unknown): boolean => typeof x === 'number' && Number.isFinite(x);
const names = (items: readonly { name: string }[], limit = 3): string => {
  const shown = items.slice(0, limit).map((i) => (i.name.trim() === '' ? '(unnamed)' : `“${i.name}”`));
  return items.length > limit ? `${shown.join(', ')} and ${items.length - limit} more` : shown.join(', ');
};

/** A line or area has enough points, each with both coordinates. */
function areaPlaced(points: readonly { x: number; y: number }[], least: number): boolean {
  return Array.isArray(points) && points.length >= least && points.every((p) => finite(p.x) && finite(p.y));
}

/**
 * Lists what is still missing before the matrix can be computed; empty when nothing is.
 * It does not repeat cell-level problems (those are marked on their cells); it says which
 * kind of thing is absent or unfinished.
 *
 * O(periods + phases + receivers·periods + duties·receivers + candidates).
 * @example missingForResults(blankProject()) // [{ place: 'receivers', message: 'No receiver yet: …' }, …]
 */
export function missingForResults(project: Project): MissingItem[] {
  const machines = candidateFacts(project);
  const out: MissingItem[] = [];
  if (project.periods.length === 0)
    out.push({
      place: 'periods',
      message: 'No assessment period yet: add one (e.g. weekday daytime 07:00–19:00) in Settings.',
    });
  if (project.phases.length === 0)
    out.push({ place: 'phases', message: 'No phase of the works yet: add one and choose its assessment period.' });
  const assessedPeriods = new Set(project.phases.map((p) => p.periodId));
  if (project.receivers.length === 0) {
    out.push({
      place: 'receivers',
      message: 'No receiver yet: add the homes, schools or other places whose limits apply.',
    });
  } else {
    const noLimit = project.receivers.filter(
      (r) => !Object.entries(r.limitsDb).some(([period, db]) => assessedPeriods.has(period) && finite(db)),
    );
    if (noLimit.length)
      out.push({
        place: 'receivers',
        message: `No limit for a period a phase is assessed over at ${names(noLimit)}: type a limit in dB.`,
      });
    const unplaced = project.receivers.filter((r) => !finite(r.x) || !finite(r.y));
    const placedByPoint = project.duties.some((d) => d.location.kind !== 'distances');
    if (unplaced.length && placedByPoint)
      out.push({ place: 'receivers', message: `No position (X, Y) for ${names(unplaced)}.` });
  }
  if (project.duties.length === 0) {
    out.push({
      place: 'duties',
      message: 'No duty yet: add each job that needs a machine (e.g. “Break out the slab”).',
    });
  } else {
    const unplaced = project.duties.filter((d) =>
      d.location.kind === 'point'
        ? !finite(d.location.x) || !finite(d.location.y)
        : d.location.kind === 'line' || d.location.kind === 'polygon'
          ? !areaPlaced(d.location.points, d.location.kind === 'line' ? 2 : 3)
          : project.receivers.some(
              (r) => !finite((d.location as { distancesM: Record<string, number> }).distancesM[r.id]),
            ),
    );
    if (unplaced.length)
      out.push({
        place: 'duties',
        message: `No place for ${names(unplaced)}: give X and Y on the site grid, or a distance to each receiver.`,
      });
    const noDays = project.duties.filter((d) => !finite(d.durationDays));
    if (noDays.length) out.push({ place: 'duties', message: `No number of days for ${names(noDays)}.` });
    const withMachines = machines.duties;
    const empty = project.duties.filter((d) => !withMachines.has(d.id));
    if (empty.length)
      out.push({
        place: 'candidates',
        message: `No machine offered for ${names(empty)}: add the machines that could do it.`,
      });
    const noBaseline = project.duties.filter(
      (d) => withMachines.has(d.id) && !machines.baselines.has(d.baselineCandidateId),
    );
    if (noBaseline.length)
      out.push({
        place: 'duties',
        message: `No baseline machine for ${names(noBaseline)}: type the name of the machine that would be used anyway.`,
      });
  }
  const noLevel = machines.noLevel;
  if (noLevel.length)
    out.push({ place: 'candidates', message: `No LWA for ${names(noLevel.map((c) => ({ name: c.label })))}.` });
  return out;
}

/**
 * What the readiness list needs of the machines, in one pass over them (an edit of a large
 * project runs this with every keystroke committed): the duties that have a machine, which
 * duties' baselines exist, and the machines with neither a level nor a stand-in.
 * O(candidates + duties).
 */
function candidateFacts(project: Project): {
  duties: Set<string>;
  baselines: Set<string>;
  noLevel: Project['candidates'];
} {
  const wanted = new Set(project.duties.map((d) => d.baselineCandidateId));
  const duties = new Set<string>();
  const baselines = new Set<string>();
  const noLevel: Project['candidates'] = [];
  for (const c of project.candidates) {
    duties.add(c.dutyId);
    if (wanted.has(c.id)) baselines.add(c.id);
    if (!finite(c.lwaDb) && c.lwaOrigin !== 'permissible-stand-in') noLevel.push(c);
  }
  return { duties, baselines, noLevel };
}
