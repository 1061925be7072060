/**
 * The sound power a candidate is rated on, and the character penalty it draws.
 *
 * ISO 4871:1996 declarations come as a single guaranteed value Ld = L + K, or as the pair
 * (L, K). The ledger ranks and optimises on the guaranteed value by default (the value the
 * Directive 2000/14/EC marking shows); a project may choose the measured L instead.
 * Without a declared value the Directive 2000/14/EC permissible level may stand in,
 * marked as a stand-in wherever it appears.
 *
 * One basis for every candidate: on the guaranteed basis each is compared on L_d = L + K, on
 * the measured basis on L. Where the basis cannot be reached from what is declared (a
 * measured L without K on the guaranteed basis; a guaranteed L_d without K, or the
 * permissible level standing in, on the measured basis) the declared value is used as it
 * is and `offBasis` says so, so the ranking row, the matrix notes, the workbook and the
 * command line can mark it: never mixed silently.
 */
import type { Candidate, ProjectSettings } from '../model/model.ts';
import { permissibleStandIn } from './permissible.ts';

export interface RatedSoundPower {
  /** LWA the predictions use, dB; NaN when nothing usable is known. */
  lwaDb: number;
  /** Which value of the declaration is used. */
  basis: 'guaranteed' | 'measured';
  /** True when no declared value exists and the permissible level stands in. */
  standIn: boolean;
  /** Words for the user, e.g. "measured L 101.0 + K 2.0 = guaranteed 103.0". */
  explanation: string;
  /**
   * Set when the project's basis cannot be reached and the declared value is used as it is:
   * what the candidate is compared on instead, in words. Absent when on the basis.
   */
  offBasis?: string;
}

/** The short mark of a candidate compared off the project's basis, the same words everywhere. */
export const OFF_BASIS_MARK = 'OFF BASIS';

/** Words for a candidate off the basis: what it declares and what it is compared on. */
function offBasisWords(basis: 'guaranteed' | 'measured', what: 'measured' | 'guaranteed' | 'permissible'): string {
  if (basis === 'guaranteed')
    return 'measured L without K: compared on L as declared, not on the project’s guaranteed basis L_d = L + K (give K to compare it on one basis)';
  if (what === 'permissible')
    return 'the permissible level (a guaranteed level) stands in: compared on it as it is, not on the project’s measured basis L';
  return 'guaranteed L_d without K: compared on L_d as declared, not on the project’s measured basis L = L_d − K (give K to compare it on one basis)';
}

/** Looks up a permissible level for a candidate (Directive 2000/14/EC), or undefined. */
export type PermissibleLookup = (candidate: Candidate) => number | undefined;

const fmt = (x: number) => x.toFixed(1);

/**
 * The LWA a candidate is rated on, following the project's level basis.
 * guaranteed: Ld as declared, or L + K for a measured pair; a measured L without K is used
 * as it is, marked off the basis.
 * measured: L as declared, or Ld − K for a guaranteed value with K; a guaranteed Ld without
 * K (or a stand-in permissible level) is used as it is, marked off the basis.
 */
export function ratedSoundPower(
  candidate: Candidate,
  settings: ProjectSettings,
  permissible: PermissibleLookup = permissibleStandIn,
): RatedSoundPower {
  const basis = settings.levelBasis;
  const declared = candidate.lwaDb;
  if (declared === undefined || declared === null) {
    const stand = permissible(candidate);
    if (stand !== undefined && Number.isFinite(stand)) {
      return {
        lwaDb: stand,
        basis,
        standIn: true,
        explanation: `no declared LWA: permissible ${fmt(stand)} dB stands in`,
        ...(basis === 'measured' ? { offBasis: offBasisWords(basis, 'permissible') } : {}),
      };
    }
    return { lwaDb: NaN, basis, standIn: false, explanation: 'no declared LWA' };
  }
  const k = candidate.uncertaintyDb;
  const hasK = k !== undefined && k !== null && Number.isFinite(k);
  if (!Number.isFinite(declared))
    return { lwaDb: NaN, basis, standIn: false, explanation: 'declared LWA is not readable' };
  if (basis === 'guaranteed') {
    if (candidate.declaration === 'guaranteed')
      return { lwaDb: declared, basis, standIn: false, explanation: `guaranteed ${fmt(declared)}` };
    if (!hasK)
      return {
        lwaDb: declared,
        basis,
        standIn: false,
        explanation: `measured ${fmt(declared)}, no K given`,
        offBasis: offBasisWords(basis, 'measured'),
      };
    return {
      lwaDb: declared + (k as number),
      basis,
      standIn: false,
      explanation: `measured ${fmt(declared)} + K ${fmt(k as number)} = ${fmt(declared + (k as number))}`,
    };
  }
  if (candidate.declaration === 'measured')
    return { lwaDb: declared, basis, standIn: false, explanation: `measured ${fmt(declared)}` };
  if (!hasK)
    return {
      lwaDb: declared,
      basis,
      standIn: false,
      explanation: `guaranteed ${fmt(declared)}, no K to remove`,
      offBasis: offBasisWords(basis, 'guaranteed'),
    };
  return {
    lwaDb: declared - (k as number),
    basis,
    standIn: false,
    explanation: `guaranteed ${fmt(declared)} − K ${fmt(k as number)} = ${fmt(declared - (k as number))}`,
  };
}

/**
 * The `lwaDb` of {@link ratedSoundPower} for a candidate with a declared LWA that is a finite number, without writing
 * its words (an evaluation of a hundred thousand candidates shows a few); undefined for any other candidate (no
 * declared value, not readable), whose rating needs the full function. The same branches, the same sums. O(1).
 */
export function declaredRatedLwaDb(candidate: Candidate, basis: ProjectSettings['levelBasis']): number | undefined {
  const declared = candidate.lwaDb;
  if (typeof declared !== 'number' || !Number.isFinite(declared)) return undefined;
  const k = candidate.uncertaintyDb;
  const hasK = k !== undefined && k !== null && Number.isFinite(k);
  if (basis === 'guaranteed')
    return candidate.declaration === 'guaranteed' || !hasK ? declared : declared + (k as number);
  return candidate.declaration === 'measured' || !hasK ? declared : declared - (k as number);
}

/**
 * Whether {@link ratedSoundPower} could mark a candidate off the basis: false for a declared, readable LWA whose
 * declaration is the project's basis or comes with a readable K (then it is on the basis, whatever the words);
 * true otherwise (the full rating tells). Lets a ranking of a hundred thousand rows rate only the few that may be
 * off. O(1).
 */
export function mayBeOffBasis(candidate: Candidate, basis: ProjectSettings['levelBasis']): boolean {
  const declared = candidate.lwaDb;
  if (typeof declared !== 'number' || !Number.isFinite(declared)) return true;
  const k = candidate.uncertaintyDb;
  if (k !== undefined && k !== null && Number.isFinite(k)) return false;
  return basis === 'guaranteed' ? candidate.declaration !== 'guaranteed' : candidate.declaration !== 'measured';
}

/** The character penalty a candidate draws at receivers, dB (0 unless tonal or impulsive). */
export function characterPenaltyDb(candidate: Candidate, settings: ProjectSettings): number {
  return candidate.character === 'none' ? 0 : settings.characterPenaltyDb;
}
