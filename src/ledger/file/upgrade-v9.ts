/**
 * Project file upgrade from version 9 to version 10.
 *
 * Version 10 reads the Directive 2000/14/EC type words against the directive's consolidated
 * text (as amended by 2005/88/EC): `tracked-dozer` and `tracked-loader` now mean machines on
 * steel tracks, whose Stage II figures are indicative only, so the Stage I figures apply
 * (3 dB higher for a dozer, and for a loader above 55 kW); machines on rubber tracks have types
 * of their own (`rubber-tracked-dozer`, `rubber-tracked-loader`), as do vibratory plates,
 * vibratory rammers and walk-behind vibratory rollers. The file's words are kept as they are
 * (the step copies the file): which machines run on rubber tracks is for the user to say, not
 * for the program to guess. The notice on opening names what changed, and the candidates a
 * changed permissible level can reach, so no value changes unseen.
 */
import type { UpgradeStep } from './upgrade-step.ts';

/** The type words whose permissible level version 10 reads differently. */
export const RETYPED_IN_VERSION_10: readonly string[] = ['tracked-dozer', 'tracked-loader'];

export const VERSION_10_NOTE =
  'Since version 10, the Directive 2000/14/EC types follow the consolidated text with 2005/88/EC: "tracked dozer" and "tracked loader" now mean machines on steel tracks, for which the Stage I permissible levels still apply (Stage II is indicative only for them): 3 dB higher for a dozer, and for a loader above 55 kW. A machine on rubber tracks takes the new "rubber-tracked" type: check the directive type of each tracked dozer and loader. Vibratory plates, vibratory rammers and walk-behind vibratory rollers have types of their own. Permissible levels, and any level the permissible level stands in for, may differ from those the file gave before.';

/** Copies the file: every word and value is kept (see the module note). */
export const upgradeVersion9: UpgradeStep = (file) => ({ ...file });

/**
 * Names of the candidates whose directive type version 10 reads differently (for the notice).
 * @example retypedCandidates({ candidates: [{ name: 'Dozer A', directiveCategory: 'tracked-dozer' }] }) // ['Dozer A']
 */
export function retypedCandidates(file: Record<string, unknown>): string[] {
  if (!Array.isArray(file.candidates)) return [];
  const out: string[] = [];
  for (const c of file.candidates as unknown[]) {
    if (typeof c !== 'object' || c === null) continue;
    const row = c as Record<string, unknown>;
    if (typeof row.directiveCategory === 'string' && RETYPED_IN_VERSION_10.includes(row.directiveCategory))
      out.push(typeof row.name === 'string' ? row.name : String(row.id));
  }
  return out;
}
