/**
 * evaluateAfterEdit: an evaluation after an edit, from the evaluation before it, must be
 * the evaluation a full evaluateProject gives. Reference for the property checks: the
 * same project evaluated from scratch by evaluateProject (a structured clone under a
 * propagation object no cache has seen, so nothing is shared) — the full evaluation is
 * the reference implementation the incremental path is tested against.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { evaluateAfterEdit } from '../../../../src/ledger/prediction/evaluate-edit.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import type { Candidate, Fleet, Project } from '../../../../src/ledger/model/model.ts';
import type { Evaluation } from '../../../../src/ledger/model/results.ts';

const SKIP = { skipValidation: true };
let freshCount = 0;

/** The project evaluated from scratch: new objects and a path-table key never seen before. */
function fresh(p: Project, fleet?: Fleet): Evaluation {
  const copy = structuredClone(p);
  copy.propagation = { ...copy.propagation, unseen: ++freshCount } as unknown as Project['propagation'];
  return evaluateProject(copy, fleet, SKIP);
}

/** Everything an evaluation shows, in plain data. */
function shown(p: Project, ev: Evaluation) {
  const receivers = [...p.receivers.map((r) => r.id), '@reference'];
  return {
    fleet: ev.fleet,
    costs: Object.entries(ev.costs).map(([id, c]) => [id, c.total, c.explanation]),
    matrix: ev.matrix,
    worst: ev.worstReceiverByPhase,
    fleetCost: ev.fleetCost,
    problems: ev.problems,
    notes: ev.notes,
    levels: p.candidates.map((c) => receivers.map((r) => ev.contributionDb(c.id, r))),
    terms: p.candidates.map((c) => ev.contribution(c.id, receivers[0] as string)),
  };
}

const isoGeneral = (p: Project): Project => ({
  ...p,
  settings: { ...p.settings, levelBasis: 'guaranteed' },
  propagation: {
    method: 'iso9613-2:1996',
    temperatureC: 10,
    humidityPct: 70,
    pressureKPa: 101.325,
    groundFactor: 0.5,
    groundMethod: 'general',
    sourceHeightM: 1.5,
    c0Db: 1,
  },
});

type Edit =
  | { kind: 'lwa' | 'dayRate' | 'band' | 'noLwa'; at: number; value: number }
  | { kind: 'character' | 'otherDuty' | 'label' | 'pick'; at: number; other: number }
  | { kind: 'count' | 'onTime' | 'baseline' | 'moveDuty' | 'moveReceiver' | 'drop'; at: number; value: number }
  | { kind: 'penalty'; value: number };

const at = fc.nat({ max: 10_000 });
const editArb: fc.Arbitrary<Edit> = fc.oneof(
  // The grid's edits, handled without a full evaluation …
  fc.record({
    kind: fc.constantFrom('lwa' as const, 'dayRate' as const, 'band' as const, 'noLwa' as const),
    at,
    value: fc.double({ min: 1, max: 30, noNaN: true }),
  }),
  fc.record({
    kind: fc.constantFrom('character' as const, 'otherDuty' as const, 'label' as const, 'pick' as const),
    at,
    other: at,
  }),
  fc.record({ kind: fc.constantFrom('count' as const, 'onTime' as const, 'baseline' as const), at, value: at }),
  // … and edits that fall back to one.
  fc.record({
    kind: fc.constantFrom('moveDuty' as const, 'moveReceiver' as const, 'drop' as const),
    at,
    value: fc.integer({ min: -30, max: 30 }),
  }),
  fc.record({ kind: fc.constant('penalty' as const), value: fc.constantFrom(0, 3, 6) }),
);

/** Applies an edit the app's way (new objects for what changed); returns the project and the fleet to evaluate. */
function apply(p: Project, fleet: Fleet, e: Edit): [Project, Fleet] {
  const nc = p.candidates.length;
  const candidate = (i: number, f: (c: Candidate) => Partial<Candidate>): Project => ({
    ...p,
    candidates: p.candidates.map((x, k) => (k === i % nc ? { ...x, ...f(x) } : x)),
  });
  const duty = (i: number, f: (d: Project['duties'][number]) => Partial<Project['duties'][number]>): Project => ({
    ...p,
    duties: p.duties.map((d, k) => (k === i % p.duties.length ? { ...d, ...f(d) } : d)),
  });
  switch (e.kind) {
    case 'lwa':
      return [candidate(e.at, () => ({ lwaDb: 85 + e.value })), fleet];
    case 'noLwa':
      return [candidate(e.at, () => ({ lwaDb: undefined })), fleet];
    case 'dayRate':
      return [candidate(e.at, () => ({ cost: { kind: 'hire', dayRate: 10 * e.value } })), fleet];
    case 'band':
      return [candidate(e.at, () => ({ bandsDb: [100, 101, 102, 103, 100 + e.value, 95, 90, 85] })), fleet];
    case 'character':
      return [candidate(e.at, (c) => ({ character: c.character === 'none' ? 'tonal' : 'none' })), fleet];
    case 'otherDuty':
      return [candidate(e.at, () => ({ dutyId: (p.duties[e.other % p.duties.length] as { id: string }).id })), fleet];
    case 'label':
      return [candidate(e.at, (c) => ({ label: `${c.label} (${e.other})` })), fleet];
    case 'pick': {
      const c = p.candidates[e.at % nc] as Candidate;
      return [p, { ...fleet, [c.dutyId]: c.id }];
    }
    case 'count':
      return [duty(e.at, () => ({ count: 1 + (e.value % 4) })), fleet];
    case 'onTime':
      return [duty(e.at, () => ({ onTimePct: 10 + (e.value % 90) })), fleet];
    case 'baseline':
      return [duty(e.at, () => ({ baselineCandidateId: (p.candidates[e.value % nc] as Candidate).id })), fleet];
    case 'moveDuty':
      return [duty(e.at, () => ({ location: { kind: 'point', x: e.value, y: 40 + e.value } })), fleet];
    case 'moveReceiver': {
      const r = e.at % p.receivers.length;
      return [{ ...p, receivers: p.receivers.map((x, i) => (i === r ? { ...x, x: x.x + e.value } : x)) }, fleet];
    }
    case 'drop':
      return [nc > 1 ? { ...p, candidates: p.candidates.filter((_c, i) => i !== e.at % nc) } : p, fleet];
    case 'penalty':
      return [{ ...p, settings: { ...p.settings, characterPenaltyDb: e.value as 0 | 3 | 6 } }, fleet];
  }
}

describe('evaluateAfterEdit', () => {
  it.each([
    ['the simple method', demoProject],
    ['the ISO 9613-2:1996 general method, guaranteed level basis', () => isoGeneral(demoProject())],
  ])('after any sequence of edits equals evaluateProject from scratch (%s)', (_name, start) => {
    fc.assert(
      fc.property(fc.array(editArb, { minLength: 1, maxLength: 12 }), (edits) => {
        let p = start();
        let fleet: Fleet = {};
        let ev = evaluateAfterEdit(undefined, p, fleet, SKIP);
        for (const e of edits) {
          [p, fleet] = apply(p, fleet, e);
          ev = evaluateAfterEdit(ev, p, fleet, SKIP);
          expect(shown(p, ev)).toEqual(shown(p, fresh(p, fleet)));
        }
      }),
      { numRuns: 60 },
    );
  });

  it('raising the LWA of a chosen machine by 10 dB raises its contribution by 10 dB and its phase total as the energies say', () => {
    const p = demoProject();
    const before = evaluateProject(p, undefined, SKIP);
    const i = p.candidates.findIndex((c) => c.id === 'slab-rig-breaker'); // the baseline of a demolition duty
    const c = p.candidates[i] as Candidate;
    const q = {
      ...p,
      candidates: p.candidates.map((x, k) => (k === i ? { ...x, lwaDb: (c.lwaDb as number) + 10 } : x)),
    };
    const after = evaluateAfterEdit(before, q, undefined, SKIP);
    const r = p.receivers[0]!.id;
    // Worked by hand from the contribution equation (evaluate.ts header): L is LWA plus terms that do not depend on it.
    expect(after.contributionDb(c.id, r) - before.contributionDb(c.id, r)).toBeCloseTo(10, 9);
    // Worked by hand: the phase total's energy loses the old contribution's and gains the new one's,
    // L' = 10·lg(10^(L/10) − 10^(Lold/10) + 10^(Lnew/10)); to 0.01 dB.
    const cell = (ev: Evaluation) =>
      ev.matrix.find((m) => m.phaseId === 'ph-demolition' && m.receiverId === r && m.ownPeriod)!;
    const e = (db: number) => 10 ** (db / 10);
    // The own period's cell is the plain energetic sum of the contributions (their on-time and hours terms included).
    const expected =
      10 * Math.log10(e(cell(before).levelDb) - e(before.contributionDb(c.id, r)) + e(after.contributionDb(c.id, r)));
    expect(cell(after).levelDb).toBeCloseTo(expected, 2);
  });

  it('keeps the cells of phases the edit does not reach, and gives new ones where it does', () => {
    const p = demoProject();
    const before = evaluateProject(p, undefined, SKIP);
    const i = p.candidates.findIndex((c) => c.id === 'slab-rig-breaker');
    const q = { ...p, candidates: p.candidates.map((x, k) => (k === i ? { ...x, lwaDb: 90 } : x)) };
    const after = evaluateAfterEdit(before, q, undefined, SKIP);
    after.matrix.forEach((cell, n) => {
      if (cell.phaseId === 'ph-demolition') expect(cell).not.toBe(before.matrix[n]);
      else expect(cell).toBe(before.matrix[n]);
    });
    // A machine no fleet chooses changes no cell at all.
    const j = p.candidates.findIndex((c) => c.dutyId === 'd-slab' && c.id !== 'slab-rig-breaker');
    const r = { ...q, candidates: q.candidates.map((x, k) => (k === j ? { ...x, lwaDb: 70 } : x)) };
    const again = evaluateAfterEdit(after, r, undefined, SKIP);
    again.matrix.forEach((cell, n) => expect(cell).toBe(after.matrix[n]));
    expect(shown(r, again)).toEqual(shown(r, fresh(r)));
  });
});
