/**
 * The uncertainty model in words, for the app, the report, the workbook and the command
 * line: every spread assumed, where it comes from, which spreads are shared, and the
 * caution that goes with every probability.
 */
import type { Project } from '../model/model.ts';
import type { SpreadModel } from './spread-model.ts';

/** The caution shown beside every probability of compliance. */
export const CONFIDENCE_CAUTION =
  'These probabilities are only as good as the spreads assumed below; they are not a guarantee. A competent acoustician and the local authority decide what is acceptable.';

/** The name of the bound level, kept apart from the trade’s L_A90 (a background-level statistic). */
export const BOUND_NAME = '90 %-sure level';

const fmt = (x: number, d = 1) => x.toFixed(d);

/** One line per assumption. O(duties + paths). */
export function assumptionWords(project: Project, model: SpreadModel): string[] {
  const s = model.settings;
  const lines: string[] = [];
  lines.push(
    `Machines: each centred on its mean level (L, or the declared L_d − K), never spread on top of L_d; normal with σ = K / ${s.kPerStandardDeviation} (K ≈ ${s.kPerStandardDeviation}·σ for a one-sided 95 % declaration, ISO 4871:1996, from memory).`,
  );
  const assumed = model.duties.filter((d) => d.machine.kAssumed);
  if (assumed.length > 0)
    lines.push(
      `K assumed ${fmt(s.defaultKDb)} dB (none declared) for: ${assumed.map((d) => d.candidateLabel).join(', ')}. The levels themselves are unchanged.`,
    );
  const simple = project.propagation.method === 'simple';
  if (simple)
    lines.push(
      `Paths: simple point-source method, accuracy ±${fmt(s.simpleMethodAccuracyDb)} dB (a setting), read as ${s.accuracyPerStandardDeviation} standard deviations: σ = ${fmt(s.simpleMethodAccuracyDb / s.accuracyPerStandardDeviation, 2)} dB.`,
    );
  else {
    const unstated = model.paths.filter((p) => p.source === 'setting: Table 5 states none').length;
    lines.push(
      `Paths: ISO 9613-2:1996 Table 5 accuracy (±1 or ±3 dB by mean height and distance) read as ${s.accuracyPerStandardDeviation} standard deviations (a setting; the standard does not say).${unstated > 0 ? ` ${unstated} of ${model.paths.length} paths lie outside Table 5 (1 km or more, mean height above 30 m, screened or reflected): ±${fmt(s.unstatedAccuracyDb)} dB assumed.` : ''}`,
    );
  }
  const ranged = model.duties.filter((d) => d.onTime);
  lines.push(
    ranged.length > 0
      ? `On-time drawn uniformly between its lowest and highest for: ${ranged.map((d) => `${d.dutyName} ${fmt(d.onTime!.lowPct, 0)}–${fmt(d.onTime!.highPct, 0)} %`).join(', ')}; the other duties run at their stated on-time.`
      : 'On-time: every duty runs at its stated on-time (no ranges given).',
  );
  const placed = model.duties.filter((d) => d.position);
  lines.push(
    placed.length > 0
      ? `Position: ${placed.map((d) => d.position!.words).join('; ')} (geometric divergence only; ground, air and screening unchanged).`
      : 'Position: every duty works at its point or stated distances (no work area on the site plan).',
  );
  lines.push(
    'Shared spreads: a machine’s error is the same at every receiver, in every phase and period (all units of a duty move together); a path’s error is the same in every phase and period, and for duties at the same point; an on-time and a working position are the same everywhere. Different machines, receivers and places are independent.',
  );
  lines.push(
    'Not modelled: screening and façade terms, weather beyond the method’s own accuracy, the character penalty’s judgement.',
  );
  return lines;
}
