/**
 * Project file upgrade from version 7 to version 8.
 *
 * Version 8 follows ISO 9613-2:1996 clause 8 for the meteorological correction: the
 * propagation setting holds C0 (`c0Db`, 0 to 5 dB) and each path gets its own
 * C_met = 0 for d_p ≤ 10(h_s + h_r), else C0·[1 − 10(h_s + h_r)/d_p] (eqs 21, 22), where
 * version 7 subtracted one flat `cmetDb` from every path. The step carries the value over as
 * C0 unchanged (C_met tends to C0 on long paths); a value above 5 dB is kept as it was and
 * reported by validation, never clipped. An unreadable cell keeps its typed text under the
 * new field's key. Nothing else changes shape; the ground method keeps its value, but its
 * meaning for machines known only by LWA under `general` is now the standard's (the general
 * method's terms at 500 Hz, where version 7 used the alternative method whatever G was), and
 * any screening under ISO 9613-2 is D_z replacing the ground effect (eq. 12) instead of a
 * reduction subtracted on top of A_gr. The notice on opening says so.
 */
import type { UpgradeStep } from './upgrade-step.ts';

const isRecord = (x: unknown): x is Record<string, unknown> => typeof x === 'object' && x !== null && !Array.isArray(x);

export const upgradeVersion7: UpgradeStep = (file) => {
  const next: Record<string, unknown> = { ...file };
  const prop = file.propagation;
  if (isRecord(prop) && prop.method === 'iso9613-2:1996' && 'cmetDb' in prop) {
    const { cmetDb, ...rest } = prop;
    next.propagation = { ...rest, c0Db: cmetDb };
  }
  const unread = file.unreadCells;
  if (isRecord(unread) && Object.prototype.hasOwnProperty.call(unread, 'propagation/-/cmetDb')) {
    const { 'propagation/-/cmetDb': typed, ...others } = unread;
    next.unreadCells = { ...others, 'propagation/-/c0Db': typed };
  }
  return next;
};

/** What the step changes, in words for the person opening a version-7 file. */
export const VERSION_8_NOTE =
  'Since version 8, ISO 9613-2:1996 is applied as the standard defines it: the meteorological correction is C_met per path from C0 (eqs 21, 22; the file’s former flat C_met is kept as C0), a machine known only by its LWA takes the general ground method’s terms at 500 Hz unless the alternative method is chosen, and screening replaces the ground effect (A_bar = D_z − A_gr, eq. 12) instead of being subtracted on top of it. Levels under ISO 9613-2 may differ from those the file gave before.';
