/**
 * Project file upgrade from version 3 to version 4.
 *
 * Version 4 changed what periods and working hours mean, not their shape: a span may cross
 * midnight (an end earlier than the start, e.g. night 23:00–07:00; version 3 refused it),
 * and a phase is assessed in its own period and in every other period its remaining
 * working hours fall in (version 3 left those hours unassessed). A version-3 file holds no
 * span across midnight, so the step keeps every value as it is; where a phase's hours ran
 * past its own period those hours are now assessed, and the notice on opening says so.
 */
import type { UpgradeStep } from './upgrade-step.ts';

export const upgradeVersion3: UpgradeStep = (file) => ({ ...file });

/** What the step changes, in words for the person opening a version-3 file. */
export const VERSION_4_NOTE =
  'Since version 4, working hours that run past a phase’s own period are assessed in every other period they fall in (earlier versions left them out), and periods and working hours may run past midnight (e.g. night 23:00–07:00).';
