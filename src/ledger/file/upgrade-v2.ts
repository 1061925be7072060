/**
 * Project file upgrade from version 2 to version 3.
 *
 * Version 3 adds named fleets (`fleets`: the optimiser's latest result and the user's
 * fleets) and `assessedFleet` (the fleet the results describe), both optional. A version-2
 * file has none, so it assesses its baseline, as before; the step copies the file and drops
 * any `fleets` or `assessedFleet` key a version-2 file might carry (they meant nothing there).
 */
import type { UpgradeStep } from './upgrade-step.ts';

export const upgradeVersion2: UpgradeStep = (file) => {
  const { fleets: _f, assessedFleet: _a, ...rest } = file;
  return rest;
};
