/**
 * Upgrading project files written by older versions of the program.
 *
 * Each step takes a file of version n (as parsed JSON) to version n + 1; reading applies
 * the steps in turn up to the current version. Each step lives in its own file
 * (`upgrade-v<n>.ts`) with a test that seeds a file of version n.
 */
import { PROJECT_VERSION } from '../model/model.ts';
import type { UpgradeStep } from './upgrade-step.ts';
import { upgradeVersion1 } from './upgrade-v1.ts';
import { upgradeVersion2 } from './upgrade-v2.ts';
import { upgradeVersion3, VERSION_4_NOTE } from './upgrade-v3.ts';
import { upgradeVersion4 } from './upgrade-v4.ts';
import { upgradeVersion5 } from './upgrade-v5.ts';
import { upgradeVersion6 } from './upgrade-v6.ts';
import { upgradeVersion7, VERSION_8_NOTE } from './upgrade-v7.ts';
import { upgradeVersion8 } from './upgrade-v8.ts';
import { retypedCandidates, upgradeVersion9, VERSION_10_NOTE } from './upgrade-v9.ts';

export type { UpgradeStep } from './upgrade-step.ts';

/** Steps by the version they start from. */
export const UPGRADES: Readonly<Record<number, UpgradeStep>> = {
  1: upgradeVersion1,
  2: upgradeVersion2,
  3: upgradeVersion3,
  4: upgradeVersion4,
  5: upgradeVersion5,
  6: upgradeVersion6,
  7: upgradeVersion7,
  8: upgradeVersion8,
  9: upgradeVersion9,
};

/** What each step changes, in words for the person opening an older file, by the version it starts from. */
export const UPGRADE_NOTES: Readonly<Record<number, string>> = {
  3: VERSION_4_NOTE,
  7: VERSION_8_NOTE,
  9: VERSION_10_NOTE,
};

/**
 * The notes of every step from `from` to the current version, in order. Given the opened file
 * (or the project read from it), a note also names the rows it concerns, e.g. the machines
 * whose directive type version 10 reads differently.
 */
export function upgradeNotes(from: number, target: number = PROJECT_VERSION, file?: object): string[] {
  const out: string[] = [];
  for (let v = from; v < target; v++) if (UPGRADE_NOTES[v]) out.push(UPGRADE_NOTES[v] as string);
  if (file && from <= 9 && target >= 10) {
    const names = retypedCandidates(file as Record<string, unknown>);
    if (names.length > 0) out.push(`Tracked dozers and loaders to check: ${names.join(', ')}.`);
  }
  return out;
}

export type UpgradeOutcome =
  { file: Record<string, unknown>; from: number } | { error: 'newer' | 'unknown'; version: unknown };

/**
 * Brings a parsed file up to `target` (the current version by default) through `steps`.
 * A file newer than the target is refused, as is a version that is not a whole number ≥ 1
 * or that has no path of steps.
 * @example upgradeFile({ version: 1, … }) // { file: { version: 1, … }, from: 1 }
 */
export function upgradeFile(
  file: Record<string, unknown>,
  target: number = PROJECT_VERSION,
  steps: Readonly<Record<number, UpgradeStep>> = UPGRADES,
): UpgradeOutcome {
  const version = file.version;
  if (typeof version !== 'number' || !Number.isInteger(version) || version < 1) return { error: 'unknown', version };
  if (version > target) return { error: 'newer', version };
  let current = file;
  for (let v = version; v < target; v++) {
    const step = steps[v];
    if (!step) return { error: 'unknown', version };
    current = { ...step(current), version: v + 1 };
  }
  return { file: current, from: version };
}
