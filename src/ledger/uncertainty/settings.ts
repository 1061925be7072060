/**
 * The settings of the uncertainty model, their defaults and the ranges a project file accepts
 * (the field catalogue's).
 *
 * Defaults, each a setting the user may change:
 * - K for a machine that declares none: 3 dB, inside the 1.5–4 dB typical of declarations
 *   (common practice); used for the spread only, never for the levels.
 * - K = 1.645·σ (one-sided 95 %; from memory of ISO 4871:1996).
 * - The simple point-source method: ±3 dB, the figure ISO 9613-2:1996 Table 5 gives for
 *   its own method near the ground (the simple method is not more accurate than that).
 * - An ISO 9613-2:1996 path outside its Table 5: ±3 dB, marked as assumed.
 * - A stated ± accuracy read as 2 standard deviations (about 95 % of cases within it;
 *   the standard does not say; a setting).
 * - 10,000 draws, seed 1.
 */
import type { Project, UncertaintySettings } from '../model/model.ts';
import { K_PER_STANDARD_DEVIATION } from '../../core/standards/iso4871-1996.ts';
import type { NumberRule } from '../validate/field-checks.ts';
import { validationRule } from '../validate/validate-rules.ts';
import { UNCERTAINTY_NUMBERS, fieldAccepts } from '../catalogue/index.ts';

export const DEFAULT_UNCERTAINTY: Readonly<UncertaintySettings> = {
  defaultKDb: 3,
  kPerStandardDeviation: K_PER_STANDARD_DEVIATION,
  simpleMethodAccuracyDb: 3,
  unstatedAccuracyDb: 3,
  accuracyPerStandardDeviation: 2,
  draws: 10_000,
  seed: 1,
};

/** The ranges of each setting, with what is accepted: the field catalogue's (`ledger/catalogue/uncertainty-fields.ts`). */
export const UNCERTAINTY_RULES = Object.fromEntries(
  Object.entries(UNCERTAINTY_NUMBERS).map(([key, field]) => [key, validationRule(field)]),
) as Record<keyof UncertaintySettings, NumberRule & { min: number; max: number }>;

/** The project's settings, each missing or unusable one replaced by its default. O(1). */
export function uncertaintySettingsOf(project: Pick<Project, 'uncertainty'>): UncertaintySettings {
  const given = project.uncertainty;
  const out: UncertaintySettings = { ...DEFAULT_UNCERTAINTY };
  if (!given || typeof given !== 'object') return out;
  for (const key of Object.keys(DEFAULT_UNCERTAINTY) as (keyof UncertaintySettings)[]) {
    const v = given[key];
    if (typeof v === 'number' && fieldAccepts(UNCERTAINTY_NUMBERS[key], v)) out[key] = v;
  }
  return out;
}
