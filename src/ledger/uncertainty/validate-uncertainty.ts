/**
 * Validation of the uncertainty model's inputs (version 5): the project's `uncertainty`
 * settings (each optional, each within its range) and a duty's `onTimeRangePct`
 * (0 < lowest ≤ highest ≤ 100 %).
 */
import type { ProblemList } from '../validate/field-checks.ts';
import { RULES } from '../validate/validate-rules.ts';
import { DEFAULT_UNCERTAINTY, UNCERTAINTY_RULES } from './settings.ts';
import { UNCERTAINTY_NUMBERS } from '../catalogue/index.ts';

type Obj = Record<string, unknown>;

/** The project's `uncertainty` object, when present. */
export function validateUncertainty(p: ProblemList, root: Obj): void {
  if (root.uncertainty === undefined) return;
  if (!p.object('$.uncertainty', 'Uncertainty settings', root.uncertainty)) return;
  const u = root.uncertainty as Obj;
  for (const key of Object.keys(u)) {
    if (!(key in DEFAULT_UNCERTAINTY))
      p.add(
        `$.uncertainty.${key}`,
        'Uncertainty settings',
        key,
        'is not a setting',
        `use ${Object.keys(DEFAULT_UNCERTAINTY).join(', ')}`,
      );
  }
  for (const key of Object.keys(UNCERTAINTY_RULES) as (keyof typeof UNCERTAINTY_RULES)[]) {
    if (u[key] === undefined) continue;
    p.number(
      `$.uncertainty.${key}`,
      UNCERTAINTY_NUMBERS[key].header,
      u[key],
      UNCERTAINTY_RULES[key],
      `uncertainty/-/${key}`,
    );
  }
}

/** A duty's on-time range, when present: both ends on-times, the lowest not above the highest. */
export function validateOnTimeRange(
  p: ProblemList,
  path: string,
  where: string,
  duty: Obj,
  cell: (field: string) => string,
): void {
  const r = duty.onTimeRangePct;
  if (r === undefined) return;
  if (!p.object(path, `${where}, on-time range`, r)) return;
  const range = r as Obj;
  const okLow = p.number(
    `${path}.lowPct`,
    `${where}, lowest on-time`,
    range.lowPct,
    RULES.onTimePct,
    cell('onTimeRangePct.lowPct'),
  );
  const okHigh = p.number(
    `${path}.highPct`,
    `${where}, highest on-time`,
    range.highPct,
    RULES.onTimePct,
    cell('onTimeRangePct.highPct'),
  );
  if (okLow && okHigh && (range.lowPct as number) > (range.highPct as number)) {
    p.add(
      `${path}.highPct`,
      `${where}, highest on-time`,
      range.highPct,
      `is below the lowest ${String(range.lowPct)} %`,
      'give the highest on-time at or above the lowest',
    );
  }
}
