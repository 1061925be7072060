/**
 * View model of the operator exposure panel: one row per candidate with operator data,
 * the figures from the ledger's candidate checks (ISO 9612 L_EX,8h, the Directive
 * 2003/10/EC value reached, the time a day until 85 dB(A) at a 3 dB exchange rate) as text.
 * Formatting only.
 */
import type { Project } from '../../ledger/model/model.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import type { ExposureBand } from '../../core/standards/directive-2003-10-ec.ts';
import { EXPOSURE_VALUES_DB } from '../../core/standards/directive-2003-10-ec.ts';
import { fixed, NOT_COMPUTED, type DecimalSeparator } from './format.ts';
import { own } from '../../ledger/model/own.ts';

export interface ExposureRowView {
  candidateId: string;
  label: string;
  duty: string;
  lpa: string;
  hours: string;
  dailyExposure: string;
  /** The value reached in words, e.g. "upper action value (85 dB(A))". */
  band: string;
  bandKind: ExposureBand | 'not-computed';
  hoursTo85: string;
  /** What to do about a missing or unreadable input, when the figures are not computed. */
  note?: string;
}

const BAND_TEXT: Record<ExposureBand, string> = {
  'below lower action value': `below the lower action value (${EXPOSURE_VALUES_DB.lowerAction} dB(A))`,
  'lower action value': `lower action value (${EXPOSURE_VALUES_DB.lowerAction} dB(A)) reached`,
  'upper action value': `upper action value (${EXPOSURE_VALUES_DB.upperAction} dB(A)) reached`,
  'limit value': `limit value (${EXPOSURE_VALUES_DB.limit} dB(A)) reached`,
};

/** Longest time a day written in hours and minutes; beyond it "more than 24 h". */
const DAY_HOURS = 24;

/**
 * A duration of the working day in hours, as hours and minutes.
 * @example formatHours(10.0794) // "10 h 05 min"
 * @example formatHours(0.125) // "8 min"
 */
export function formatHours(hours: number | undefined, decimal: DecimalSeparator = '.'): string {
  if (hours === undefined || Number.isNaN(hours)) return NOT_COMPUTED;
  if (hours > DAY_HOURS) return `more than ${DAY_HOURS} h`;
  const minutes = Math.round(hours * 60);
  if (minutes < 1) return `under 1 min (${fixed(hours * 3600, 0, decimal)} s)`;
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  if (h === 0) return `${m} min`;
  return `${h} h ${String(m).padStart(2, '0')} min`;
}

function number(value: number | undefined, decimals: number, decimal: DecimalSeparator): string {
  if (value === undefined) return '';
  return Number.isFinite(value) ? fixed(value, decimals, decimal) : NOT_COMPUTED;
}

/**
 * Rows for every candidate that gives an operator-position LpA or hours a day, highest
 * daily exposure first (not computed last). O(candidates · log candidates).
 */
export function exposureRows(
  project: Project,
  checks: Readonly<Record<string, CandidateCheck>>,
  decimal: DecimalSeparator = project.settings?.decimalSeparator ?? '.',
): ExposureRowView[] {
  const duties = new Map(project.duties.map((d) => [d.id, d.name || d.id] as const));
  const rows: (ExposureRowView & { order: number })[] = [];
  for (const c of project.candidates) {
    if (c.operatorLpaDb === undefined && c.operatorHoursPerDay === undefined) continue;
    const exposure = own(checks, c.id)?.exposure;
    const base = {
      candidateId: c.id,
      label: c.label || c.id,
      duty: duties.get(c.dutyId) ?? c.dutyId,
      lpa: number(c.operatorLpaDb, 1, decimal),
      hours: number(c.operatorHoursPerDay, 1, decimal),
    };
    if (exposure) {
      rows.push({
        ...base,
        dailyExposure: Number.isFinite(exposure.dailyExposureDb)
          ? `${fixed(exposure.dailyExposureDb, 1, decimal)} dB(A)`
          : NOT_COMPUTED,
        band: BAND_TEXT[exposure.band],
        bandKind: exposure.band,
        hoursTo85: formatHours(exposure.hoursTo85, decimal),
        order: exposure.dailyExposureDb,
      });
    } else {
      const missing =
        c.operatorLpaDb === undefined
          ? 'give the operator-position LpA'
          : c.operatorHoursPerDay === undefined
            ? 'give the hours a day'
            : 'correct the LpA or the hours (0 to 24) in the Machines tab';
      rows.push({
        ...base,
        dailyExposure: NOT_COMPUTED,
        band: NOT_COMPUTED,
        bandKind: 'not-computed',
        hoursTo85: NOT_COMPUTED,
        note: missing,
        order: -Infinity,
      });
    }
  }
  return rows.sort((a, b) => b.order - a.order).map(({ order: _order, ...row }) => row);
}
