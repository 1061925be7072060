/**
 * The settings of the uncertainty model, their defaults and the ranges a project file accepts.
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

export const DEFAULT_UNCERTAINTY: Readonly<UncertaintySettings> = {
  defaultKDb: 3,
  kPerStandardDeviation: K_PER_STANDARD_DEVIATION,
  simpleMethodAccuracyDb: 3,
  unstatedAccuracyDb: 3,
  accuracyPerStandardDeviation: 2,
  draws: 10_000,
  seed: 1,
};

/** The ranges of each setting, with what is accepted. */
export const UNCERTAINTY_RULES = {
  defaultKDb: { min: 0, max: 10, accepted: 'an uncertainty K in dB from 0 to 10, e.g. 3' },
  kPerStandardDeviation: { min: 0.5, max: 4, accepted: 'a factor from 0.5 to 4, e.g. 1.645' },
  simpleMethodAccuracyDb: { min: 0, max: 20, accepted: 'an accuracy in ± dB from 0 to 20, e.g. 3' },
  unstatedAccuracyDb: { min: 0, max: 20, accepted: 'an accuracy in ± dB from 0 to 20, e.g. 3' },
  accuracyPerStandardDeviation: { min: 0.5, max: 4, accepted: 'a number of standard deviations from 0.5 to 4, e.g. 2' },
  draws: {
    min: 100,
    max: 1_000_000,
    integer: true,
    accepted: 'a whole number of draws from 100 to 1000000, e.g. 10000',
  },
  seed: { min: 0, max: 4294967295, integer: true, accepted: 'a whole number from 0 to 4294967295, e.g. 1' },
} satisfies Record<keyof UncertaintySettings, NumberRule>;

/** The project's settings, each missing or unusable one replaced by its default. O(1). */
export function uncertaintySettingsOf(project: Pick<Project, 'uncertainty'>): UncertaintySettings {
  const given = project.uncertainty;
  const out: UncertaintySettings = { ...DEFAULT_UNCERTAINTY };
  if (!given || typeof given !== 'object') return out;
  for (const key of Object.keys(DEFAULT_UNCERTAINTY) as (keyof UncertaintySettings)[]) {
    const v = given[key];
    const rule: NumberRule & { min: number; max: number } = UNCERTAINTY_RULES[key];
    if (
      typeof v === 'number' &&
      Number.isFinite(v) &&
      v >= rule.min &&
      v <= rule.max &&
      (!rule.integer || Number.isInteger(v))
    )
      out[key] = v;
  }
  return out;
}
