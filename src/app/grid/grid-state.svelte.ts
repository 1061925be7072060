/**
 * The grid's interaction state: active cell, selected range, the cell being
 * edited, the open column menu and the status message read to screen
 * readers. Pure position and planning logic lives in selection.ts,
 * paste.ts, fill.ts, clear.ts and edit-session.ts; this class only holds
 * the current values as runes; display lookups are in display-lookup.ts.
 */
import type { CellPos, CellRange } from './types.ts';
import type { GridBounds } from './selection.ts';
import { clampPos, rangeOf } from './selection.ts';
import type { EditSession } from './edit-session.ts';

export class GridState {
  active = $state<CellPos>({ row: 0, col: 0 });
  anchor = $state<CellPos>({ row: 0, col: 0 });
  edit = $state.raw<EditSession | null>(null);
  /** Column whose menu is open, or null. */
  menuColumn = $state<string | null>(null);
  /** Last message for the live region. */
  status = $state('');
  /** Whether keyboard focus is inside the grid (shows the strong focus ring). */
  focused = $state(false);

  /** The selected rectangle (header row never included). */
  range = $derived<CellRange>(rangeOf(this.anchor, this.active));

  /** Moves the active cell; keeps the anchor when extending a range. */
  select(pos: CellPos, extend: boolean, bounds: GridBounds): void {
    const next = clampPos(pos, bounds);
    this.active = next;
    if (!extend || next.row < 0) this.anchor = next;
  }

  /** Selects a whole rectangle, anchor at its top-left. */
  selectRange(range: CellRange): void {
    this.anchor = { row: range.top, col: range.left };
    this.active = { row: range.bottom, col: range.right };
  }

  /** Keeps the selection inside the grid after the body or the columns changed. */
  clampTo(bounds: GridBounds): void {
    const active = clampPos(this.active, bounds);
    const anchor = clampPos(this.anchor, bounds);
    if (active.row !== this.active.row || active.col !== this.active.col) this.active = active;
    if (anchor.row !== this.anchor.row || anchor.col !== this.anchor.col) this.anchor = anchor;
  }

  announce(message: string): void {
    // a repeated message must still be read, so clear first when equal
    this.status = this.status === message ? `${message} ` : message;
  }
}
