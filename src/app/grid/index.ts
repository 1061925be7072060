/**
 * The spreadsheet-style grid: the component, its column type and the pure
 * helpers it is built from (usable and testable on their own).
 */
export { default as Grid } from './Grid.svelte';
export { default } from './Grid.svelte';
export type {
  CellPos,
  CellRange,
  DisplayRow,
  GridChange,
  GridColumn,
  GridColumnKind,
  GridGrouping,
  RowMarks,
} from './types.ts';
export {
  clampPos,
  clampRange,
  inRange,
  isMultiCell,
  moveBy,
  moveTo,
  rangeCellCount,
  rangeOf,
  tabFrom,
} from './selection.ts';
export type { GridBounds } from './selection.ts';
export { parseTsv, readBlock, serializeTsv } from './clipboard.ts';
export { commandForKey, editorCommandForKey, RESIZE_STEP_PX } from './keyboard.ts';
export type { EditorCommand, GridCommand, KeyInput, MoveTarget } from './keyboard.ts';
export { planPaste } from './paste.ts';
export type { EditTarget, PasteTarget } from './paste.ts';
export { planFillDown } from './fill.ts';
export { planClear } from './clear.ts';
export { choiceValue, commitEdit, refusalMessage, startEdit, updateEdit } from './edit-session.ts';
export type { EditSession } from './edit-session.ts';
export { cellProblem, cellText, rowProblems } from './cell-text.ts';
export type { FlaggedFn, ProblemFn, RawTextFn } from './cell-text.ts';
export { compareValues, sortableValue } from './compare.ts';
export { markBadges } from './marks.ts';
export { GridModel, GROUP_COLUMN_ID } from './table-model.ts';
export type { DisplayView, SortDirection } from './table-model.ts';
