import { describe, expect, it, vi } from 'vitest';
import { progressLine } from '../../src/cli/progress.ts';

describe('progressLine', () => {
  it('rewrites one line in place with the share done, and clears it at the end', () => {
    const written: string[] = [];
    const show = progressLine({ write: (t: string) => written.push(t) });
    show('cheapest fleet', 0.35);
    show('hand method', 1);
    show(undefined, 1);
    // 0.35 → " 35 %", 1 → "100 %" (rounded share, three characters); \r and erase-line (ECMA-48 EL) before each.
    expect(written).toEqual(['\r\u001b[K 35 %  cheapest fleet', '\r\u001b[K100 %  hand method', '\r\u001b[K']);
  });

  it('draws at most every 100 ms, and nothing to clear when nothing was drawn', () => {
    vi.useFakeTimers();
    try {
      const written: string[] = [];
      const show = progressLine({ write: (t: string) => written.push(t) });
      show(undefined, 1);
      show('a', 0.1);
      show('b', 0.2);
      vi.advanceTimersByTime(150);
      show('c', 0.3);
      expect(written).toEqual(['\r\u001b[K 10 %  a', '\r\u001b[K 30 %  c']);
    } finally {
      vi.useRealTimers();
    }
  });
});
