/**
 * View model of a duty's ranking at one receiver: the text of every column and the flags
 * as words, read from the ledger's RankingRow[]. Formatting only.
 */
import { REFERENCE_RECEIVER_ID, type Project } from '../../ledger/model.ts';
import type { DutyCost, RankingRow } from '../../ledger/results.ts';
import { formatCostPerDb, formatDbPer1000, formatLevel, formatMoney, formatSignedDb, formatSignedMoney, type DecimalSeparator } from './format.ts';

export type FlagKind = 'baseline' | 'free-win' | 'dominated' | 'over-limit' | 'pinned' | 'excluded' | 'stand-in';

export interface Flag {
  kind: FlagKind;
  label: string;
  /** What the flag means, for the tooltip and screen readers. */
  meaning: string;
}

export interface RankingRowView {
  candidateId: string;
  rank: string;
  label: string;
  detail: string;
  contribution: string;
  phaseTotal: string;
  reduction: string;
  cost: string;
  extraCost: string;
  dbPer1000: string;
  costPerDb: string;
  flags: Flag[];
  pinned: boolean;
  excluded: boolean;
}

const FLAG_TEXT: Record<FlagKind, { label: string; meaning: string }> = {
  baseline: { label: 'baseline', meaning: 'the machine that would be used anyway; reductions and extra costs are measured from it' },
  'free-win': { label: 'free win', meaning: 'quieter than the baseline and no dearer' },
  dominated: { label: 'dominated', meaning: 'another machine is at least as quiet and at least as cheap, and better in one' },
  'over-limit': { label: 'over limit', meaning: 'with this machine the phase total is above the receiver’s limit' },
  pinned: { label: 'pinned', meaning: 'the optimiser must choose this machine' },
  excluded: { label: 'excluded', meaning: 'the optimiser must not choose this machine' },
  'stand-in': { label: 'stand-in LWA', meaning: 'no declared sound power: the permissible level stands in' },
};

function flag(kind: FlagKind): Flag {
  return { kind, ...FLAG_TEXT[kind] };
}

/** Name of the receiver a ranking is for, including the reference position. */
export function receiverName(project: Project, receiverId: string): string {
  if (receiverId === REFERENCE_RECEIVER_ID) {
    const d = project.settings?.referenceDistanceM;
    return Number.isFinite(d) ? `reference position at ${d} m` : 'reference position';
  }
  const r = project.receivers.find((x) => x.id === receiverId);
  return r ? r.name || r.id : receiverId;
}

/** Rows of the ranking table in the ledger's order. O(rows). */
export function rankingRows(
  project: Project,
  rows: readonly RankingRow[],
  costs: Readonly<Record<string, DutyCost>> | undefined,
  locale?: string,
  decimal: DecimalSeparator = project.settings?.decimalSeparator ?? '.',
): RankingRowView[] {
  const candidates = new Map(project.candidates.map((c) => [c.id, c]));
  return rows.map((row) => {
    const c = candidates.get(row.candidateId);
    const flags: Flag[] = [];
    if (row.isBaseline) flags.push(flag('baseline'));
    if (row.freeWin) flags.push(flag('free-win'));
    if (row.dominated) flags.push(flag('dominated'));
    if (row.overLimit) flags.push(flag('over-limit'));
    if (c?.pinned) flags.push(flag('pinned'));
    if (c?.excluded) flags.push(flag('excluded'));
    if (c?.lwaOrigin === 'permissible-stand-in') flags.push(flag('stand-in'));
    const total = costs?.[row.candidateId]?.total;
    return {
      candidateId: row.candidateId,
      rank: Number.isFinite(row.rank) ? String(row.rank) : '—',
      label: c?.label || row.candidateId,
      detail: c ? [c.category, Number.isFinite(c.lwaDb) ? `LWA ${formatLevel(c.lwaDb, decimal)}` : ''].filter(Boolean).join(' · ') : '',
      contribution: formatLevel(row.contributionDb, decimal),
      phaseTotal: formatLevel(row.phaseTotalDb, decimal),
      reduction: formatSignedDb(row.reductionDb, decimal),
      cost: total === undefined ? '' : formatMoney(total, project.currency, locale),
      extraCost: formatSignedMoney(row.extraCost, project.currency, locale),
      dbPer1000: formatDbPer1000(row.dbPer1000, decimal),
      costPerDb: formatCostPerDb(row.costPerDb, project.currency, locale),
      flags,
      pinned: !!c?.pinned,
      excluded: !!c?.excluded,
    };
  });
}
