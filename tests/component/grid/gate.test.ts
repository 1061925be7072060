/**
 * A gate passes a change on only when the value it works out changes (what keeps an edit of one
 * row from reaching every cell on screen; see src/app/grid/gate.svelte.ts).
 */
import { flushSync } from 'svelte';
import { describe, expect, it } from 'vitest';
import { gateProbe } from './gate-probe.svelte.ts';

describe('gate', () => {
  it('holds its value from the start, before any update (from memory: what the row markup needs on mount)', () => {
    const probe = gateProbe();
    expect(probe.shown).toBe('even');
    expect(probe.runs).toBe(1);
    probe.stop();
  });

  it('stops a change upstream that leaves its value as it was, and passes one that changes it', () => {
    const probe = gateProbe();
    probe.set(2);
    flushSync();
    expect(probe.runs).toBe(1); // 0 → 2: still even, the reader did not run
    probe.set(3);
    flushSync();
    expect(probe.runs).toBe(2);
    expect(probe.shown).toBe('odd');
    probe.set(5);
    flushSync();
    expect(probe.runs).toBe(2);
    probe.stop();
  });
});
