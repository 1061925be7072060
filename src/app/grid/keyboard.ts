/**
 * Key presses to grid commands: a pure table, so the bindings can be read
 * and tested in one place. Ctrl and Cmd (meta) are treated alike.
 *
 * Navigating: arrows, Tab/Shift+Tab, Home/End (row), Ctrl+Home/End (grid),
 * PageUp/PageDown; Shift extends the selection.
 * Editing: Enter or F2 edits, a printable character starts editing and
 * replaces the content, Delete/Backspace clears, Ctrl+D fills down.
 * Ctrl+Z undoes, Ctrl+Shift+Z and Ctrl+Y redo, Ctrl+Delete deletes the
 * selected rows, Alt+↓ (or Shift+F10, the menu key) opens the column menu,
 * Alt+←/→ on the header row narrows or widens the column.
 * Ctrl+C and Ctrl+V are handled through the copy and paste events.
 */

/** The parts of a KeyboardEvent the mapping reads. */
export interface KeyInput {
  key: string;
  shiftKey?: boolean;
  ctrlKey?: boolean;
  metaKey?: boolean;
  altKey?: boolean;
  /** True while an input method composes text. */
  isComposing?: boolean;
}

/** Edges reached by Home/End and Ctrl+arrows: row start/end, first/last row of the column, grid corners. */
export type MoveTarget = 'rowStart' | 'rowEnd' | 'colStart' | 'colEnd' | 'gridStart' | 'gridEnd';

/** What the grid does in response to a key. */
export type GridCommand =
  | { type: 'move'; rows: number; cols: number; extend: boolean }
  | { type: 'moveTo'; target: MoveTarget; extend: boolean }
  | { type: 'page'; direction: 1 | -1; extend: boolean }
  | { type: 'tab'; backwards: boolean }
  | { type: 'edit' }
  | { type: 'type'; text: string }
  | { type: 'clear' }
  | { type: 'fillDown' }
  | { type: 'undo' }
  | { type: 'redo' }
  | { type: 'deleteRows' }
  | { type: 'copy' }
  | { type: 'selectAll' }
  | { type: 'openMenu' }
  | { type: 'resize'; delta: number }
  | { type: 'escape' };

/** What the editor does in response to a key while a cell is being edited. */
export type EditorCommand = { type: 'commit'; rows: number; cols: number } | { type: 'cancel' };

/** Pixels a column grows or shrinks per Alt+arrow press. */
export const RESIZE_STEP_PX = 16;

const ARROWS: Record<string, [number, number]> = {
  ArrowUp: [-1, 0],
  ArrowDown: [1, 0],
  ArrowLeft: [0, -1],
  ArrowRight: [0, 1],
};

/**
 * Maps a key press on the grid (not editing) to a command, or null when the
 * grid should leave the key alone.
 * @example commandForKey({ key: 'ArrowDown', shiftKey: true }) // → { type: 'move', rows: 1, cols: 0, extend: true }
 * @example commandForKey({ key: 'z', ctrlKey: true, shiftKey: true }) // → { type: 'redo' }
 */
export function commandForKey(input: KeyInput): GridCommand | null {
  if (input.isComposing) return null;
  const mod = Boolean(input.ctrlKey || input.metaKey);
  const shift = Boolean(input.shiftKey);
  const alt = Boolean(input.altKey);
  const key = input.key;
  const arrow = ARROWS[key];

  if (alt && !mod) {
    if (key === 'ArrowDown') return { type: 'openMenu' };
    if (key === 'ArrowLeft') return { type: 'resize', delta: -RESIZE_STEP_PX };
    if (key === 'ArrowRight') return { type: 'resize', delta: RESIZE_STEP_PX };
    return null;
  }
  if (mod) {
    const letter = key.length === 1 ? key.toLowerCase() : key;
    if (letter === 'z') return shift ? { type: 'redo' } : { type: 'undo' };
    if (letter === 'y') return { type: 'redo' };
    if (letter === 'd') return { type: 'fillDown' };
    if (letter === 'c') return { type: 'copy' };
    if (letter === 'a') return { type: 'selectAll' };
    if (key === 'Delete' || key === 'Backspace') return { type: 'deleteRows' };
    if (key === 'Home') return { type: 'moveTo', target: 'gridStart', extend: shift };
    if (key === 'End') return { type: 'moveTo', target: 'gridEnd', extend: shift };
    if (arrow) {
      // Ctrl+arrow jumps to the edge of the data, as in most grids
      if (arrow[0] !== 0) return { type: 'moveTo', target: arrow[0] < 0 ? 'colStart' : 'colEnd', extend: shift };
      return { type: 'moveTo', target: arrow[1] < 0 ? 'rowStart' : 'rowEnd', extend: shift };
    }
    return null;
  }
  if (arrow) return { type: 'move', rows: arrow[0], cols: arrow[1], extend: shift };
  switch (key) {
    case 'Tab':
      return { type: 'tab', backwards: shift };
    case 'Home':
      return { type: 'moveTo', target: 'rowStart', extend: shift };
    case 'End':
      return { type: 'moveTo', target: 'rowEnd', extend: shift };
    case 'PageDown':
      return { type: 'page', direction: 1, extend: shift };
    case 'PageUp':
      return { type: 'page', direction: -1, extend: shift };
    case 'Enter':
    case 'F2':
      return { type: 'edit' };
    case 'Delete':
    case 'Backspace':
      return { type: 'clear' };
    case 'Escape':
      return { type: 'escape' };
    case 'ContextMenu':
      return { type: 'openMenu' };
    case 'F10':
      return shift ? { type: 'openMenu' } : null;
  }
  if ([...key].length === 1) return { type: 'type', text: key };
  return null;
}

/**
 * Maps a key press inside the cell editor: Enter commits and moves down
 * (Shift+Enter up), Tab commits and moves right (Shift+Tab left), Escape
 * cancels. Other keys belong to the text box.
 * @example editorCommandForKey({ key: 'Enter' }) // → { type: 'commit', rows: 1, cols: 0 }
 */
export function editorCommandForKey(input: KeyInput): EditorCommand | null {
  if (input.isComposing) return null;
  if (input.key === 'Escape') return { type: 'cancel' };
  if (input.ctrlKey || input.metaKey || input.altKey) return null;
  if (input.key === 'Enter') return { type: 'commit', rows: input.shiftKey ? -1 : 1, cols: 0 };
  if (input.key === 'Tab') return { type: 'commit', rows: 0, cols: input.shiftKey ? -1 : 1 };
  return null;
}
