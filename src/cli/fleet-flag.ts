/**
 * The `--fleet <name>` flag of `evaluate` and `export`: `baseline` (the duties' baselines),
 * `best` (solve afresh for the cheapest compliant fleet; the caller does that), or the name
 * of a fleet stored in the project. Without the flag a command uses the project's assessed
 * fleet (`evaluate`) or its own default (`export`: best).
 */
import type { Fleet, Project } from '../ledger/model/model.ts';
import {
  BASELINE_FLEET,
  BEST_FLEET,
  assessedFleet,
  fleetByName,
  isOutOfDate,
  storedFleet,
} from '../ledger/model/fleets.ts';
import { UsageError } from './flags.ts';

export type FleetFlag = { kind: 'best' } | { kind: 'named'; name: string; fleet: Fleet; outOfDate: boolean };

/** Reads the flag's value; an unknown name is a UsageError listing the names the project has. */
export function readFleetFlag(project: Project, value: unknown, fallback: 'assessed' | 'best'): FleetFlag {
  if (value === undefined) {
    if (fallback === 'best') return { kind: 'best' };
    const a = assessedFleet(project);
    return {
      kind: 'named',
      name: a.name,
      fleet: a.fleet,
      outOfDate: a.stored ? isOutOfDate(project, a.stored) : false,
    };
  }
  const name = String(value).trim();
  if (name.toLowerCase() === BEST_FLEET) return { kind: 'best' };
  const fleet = fleetByName(project, name);
  if (!fleet) {
    const names = [BASELINE_FLEET, BEST_FLEET, ...(project.fleets ?? []).map((f) => f.name)]
      .map((n) => JSON.stringify(n))
      .join(', ');
    throw new UsageError(`--fleet: ${JSON.stringify(name)} is not a fleet of this project (use one of ${names})`);
  }
  const stored = storedFleet(project, name);
  return {
    kind: 'named',
    name: stored?.name ?? BASELINE_FLEET,
    fleet,
    outOfDate: stored ? isOutOfDate(project, stored) : false,
  };
}

/** Words for a fleet in a command's output: "the baseline fleet" or "fleet “name”", marked when out of date. */
export function fleetLabel(flag: { name: string; outOfDate: boolean }): string {
  const words = flag.name === BASELINE_FLEET ? 'the baseline fleet' : `fleet “${flag.name}”`;
  return flag.outOfDate ? `${words} (found before later edits: out of date; run ledger optimise --save again)` : words;
}
