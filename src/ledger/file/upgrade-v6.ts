/**
 * Project file upgrade from version 6 to version 7.
 *
 * Version 7 adds the site plan: duty locations may be a line or an area on the site grid
 * (`{ kind: 'line' | 'polygon', points, distanceBy }`), `barriers` (polylines with a top
 * height that screen the paths whose line of sight they cut) and `sitePlan` (a drawing with
 * its scale, origin and north). A version-6 file has none of them; the step copies the file
 * and drops any `barriers` or `sitePlan` key a version-6 file might carry (they meant nothing
 * there, and a stray list must not start screening paths), so every level stays the same.
 * @example upgradeVersion6({ version: 6, name: 'Site', barriers: 'x' }) // { version: 6, name: 'Site' } (the caller sets version 7)
 */
import type { UpgradeStep } from './upgrade-step.ts';

export const upgradeVersion6: UpgradeStep = (file) => {
  const { barriers: _b, sitePlan: _s, ...rest } = file;
  return rest;
};
