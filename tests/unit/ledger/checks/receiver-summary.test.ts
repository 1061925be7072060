/**
 * Per-receiver rows for the assessed fleet, on a table of contributions given directly
 * (levels summed by hand below, energetic sums 10·lg Σ 10^(L/10)).
 */
import { describe, expect, it } from 'vitest';
import { receiverSummaries } from '../../../../src/ledger/checks/receiver-summary.ts';
import { tableProject } from '../optimise/table-project.ts';

const c = (id: string, levels: Record<string, number>) => ({ id, cost: 100, levels });
const spec = (limitR: number) => ({
  phases: { P1: 'day', P2: 'day' },
  receivers: { R: { day: limitR }, S: {} },
  duties: [
    { id: 'A', phaseId: 'P1', baseline: 'A0', candidates: [c('A0', { R: 65, S: 60 })] },
    { id: 'B', phaseId: 'P1', baseline: 'B0', candidates: [c('B0', { R: 62, S: 66 })] },
    { id: 'C', phaseId: 'P2', baseline: 'C0', candidates: [c('C0', { R: 69, S: 50 })] },
  ],
});

describe('receiverSummaries', () => {
  it('takes the cell with the least margin and the loudest machine of its phase', () => {
    const { project, evaluation } = tableProject(spec(70));
    const [r, s] = receiverSummaries(project, evaluation);
    // R: P1 = 10·lg(10^6.5 + 10^6.2) = 66.76 dB (margin 3.24, by hand); P2 = 69 dB (margin 1.0) → P2 is worst
    expect(r?.worst?.phaseId).toBe('P2');
    expect(r?.worst?.marginDb).toBeCloseTo(1, 9);
    expect(r?.loudest).toEqual({ dutyId: 'C', candidateId: 'C0', levelDb: 69 });
    expect([r?.assessed, r?.over]).toEqual([2, 0]);
    // S has no limit: the highest level, P1 = 10·lg(10^6.0 + 10^6.6) = 66.97 dB (by hand), loudest B0 at 66 dB
    expect(s?.worst?.phaseId).toBe('P1');
    expect(s?.worst?.levelDb).toBeCloseTo(66.97, 2);
    expect(s?.loudest?.candidateId).toBe('B0');
    expect([s?.assessed, s?.over]).toEqual([0, 0]);
  });

  it('counts the cells over the limit', () => {
    const { project, evaluation } = tableProject(spec(68));
    const [r] = receiverSummaries(project, evaluation);
    // limit 68: P2 at 69 dB is over by 1 dB; P1 at 66.76 dB is under (by hand, above)
    expect([r?.assessed, r?.over]).toEqual([2, 1]);
    expect(r?.worst?.marginDb).toBeCloseTo(-1, 9);
  });
});
