/**
 * DOM event wiring for the grid: clipboard events (listened for on the
 * document, because a focused non-editable element does not always receive
 * them), pointer selection with drag and double-click, and editor keys.
 */
import type { CellPos } from './types.ts';
import { editorCommandForKey } from './keyboard.ts';
import type { GridActions } from './grid-actions.ts';

/** The three owner-facing actions the event handlers call. */
type Actions = Pick<GridActions<object>, 'copyText' | 'pasteText' | 'goTo' | 'beginEdit' | 'commitEdit' | 'cancelEdit'>;

/**
 * Copy writes the selection as tab-separated text; paste reads tab-separated
 * text. `owns` says whether the event belongs to this grid. Returns the clean-up.
 */
export function listenClipboard(owns: (event: Event) => boolean, actions: Actions): () => void {
  const onCopy = (event: ClipboardEvent) => {
    if (!owns(event)) return;
    const text = actions.copyText();
    if (text === null || !event.clipboardData) return;
    event.clipboardData.setData('text/plain', text);
    event.preventDefault();
  };
  const onPaste = (event: ClipboardEvent) => {
    if (!owns(event)) return;
    event.preventDefault();
    actions.pasteText(event.clipboardData?.getData('text/plain') ?? '');
  };
  document.addEventListener('copy', onCopy);
  document.addEventListener('paste', onPaste);
  return () => {
    document.removeEventListener('copy', onCopy);
    document.removeEventListener('paste', onPaste);
  };
}

/** Also puts the selection on the system clipboard where the browser allows it (Ctrl+C). */
export function writeClipboard(actions: Actions): void {
  const text = actions.copyText();
  if (text !== null) navigator.clipboard?.writeText(text).catch(() => undefined);
}

/** Keys inside the cell editor: Enter/Tab commit and move, Escape cancels. */
export function handleEditorKey(event: KeyboardEvent, actions: Actions): void {
  event.stopPropagation();
  const command = editorCommandForKey(event);
  if (!command) return;
  event.preventDefault();
  if (command.type === 'cancel') actions.cancelEdit();
  else actions.commitEdit(command.rows, command.cols);
}

function cellAt(target: EventTarget | null): CellPos | null {
  if (!(target instanceof Element)) return null;
  const cell = target.closest('[data-row]');
  if (!cell || target.closest('button, input, select')) return null;
  return { row: Number(cell.getAttribute('data-row')), col: Number(cell.getAttribute('data-col')) };
}

/** Click selects a cell, Shift+click or a drag selects a range, double-click edits. */
export class PointerSelection {
  #dragging = false;
  #actions: Actions;
  #isEditing: () => boolean;
  #focus: () => void;

  constructor(actions: Actions, isEditing: () => boolean, focus: () => void) {
    this.#actions = actions;
    this.#isEditing = isEditing;
    this.#focus = focus;
  }

  down = (event: PointerEvent): void => {
    const pos = cellAt(event.target);
    if (!pos || event.button !== 0) return;
    if (this.#isEditing()) this.#actions.commitEdit(0, 0);
    this.#actions.goTo(pos, event.shiftKey);
    this.#dragging = pos.row >= 0;
    this.#focus();
    event.preventDefault();
  };

  over = (event: PointerEvent): void => {
    if (!this.#dragging || event.buttons !== 1) return;
    const pos = cellAt(event.target);
    if (pos && pos.row >= 0) this.#actions.goTo(pos, true);
  };

  up = (): void => {
    this.#dragging = false;
  };

  dblclick = (event: MouseEvent): void => {
    const pos = cellAt(event.target);
    if (pos && pos.row >= 0) this.#actions.beginEdit();
  };
}
