/**
 * Upgrading project files written by older versions of the program.
 *
 * Each step takes a file of version n (as parsed JSON) to version n + 1; reading applies
 * the steps in turn up to the current version. Version 1 is the first format, so the chain
 * is empty today; a future version 2 adds `UPGRADES[1] = (v1) => v2` and a test that
 * seeds a version-1 file.
 */
import { PROJECT_VERSION } from './model.ts';

/** A step from version n to n + 1, on plain parsed JSON. Must not mutate its input. */
export type UpgradeStep = (file: Record<string, unknown>) => Record<string, unknown>;

/** Steps by the version they start from. */
export const UPGRADES: Readonly<Record<number, UpgradeStep>> = {};

export type UpgradeOutcome =
  | { file: Record<string, unknown>; from: number }
  | { error: 'newer' | 'unknown'; version: unknown };

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
