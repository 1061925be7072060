import { describe, expect, it } from 'vitest';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { phaseTotalDb } from '../../../../src/ledger/prediction/phase-total.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { aWeightedTotalDb } from '../../../../src/core/standards/iec61672-1-2013.ts';
import type { Fleet, Project } from '../../../../src/ledger/model/model.ts';
import type { Evaluation } from '../../../../src/ledger/model/results.ts';

const demo = demoProject();
const ev = evaluateProject(demo);
const cost = (id: string) => ev.costs[id]!.total;
const fleetCost = (f: Fleet) => demo.duties.reduce((s, d) => s + cost(f[d.id]!), 0);
const compliant = (p: Project, e: Evaluation, f: Fleet, phaseId: string) =>
  p.receivers.every(
    (r) => phaseTotalDb(p, e, phaseId, r.id, f) <= r.limitsDb[p.phases.find((x) => x.id === phaseId)!.periodId]! + 1e-9,
  );

/** Cheapest compliant fleet by exhaustive search; phases share no duties, so each phase is searched alone. */
function cheapestCompliant(): Fleet {
  const fleet: Fleet = {};
  for (const phase of demo.phases) {
    const duties = demo.duties.filter((d) => d.phaseId === phase.id);
    let best: { cost: number; pick: Fleet } | undefined;
    const walk = (i: number, pick: Fleet) => {
      if (i === duties.length) {
        if (!compliant(demo, ev, pick, phase.id)) return;
        const c = duties.reduce((s, d) => s + cost(pick[d.id]!), 0);
        if (!best || c < best.cost) best = { cost: c, pick: { ...pick } };
        return;
      }
      for (const c of demo.candidates.filter((x) => x.dutyId === duties[i]!.id))
        walk(i + 1, { ...pick, [duties[i]!.id]: c.id });
    };
    walk(0, {});
    Object.assign(fleet, best!.pick);
  }
  return fleet;
}

/** The hand method: at the worst cell, take the substitution with the most dB per cost; repeat until compliant. */
function greedy(): Fleet {
  const fleet: Fleet = Object.fromEntries(demo.duties.map((d) => [d.id, d.baselineCandidateId]));
  for (let step = 0; step < 100; step++) {
    let worst: { phaseId: string; receiverId: string; margin: number } | undefined;
    for (const ph of demo.phases) {
      for (const r of demo.receivers) {
        const margin = r.limitsDb[ph.periodId]! - phaseTotalDb(demo, ev, ph.id, r.id, fleet);
        if (!worst || margin < worst.margin) worst = { phaseId: ph.id, receiverId: r.id, margin };
      }
    }
    if (!worst || worst.margin >= 0) break;
    const now = phaseTotalDb(demo, ev, worst.phaseId, worst.receiverId, fleet);
    let pick: { dutyId: string; candidateId: string; score: number } | undefined;
    for (const d of demo.duties.filter((x) => x.phaseId === worst!.phaseId)) {
      for (const c of demo.candidates.filter((x) => x.dutyId === d.id && x.id !== fleet[d.id])) {
        const reduction = now - phaseTotalDb(demo, ev, worst.phaseId, worst.receiverId, { ...fleet, [d.id]: c.id });
        if (reduction <= 0) continue;
        const extra = cost(c.id) - cost(fleet[d.id]!);
        const score = extra <= 0 ? Infinity : reduction / extra;
        if (!pick || score > pick.score) pick = { dutyId: d.id, candidateId: c.id, score };
      }
    }
    if (!pick) break;
    fleet[pick.dutyId] = pick.candidateId;
  }
  return fleet;
}

describe('demoProject', () => {
  it('demoProject is valid and evaluates without problems', () => {
    expect(validateProject(demo)).toEqual([]);
    expect(ev.problems).toEqual([]);
  });

  it('demoProject has at least 3 phases, 4 receivers of different kinds, 12 duties with 3–6 candidates each', () => {
    expect(demo.phases.length).toBeGreaterThanOrEqual(3);
    expect(new Set(demo.receivers.map((r) => r.kind)).size).toBe(4);
    expect(demo.duties).toHaveLength(12);
    for (const d of demo.duties) {
      const n = demo.candidates.filter((c) => c.dutyId === d.id).length;
      expect(n).toBeGreaterThanOrEqual(3);
      expect(n).toBeLessThanOrEqual(6);
    }
  });

  it('demoProject receivers are 15–250 m from the works', () => {
    for (const r of demo.receivers) {
      for (const d of demo.duties) {
        if (d.location.kind !== 'point') continue;
        const distance = Math.hypot(r.x - d.location.x, r.y - d.location.y);
        expect(distance).toBeGreaterThanOrEqual(15);
        expect(distance).toBeLessThanOrEqual(250);
      }
    }
  });

  it('demoProject mixes diesel and electric options, hire and purchase, bands, (L, K), a tonal machine and an operator LpA', () => {
    const energies = new Set(demo.candidates.map((c) => c.energy));
    expect(energies.has('diesel') && (energies.has('electric') || energies.has('battery'))).toBe(true);
    expect(demo.candidates.some((c) => c.cost.kind === 'purchase')).toBe(true);
    expect(demo.candidates.some((c) => c.cost.kind === 'hire')).toBe(true);
    expect(demo.candidates.some((c) => c.declaration === 'measured' && c.uncertaintyDb !== undefined)).toBe(true);
    expect(demo.candidates.some((c) => c.character === 'tonal')).toBe(true);
    expect(demo.candidates.some((c) => c.operatorLpaDb !== undefined)).toBe(true);
    expect(demo.currency).toBe('GBP');
  });

  it('demoProject octave bands agree with the declared LWA within 0.1 dB (IEC 61672-1:2013 A-weighting)', () => {
    for (const c of demo.candidates.filter((x) => x.bandsDb)) {
      expect(Math.abs(aWeightedTotalDb(c.bandsDb!) - c.lwaDb!)).toBeLessThan(0.1);
    }
  });

  it('demoProject baseline exceeds at least one limit', () => {
    expect(ev.matrix.some((c) => c.over)).toBe(true);
  });

  it('demoProject cheapest compliant fleet differs from the hand method’s, in the phase that is over, and costs less', () => {
    const best = cheapestCompliant();
    const hand = greedy();
    for (const ph of demo.phases) {
      expect(compliant(demo, ev, best, ph.id)).toBe(true);
      expect(compliant(demo, ev, hand, ph.id)).toBe(true);
    }
    const overPhase = 'ph-demolition';
    const differs = demo.duties.filter((d) => d.phaseId === overPhase && best[d.id] !== hand[d.id]);
    expect(differs.length).toBeGreaterThan(0);
    const phaseCost = (f: Fleet) =>
      demo.duties.filter((d) => d.phaseId === overPhase).reduce((s, d) => s + cost(f[d.id]!), 0);
    expect(phaseCost(best)).toBeLessThan(phaseCost(hand));
    expect(fleetCost(best)).toBeLessThan(fleetCost(hand));
  });

  it('demoProject returns a fresh copy each time', () => {
    const a = demoProject();
    a.duties[0]!.count = 9;
    expect(demoProject().duties[0]!.count).toBe(1);
  });
});
