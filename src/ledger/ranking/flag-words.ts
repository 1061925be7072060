/**
 * The words for a ranking row's marks, written once for the app, the workbook and the command
 * line. Names of our own, plain enough to read without a glossary: a machine quieter than the
 * baseline at no extra cost, and a machine another offer beats on level and on cost.
 */
export const FLAG_WORDS = {
  /** RankingRow.freeWin: quieter than the baseline and costs no more. */
  freeWin: 'quieter, costs no more',
  /** RankingRow.dominated: another machine of the duty is at least as quiet and as cheap, and better in one. */
  dominated: 'beaten on both',
} as const;
