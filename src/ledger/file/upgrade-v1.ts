/**
 * Project file upgrade from version 1 to version 2.
 *
 * Version 2 lets a candidate remember the register machine it was copied from
 * (`registerLink: { machineId, basis }`). Version 1 had no register, so no version-1
 * candidate is linked: the step copies the file and drops any `registerLink` key a
 * version-1 file might carry (it meant nothing then and must not start to mean something).
 * Nothing else changes meaning.
 */
import type { UpgradeStep } from './upgrade-step.ts';

export const upgradeVersion1: UpgradeStep = (file) => {
  const candidates = file.candidates;
  if (!Array.isArray(candidates)) return { ...file };
  return {
    ...file,
    candidates: candidates.map((c: unknown) => {
      if (typeof c !== 'object' || c === null || Array.isArray(c) || !('registerLink' in c)) return c;
      const { registerLink: _dropped, ...rest } = c as Record<string, unknown>;
      return rest;
    }),
  };
};
