/**
 * Project file upgrade from version 4 to version 5.
 *
 * Version 5 adds the tender's noise clauses (`clauses`, optional, see ./clauses/clause.ts).
 * A version-4 file has none, so it opens with no clauses and nothing else changes meaning;
 * the step copies the file and drops any `clauses` key a version-4 file might carry (it
 * meant nothing there, and a stray list must not start being checked as tender clauses).
 * @example upgradeVersion4({ version: 4, name: 'Site', clauses: 'x' }) // { version: 4, name: 'Site' } (the caller sets version 5)
 */
import type { UpgradeStep } from './upgrade-step.ts';

export const upgradeVersion4: UpgradeStep = (file) => {
  const { clauses: _c, ...rest } = file;
  return rest;
};
