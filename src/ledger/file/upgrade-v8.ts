/**
 * Project file upgrade from version 8 to version 9.
 *
 * Version 9 keeps both sets of a candidate's cost figures: `cost` is the basis in use (hire
 * or purchase, as before) and the optional `setAsideCost` holds the other basis's figures
 * as the user last typed them, so switching basis only changes which set is used and
 * switching back restores them. A version-8 file has no set-aside figures; the step copies
 * the file and drops any `setAsideCost` a version-8 file might carry (it meant nothing
 * there). Every cost and level is unchanged.
 */
import type { UpgradeStep } from './upgrade-step.ts';

export const upgradeVersion8: UpgradeStep = (file) => {
  const next: Record<string, unknown> = { ...file };
  if (Array.isArray(file.candidates)) {
    next.candidates = file.candidates.map((c: unknown) => {
      if (typeof c !== 'object' || c === null || Array.isArray(c) || !Object.hasOwn(c, 'setAsideCost')) return c;
      const { setAsideCost: _s, ...candidate } = c as Record<string, unknown>;
      return candidate;
    });
  }
  return next;
};
