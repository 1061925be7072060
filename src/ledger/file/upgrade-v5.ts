/**
 * Project file upgrade from version 5 to version 6.
 *
 * Version 6 adds the settings of the uncertainty model (`uncertainty`: the K assumed where
 * none is declared, K per standard deviation, the methods' accuracy and how it is read,
 * draws and seed) and a duty's on-time range (`onTimeRangePct`), both optional; the levels
 * are unchanged. A version-5 file has neither, so it takes the defaults; the step copies the
 * file and drops any `uncertainty` or `onTimeRangePct` a version-5 file might carry (they
 * meant nothing there).
 */
import type { UpgradeStep } from './upgrade-step.ts';

export const upgradeVersion5: UpgradeStep = (file) => {
  const { uncertainty: _u, ...rest } = file;
  if (Array.isArray(rest.duties)) {
    rest.duties = rest.duties.map((d: unknown) => {
      if (typeof d !== 'object' || d === null || Array.isArray(d) || !('onTimeRangePct' in d)) return d;
      const { onTimeRangePct: _r, ...duty } = d as Record<string, unknown>;
      return duty;
    });
  }
  return rest;
};
