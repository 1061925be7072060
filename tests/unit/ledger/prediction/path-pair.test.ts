import { describe, expect, it } from 'vitest';
import { pairEntry } from '../../../../src/ledger/prediction/path-pair.ts';
import type { Propagation } from '../../../../src/ledger/model/model.ts';
import { duty, receiver } from '../fixtures.ts';

const simple: Propagation = { method: 'simple', q: 2 };

describe('pairEntry with stated distances', () => {
  it('pairEntry names a distance not given yet and where to type it, never "NaN is not a finite number"', () => {
    const d = duty({ location: { kind: 'distances', distancesM: {} } });
    const e = pairEntry(simple, d, receiver({ name: 'Alder House' }));
    expect(e.problem).toBe(
      'no distance given yet (type it under “Distance to Alder House” in the Duties tab, or give the duty X and Y on the site grid)',
    );
    expect(e.problem).not.toMatch(/NaN/);
  });

  it('pairEntry with a stated distance of 40 m gives the point-source path −20·lg 40 − 8 = −40.0 dB, +3 dB façade', () => {
    // worked by hand: 20·lg 40 = 32.04; 10·lg(2/4π) = −7.98 (Q = 2, common practice); façade +3 dB (common practice)
    const d = duty({ location: { kind: 'distances', distancesM: { r1: 40 } } });
    const e = pairEntry(simple, d, receiver());
    expect(e.problem).toBeUndefined();
    const total = [...e.pathTerms, ...e.receiverTerms].reduce((s, t) => s + t.db, 0);
    expect(total).toBeCloseTo(-40.02 + 3, 1);
  });
});
