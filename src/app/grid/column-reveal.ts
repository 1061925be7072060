/**
 * Bringing the active cell's column into view sideways. The row is scrolled to by the row
 * virtualiser; the column is judged from the column widths and the viewport's last scroll
 * position, so that moving the active cell reads no layout, and the browser is asked to
 * scroll (which lays the page out at once, a few ms with thousands of rows) only when the
 * column is not already wholly in view.
 */
import type { ColumnEntry } from './keep-same.ts';

/** Room a vertical scroll bar may take, CSS pixels. */
const SCROLLBAR_ALLOWANCE_PX = 20;

export interface RevealEnv {
  viewport(): HTMLElement | undefined;
  /** The visible columns with their widths, in display order (the first one frozen). */
  visible(): readonly ColumnEntry<unknown>[];
  /** Width of the viewport as last observed, CSS pixels (0 before it is known). */
  viewWidth(): number;
  /** The element id of a cell. */
  cellId(row: number, col: number): string;
}

export class ColumnReveal {
  #env: RevealEnv;
  /** Horizontal scroll of the viewport as last scrolled, kept so that revealing a cell reads no layout. */
  #scrollLeftPx = 0;

  constructor(env: RevealEnv) {
    this.#env = env;
  }

  /** Call from the viewport's scroll event. */
  scrolled(scrollLeftPx: number): void {
    this.#scrollLeftPx = scrollLeftPx;
  }

  /**
   * Scrolls sideways just enough to show column `col` of display row `row`. The first column is
   * frozen, so always in view, but the group titles and the columns beside it are not: going to
   * it (Home, Ctrl+Home, Ctrl+←) returns to the left edge.
   */
  reveal(row: number, col: number): void {
    if (col <= 0) {
      const viewport = this.#env.viewport();
      if (this.#scrollLeftPx > 0 && viewport) viewport.scrollLeft = 0;
      return;
    }
    if (this.inView(col)) return;
    queueMicrotask(() =>
      document.getElementById(this.#env.cellId(row, col))?.scrollIntoView?.({ block: 'nearest', inline: 'nearest' }),
    );
  }

  /** Whether column `col` lies wholly in view beside the frozen first column, from the widths alone. */
  inView(col: number): boolean {
    if (col <= 0) return true;
    const visible = this.#env.visible();
    const viewWidth = this.#env.viewWidth() - SCROLLBAR_ALLOWANCE_PX;
    if (viewWidth <= 0 || col >= visible.length) return false;
    let left = 0;
    for (let i = 0; i < col; i++) left += visible[i]!.width;
    const right = left + visible[col]!.width;
    return left >= this.#scrollLeftPx + visible[0]!.width && right <= this.#scrollLeftPx + viewWidth;
  }
}
