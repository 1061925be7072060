/**
 * Words for the printed report: the method with its edition and every setting it uses,
 * and a one-line summary of the matrix. Formatting only.
 */
import type { Project, Propagation } from '../../ledger/model/model.ts';
import type { MatrixCell } from '../../ledger/model/results.ts';
import { ISO_ASSEMBLY } from '../../core/iso9613-machine-terms.ts';
import { BARRIER_RULE_WORDS } from '../../ledger/prediction/barrier-screening.ts';

/** The propagation method in words, with its edition, e.g. "ISO 9613-2:1996 outdoor propagation …". */
export function methodTitle(propagation: Propagation): string {
  if (propagation.method === 'simple')
    return 'Point source with directivity (common practice): Lp = LWA + 10·lg(Q/(4πr²))';
  return 'ISO 9613-2:1996 Attenuation of sound during propagation outdoors — Part 2: General method of calculation';
}

/** Every setting the method and the ledger use, as label/value pairs. */
export function methodSettings(project: Project): { label: string; value: string }[] {
  const p = project.propagation;
  const rows: { label: string; value: string }[] = [];
  if (p.method === 'simple') {
    rows.push({
      label: 'Directivity Q',
      value: `${p.q} (${({ 1: 'free field', 2: 'on hard ground', 4: 'ground and one wall', 8: 'corner' } as const)[p.q] ?? ''})`,
    });
  } else {
    rows.push(
      {
        label: 'Ground',
        value: `G = ${p.groundFactor}, ${p.groundMethod === 'general' ? 'general method (clause 7.3.1): octave bands where known, else its terms at 500 Hz' : 'alternative method (clause 7.3.2, eq. 10 with D_Ω)'}`,
      },
      { label: 'Assembly', value: ISO_ASSEMBLY },
      {
        label: 'Atmosphere',
        value: `${p.temperatureC} °C, ${p.humidityPct} % relative humidity, ${p.pressureKPa} kPa (absorption ISO 9613-1:1993)`,
      },
      { label: 'Source height', value: `${p.sourceHeightM} m unless a duty states its own` },
      {
        label: 'C_met',
        value: `C0 = ${p.c0Db} dB; per path 0 for d_p ≤ 10(h_s + h_r), else C0·[1 − 10(h_s + h_r)/d_p] (eqs 21, 22)`,
      },
    );
  }
  const s = project.settings;
  rows.push(
    {
      label: 'Sound power basis',
      value:
        s.levelBasis === 'guaranteed'
          ? 'guaranteed value L + K (ISO 4871), as marked under Directive 2000/14/EC'
          : 'measured value L (ISO 4871), uncertainty K not added',
    },
    {
      label: 'Character penalty',
      value: `${s.characterPenaltyDb} dB for tonal or impulsive machines; where it applies the level compared with the limit is the rating level LAr,T (ISO 1996-1), LAeq,T plus the penalty, and LAeq,T is shown beside it`,
    },
    {
      label: 'Corrections',
      value:
        p.method === 'simple'
          ? 'on-time 10·lg(η), units 10·lg n, working hours in each period 10·lg(T_work/T) (a phase is assessed in its own period and in every other period its working hours run into), façade +3 dB, screening −5 / −10 dB or as stated'
          : 'on-time 10·lg(η), units 10·lg n, working hours in each period 10·lg(T_work/T) (a phase is assessed in its own period and in every other period its working hours run into), façade +3 dB; screening (5 / 10 dB or as stated, or a barrier) is D_z in A_bar = D_z − A_gr (eq. 12)',
    },
  );
  if ((project.barriers ?? []).length > 0) rows.push({ label: 'Barriers on the plan', value: BARRIER_RULE_WORDS });
  return rows;
}

/** One sentence on the matrix: how many cells are over their limit, or that none is. */
export function matrixSummary(matrix: readonly MatrixCell[]): string {
  const assessed = matrix.filter((c) => c.limitDb !== undefined);
  const over = assessed.filter((c) => c.over).length;
  const unknown = matrix.filter((c) => Number.isNaN(c.levelDb)).length;
  const parts: string[] = [];
  if (assessed.length === 0) parts.push('No receiver has a limit for these periods.');
  else if (over === 0) parts.push(`All ${assessed.length} assessed cells are at or under their limit.`);
  else parts.push(`${over} of ${assessed.length} assessed cells are over their limit.`);
  if (unknown)
    parts.push(
      `${unknown} ${unknown === 1 ? 'cell is' : 'cells are'} not computed because an input is missing or unreadable.`,
    );
  return parts.join(' ');
}
