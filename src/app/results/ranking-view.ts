/**
 * View model of a duty's ranking at one receiver: the text of every column and the flags
 * as words, read from the ledger's RankingRow[]. Formatting only.
 */
import { REFERENCE_RECEIVER_ID, type Candidate, type Project } from '../../ledger/model/model.ts';
import type { DutyCost, RankingRow } from '../../ledger/model/results.ts';
import type { CandidateCheck } from '../../ledger/checks/candidate-checks.ts';
import type { PlaceRange } from '../../ledger/ranking/ranking-uncertainty.ts';
import {
  formatCostPerDb,
  formatDbPer1000,
  formatLevel,
  formatMoney,
  formatReductionDb,
  formatSignedDb,
  formatSignedMoney,
  type DecimalSeparator,
} from './format.ts';
import { own } from '../../ledger/model/own.ts';
import { RESULT_TERMS } from '../text/result-terms.ts';

export type FlagKind =
  | 'baseline'
  | 'free-win'
  | 'dominated'
  | 'over-limit'
  | 'over-permissible'
  | 'pinned'
  | 'excluded'
  | 'stand-in'
  | 'off-basis';

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
  /** Places the row could take within ±K, e.g. "1–3"; the rank alone when it cannot move; empty when not worked out. */
  place: string;
  /** The place could change within ±K. */
  placeMoves: boolean;
  flags: Flag[];
  pinned: boolean;
  excluded: boolean;
}

const FLAG_TEXT: Record<FlagKind, { label: string; meaning: string }> = {
  baseline: {
    label: 'baseline',
    meaning: 'the machine that would be used anyway; reductions and extra costs are measured from it',
  },
  'free-win': { label: RESULT_TERMS.quieterNoDearer.label, meaning: RESULT_TERMS.quieterNoDearer.hint },
  dominated: { label: RESULT_TERMS.beatenOnBoth.label, meaning: RESULT_TERMS.beatenOnBoth.hint },
  'over-limit': { label: 'over limit', meaning: 'with this machine the phase total is above the receiver’s limit' },
  'over-permissible': {
    label: 'over permissible',
    meaning: 'the declared guaranteed level is above the Directive 2000/14/EC permissible level (Stage II)',
  },
  pinned: { label: 'pinned', meaning: 'the optimiser must choose this machine' },
  excluded: { label: 'excluded', meaning: 'the optimiser must not choose this machine' },
  'stand-in': {
    label: 'stand-in LWA',
    meaning: 'no declared sound power: the Directive 2000/14/EC permissible level stands in, conservatively',
  },
  'off-basis': {
    label: 'off basis',
    meaning: 'no K given: compared on its declared value, not on the project’s level basis (ISO 4871:1996)',
  },
};

function flag(kind: FlagKind): Flag {
  return { kind, ...FLAG_TEXT[kind] };
}

/** Name of the receiver a ranking is for, including the reference receiver. */
export function receiverName(project: Project, receiverId: string): string {
  if (receiverId === REFERENCE_RECEIVER_ID) {
    const d = project.settings?.referenceDistanceM;
    return Number.isFinite(d) ? `the reference receiver at ${d} m` : 'the reference receiver';
  }
  const r = project.receivers.find((x) => x.id === receiverId);
  return r ? r.name || r.id : receiverId;
}

/** What the ledger found besides the ranking: each candidate's checks, and the places each row could take within ±K. */
export interface RankingExtras {
  /** A candidate's checks (only the ranked duty's machines are asked, not every machine's). */
  checkOf?: (candidate: Candidate) => CandidateCheck | undefined;
  /** A candidate by id, when the caller keeps a look-up (else one is made from the project's machines). */
  candidateOf?: (candidateId: string) => Candidate | undefined;
  places?: readonly PlaceRange[];
}

/** "LWA 101.0 dB (stand-in)" · "impulsive: +3 dB penalty": the rated level and penalty words of a row's detail line. */
function ratingWords(check: CandidateCheck | undefined, character: string, decimal: DecimalSeparator): string[] {
  if (!check) return [];
  const words: string[] = [];
  if (Number.isFinite(check.ratedLwaDb))
    words.push(`LWA ${formatLevel(check.ratedLwaDb, decimal)}${check.standIn ? ' (stand-in)' : ''}`);
  if (check.penaltyDb > 0) words.push(`${character}: ${formatSignedDb(check.penaltyDb, decimal)} penalty`);
  return words;
}

/**
 * A look-up of machines by id made from a list, for a caller that keeps none. O(machines) once.
 * @example machineLookup(project.candidates)('dig-13t') // the 13 t excavator
 */
export function machineLookup(candidates: readonly Candidate[]): (candidateId: string) => Candidate | undefined {
  const byId = new Map(candidates.map((c) => [c.id, c] as const));
  return (candidateId) => byId.get(candidateId);
}

/** Rows of the ranking table in the ledger's order. O(rows). */
export function rankingRows(
  project: Project,
  rows: readonly RankingRow[],
  costs: Readonly<Record<string, DutyCost>> | undefined,
  locale?: string,
  decimal: DecimalSeparator = project.settings?.decimalSeparator ?? '.',
  extras: RankingExtras = {},
): RankingRowView[] {
  const candidateOf = extras.candidateOf ?? machineLookup(project.candidates);
  const places = new Map((extras.places ?? []).map((p) => [p.candidateId, p] as const));
  return rows.map((row) => {
    const c = candidateOf(row.candidateId);
    const check = c ? extras.checkOf?.(c) : undefined;
    const place = places.get(row.candidateId);
    const flags: Flag[] = [];
    if (row.isBaseline) flags.push(flag('baseline'));
    if (row.freeWin) flags.push(flag('free-win'));
    if (row.dominated) flags.push(flag('dominated'));
    if (row.overLimit) flags.push(flag('over-limit'));
    if (check?.overPermissible) flags.push(flag('over-permissible'));
    if (c?.pinned) flags.push(flag('pinned'));
    if (c?.excluded) flags.push(flag('excluded'));
    if (check?.standIn) flags.push(flag('stand-in'));
    if (row.offBasis) flags.push({ ...flag('off-basis'), meaning: row.offBasis });
    const total = own(costs, row.candidateId)?.total;
    return {
      candidateId: row.candidateId,
      rank: Number.isFinite(row.rank) ? String(row.rank) : '—',
      label: c?.label || row.candidateId,
      detail: c
        ? [
            c.category,
            ...(check
              ? ratingWords(check, c.character, decimal)
              : [Number.isFinite(c.lwaDb) ? `LWA ${formatLevel(c.lwaDb, decimal)}` : '']),
          ]
            .filter(Boolean)
            .join(' · ')
        : '',
      contribution: formatLevel(row.contributionDb, decimal),
      phaseTotal: formatLevel(row.phaseTotalDb, decimal),
      reduction: formatReductionDb(row.reductionDb, decimal),
      cost: total === undefined ? '' : formatMoney(total, project.currency, locale),
      extraCost: formatSignedMoney(row.extraCost, project.currency, locale),
      dbPer1000: formatDbPer1000(row.dbPer1000, decimal),
      costPerDb: formatCostPerDb(row.costPerDb, project.currency, locale),
      place: place
        ? place.bestPlace === place.worstPlace
          ? String(place.bestPlace)
          : `${place.bestPlace}–${place.worstPlace}`
        : '',
      placeMoves: place !== undefined && place.bestPlace !== place.worstPlace,
      flags,
      pinned: !!c?.pinned,
      excluded: !!c?.excluded,
    };
  });
}
