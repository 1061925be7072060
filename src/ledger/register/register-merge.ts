/**
 * Three-way merge of the buyer's register, cell by cell, for two tabs (or an undo) changing
 * it: the same rules as a project's (ledger/file/project-merge.ts), with `machines` as its
 * one list of rows, matched by id. A cell changed on one side only takes that side's value;
 * a cell both changed is settled by `prefer` and listed.
 */
import { mergeDocuments, type MergeConflict } from '../file/project-merge.ts';
import type { Register } from './model.ts';

const LISTS = ['machines'] as const;

/** Merges `mine` and `theirs`, both made from `base`. */
export function mergeRegisters(
  base: Register,
  mine: Register,
  theirs: Register,
  prefer: 'mine' | 'theirs',
): { value: Register; conflicts: MergeConflict<'machines'>[] } {
  return mergeDocuments(base, mine, theirs, LISTS, prefer);
}
