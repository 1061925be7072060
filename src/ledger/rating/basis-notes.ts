/**
 * One note per project naming the candidates compared off the project's level basis
 * (ISO 4871:1996: guaranteed L_d = L + K, or measured L), for the matrix, the report, the
 * workbook's assumptions and `ledger evaluate`: a basis that cannot be reached from what is
 * declared is used as declared and said, never mixed silently. O(candidates).
 */
import type { Project } from '../model/model.ts';
import type { DataProblem } from '../model/results.ts';
import { ratedLevel } from './rated-level.ts';
import { mayBeOffBasis, OFF_BASIS_MARK } from './rating.ts';

/** Candidates named in the note before "and N more". */
const NAMED = 6;

/**
 * The note, or none when every candidate with a usable level is on the basis. Never throws.
 * @example basisNotes(p)[0].message // "OFF BASIS: the project compares machines on the guaranteed value L_d = L + K (ISO 4871:1996), but 1 of 5 machines cannot be put on it and are compared as declared: A quiet (measured L without K) …"
 */
export function basisNotes(project: Project): DataProblem[] {
  const candidates = Array.isArray(project.candidates) ? project.candidates : [];
  const settings = project.settings;
  if (!settings || (settings.levelBasis !== 'guaranteed' && settings.levelBasis !== 'measured')) return [];
  const off: string[] = [];
  for (const c of candidates) {
    let why: string | undefined;
    try {
      // Only a candidate that may be off the basis is rated (a rating writes its words: 100,000 candidates is costly).
      why = mayBeOffBasis(c, settings.levelBasis) ? ratedLevel(c, settings).offBasis : undefined;
    } catch {
      why = undefined;
    }
    if (why) off.push(`${c.label || c.id} (${why.split(':')[0]})`);
  }
  if (off.length === 0) return [];
  const basis =
    settings.levelBasis === 'guaranteed'
      ? 'the guaranteed value L_d = L + K (ISO 4871:1996)'
      : 'the measured value L (ISO 4871:1996)';
  const listed = off.slice(0, NAMED).join('; ') + (off.length > NAMED ? `; and ${off.length - NAMED} more` : '');
  return [
    {
      path: '$.candidates',
      message: `${OFF_BASIS_MARK}: the project compares machines on ${basis}, but ${off.length} of ${candidates.length} ${candidates.length === 1 ? 'machine' : 'machines'} cannot be put on it (no K given) and ${off.length === 1 ? 'is' : 'are'} compared on what is declared, marked in the rankings: ${listed}. Give K to compare every machine on one basis.`,
    },
  ];
}
