/**
 * Row virtualisation with @tanstack/virtual-core: only the rows in view
 * (plus a few above and below) are in the DOM, so thousands of rows render
 * as a few dozen elements. Rows have one fixed height.
 */
import { Virtualizer, elementScroll, observeElementOffset, observeElementRect } from '@tanstack/virtual-core';
import type { VirtualItem, VirtualizerOptions } from '@tanstack/virtual-core';

/** Rows rendered beyond each edge of the viewport. */
export const OVERSCAN_ROWS = 8;

export class VirtualRows {
  /** Rows to render now: index into the display list and offset from the top of the body. */
  items = $state.raw<VirtualItem[]>([]);
  /** Height of the whole body in CSS pixels. */
  totalSize = $state(0);
  readonly rowHeight: number;
  #virtualizer: Virtualizer<HTMLElement, HTMLElement>;
  #options: VirtualizerOptions<HTMLElement, HTMLElement>;

  /**
   * @param scrollElement the scrolling viewport
   * @param rowHeight height of one row in CSS pixels
   * @param headerHeight height of the sticky header inside the viewport, in CSS pixels
   */
  constructor(
    scrollElement: () => HTMLElement | null,
    rowHeight: number,
    headerHeight: number,
    getKey: (index: number) => string,
  ) {
    this.rowHeight = rowHeight;
    this.#options = {
      count: 0,
      getScrollElement: scrollElement,
      estimateSize: () => rowHeight,
      getItemKey: getKey,
      overscan: OVERSCAN_ROWS,
      scrollMargin: headerHeight,
      scrollPaddingStart: headerHeight,
      observeElementRect,
      observeElementOffset,
      scrollToFn: elementScroll,
      onChange: () => this.#pull(),
    };
    this.#virtualizer = new Virtualizer(this.#options);
  }

  #pull(): void {
    this.items = this.#virtualizer.getVirtualItems();
    this.totalSize = this.#virtualizer.getTotalSize();
  }

  /** Starts observing the viewport; returns the clean-up. */
  mount(): () => void {
    const cleanup = this.#virtualizer._didMount();
    this.#virtualizer._willUpdate();
    this.#pull();
    return cleanup;
  }

  /** Sets the number of rows (after filtering, grouping, collapsing). */
  setCount(count: number): void {
    this.#options = { ...this.#options, count };
    this.#virtualizer.setOptions(this.#options);
    this.#virtualizer._willUpdate();
    this.#pull();
  }

  /** Number of rows that fit in the viewport. */
  pageRows(): number {
    const height = this.#virtualizer.scrollRect?.height ?? 0;
    return Math.max(Math.floor(height / this.rowHeight) - 2, 1);
  }

  /** Width of the viewport in CSS pixels as last observed (no layout is read), 0 before mounting. */
  viewWidth(): number {
    return this.#virtualizer.scrollRect?.width ?? 0;
  }

  /** Scrolls just enough to show the row at `index`. */
  reveal(index: number): void {
    if (index < 0) return;
    this.#virtualizer.scrollToIndex(index, { align: 'auto' });
  }
}
