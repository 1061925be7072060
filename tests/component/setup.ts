/**
 * Setup for component tests (jsdom): an in-memory IndexedDB, and the small
 * pieces of layout jsdom lacks so that the grid's row virtualiser has a
 * viewport to fill. Scrolling itself is tested in the real browser.
 */
import 'fake-indexeddb/auto';

/** Size given to elements marked `data-grid-viewport`, in CSS pixels. */
const VIEWPORT_HEIGHT_PX = 600;
const VIEWPORT_WIDTH_PX = 1000;

function isViewport(element: Element): boolean {
  return typeof element.hasAttribute === 'function' && element.hasAttribute('data-grid-viewport');
}

Object.defineProperty(HTMLElement.prototype, 'clientHeight', {
  configurable: true,
  get(this: HTMLElement) {
    return isViewport(this) ? VIEWPORT_HEIGHT_PX : 0;
  },
});
Object.defineProperty(HTMLElement.prototype, 'clientWidth', {
  configurable: true,
  get(this: HTMLElement) {
    return isViewport(this) ? VIEWPORT_WIDTH_PX : 0;
  },
});

if (typeof globalThis.ResizeObserver === 'undefined') {
  class ResizeObserverStub {
    observe(): void {}
    unobserve(): void {}
    disconnect(): void {}
  }
  globalThis.ResizeObserver = ResizeObserverStub as unknown as typeof ResizeObserver;
}

if (typeof Element.prototype.scrollTo !== 'function') {
  Element.prototype.scrollTo = function scrollTo(this: Element, options?: ScrollToOptions | number, y?: number) {
    if (typeof options === 'number') {
      this.scrollLeft = options;
      this.scrollTop = y ?? 0;
    } else if (options) {
      if (options.top !== undefined) this.scrollTop = options.top;
      if (options.left !== undefined) this.scrollLeft = options.left;
    }
  } as Element['scrollTo'];
}
if (typeof Element.prototype.scrollIntoView !== 'function') {
  Element.prototype.scrollIntoView = function scrollIntoView() {};
}
