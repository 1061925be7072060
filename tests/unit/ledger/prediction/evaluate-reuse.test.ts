/**
 * evaluateProject reuses what an earlier call computed (per-candidate memos, unchanged
 * level rows, path-table pairs whose inputs did not change). These tests check that the
 * reuse never changes a result: after any sequence of edits — made the app's way (new
 * objects) or in place — the evaluation equals one computed from scratch.
 * Reference for every check: the same project evaluated from scratch (a structured clone,
 * under a propagation object no cache has seen), so no memo, row or path can be shared.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { buildPathTable, pathTableFor } from '../../../../src/ledger/prediction/path-table.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import type { Candidate, Project } from '../../../../src/ledger/model/model.ts';
import type { Evaluation } from '../../../../src/ledger/model/results.ts';

let freshCount = 0;

/** The project evaluated from scratch: new objects and a path-table key never seen before. */
function fresh(p: Project): Evaluation {
  const copy = structuredClone(p);
  copy.propagation = { ...copy.propagation, unseen: ++freshCount } as unknown as Project['propagation'];
  return evaluateProject(copy, undefined, { skipValidation: true });
}

/** Everything an evaluation shows, in plain data (contributions at every receiver, terms of every candidate at one). */
function shown(p: Project, ev: Evaluation) {
  const receivers = [...p.receivers.map((r) => r.id), '@reference'];
  return {
    fleet: ev.fleet,
    costs: Object.entries(ev.costs).map(([id, c]) => [id, c.total, c.explanation]),
    matrix: ev.matrix,
    worst: ev.worstReceiverByPhase,
    fleetCost: ev.fleetCost,
    problems: ev.problems,
    levels: p.candidates.map((c) => receivers.map((r) => ev.contributionDb(c.id, r))),
    terms: p.candidates.map((c) => ev.contribution(c.id, receivers[0] as string)),
  };
}

const isoGeneral = (p: Project): Project => ({
  ...p,
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
  | { kind: 'lwa' | 'dayRate' | 'band'; at: number; value: number; inPlace: boolean }
  | { kind: 'character'; at: number; inPlace: boolean }
  | { kind: 'moveDuty' | 'moveReceiver'; at: number; value: number }
  | { kind: 'count'; at: number; value: number; inPlace: boolean }
  | { kind: 'drop' | 'copy'; at: number }
  | { kind: 'penalty'; value: number };

const editArb: fc.Arbitrary<Edit> = fc.oneof(
  fc.record({
    kind: fc.constantFrom('lwa' as const, 'dayRate' as const, 'band' as const),
    at: fc.nat(),
    value: fc.double({ min: 1, max: 30, noNaN: true }),
    inPlace: fc.boolean(),
  }),
  fc.record({ kind: fc.constant('character' as const), at: fc.nat(), inPlace: fc.boolean() }),
  fc.record({
    kind: fc.constantFrom('moveDuty' as const, 'moveReceiver' as const),
    at: fc.nat(),
    value: fc.integer({ min: -30, max: 30 }),
  }),
  fc.record({
    kind: fc.constant('count' as const),
    at: fc.nat(),
    value: fc.integer({ min: 1, max: 4 }),
    inPlace: fc.boolean(),
  }),
  fc.record({ kind: fc.constantFrom('drop' as const, 'copy' as const), at: fc.nat() }),
  fc.record({ kind: fc.constant('penalty' as const), value: fc.constantFrom(0, 3, 6) }),
);

/** Applies an edit: a new project with new objects for what changed, or the same objects changed in place. */
function apply(p: Project, e: Edit): Project {
  const nc = p.candidates.length;
  const change = (at: number, inPlace: boolean, f: (c: Candidate) => Partial<Candidate>): Project => {
    const k = at % nc;
    const c = p.candidates[k] as Candidate;
    if (inPlace) {
      Object.assign(c, f(c));
      return p;
    }
    return { ...p, candidates: p.candidates.map((x, i) => (i === k ? { ...x, ...f(x) } : x)) };
  };
  switch (e.kind) {
    case 'lwa':
      return change(e.at, e.inPlace, () => ({ lwaDb: 90 + e.value }));
    case 'dayRate':
      return change(e.at, e.inPlace, (c) => ({
        cost: {
          kind: 'hire',
          dayRate: 10 * e.value,
          ...(c.cost.kind === 'hire' && c.cost.weekRate !== undefined ? { weekRate: c.cost.weekRate } : {}),
        },
      }));
    case 'band':
      return change(e.at, e.inPlace, () => ({ bandsDb: [100, 101, 102, 103, 100 + e.value, 95, 90, 85] }));
    case 'character':
      return change(e.at, e.inPlace, (c) => ({ character: c.character === 'none' ? 'tonal' : 'none' }));
    case 'count': {
      const u = e.at % p.duties.length;
      if (e.inPlace) {
        (p.duties[u] as Project['duties'][number]).count = e.value;
        return p;
      }
      return { ...p, duties: p.duties.map((d, i) => (i === u ? { ...d, count: e.value } : d)) };
    }
    case 'moveDuty': {
      const u = e.at % p.duties.length;
      return {
        ...p,
        duties: p.duties.map((d, i) =>
          i === u ? { ...d, location: { kind: 'point', x: e.value, y: 40 + e.value } } : d,
        ),
      };
    }
    case 'moveReceiver': {
      const r = e.at % p.receivers.length;
      return { ...p, receivers: p.receivers.map((x, i) => (i === r ? { ...x, x: x.x + e.value } : x)) };
    }
    case 'drop':
      return nc > 1 ? { ...p, candidates: p.candidates.filter((_c, i) => i !== e.at % nc) } : p;
    case 'copy': {
      const c = p.candidates[e.at % nc] as Candidate;
      const at = e.at % (nc + 1);
      return {
        ...p,
        candidates: [...p.candidates.slice(0, at), { ...c, id: `${c.id}-copy${nc}` }, ...p.candidates.slice(at)],
      };
    }
    case 'penalty':
      return { ...p, settings: { ...p.settings, characterPenaltyDb: e.value as 0 | 3 | 6 } };
  }
}

describe('evaluateProject with reuse between calls', () => {
  it.each([
    ['the simple method', demoProject],
    ['the ISO 9613-2:1996 general method', () => isoGeneral(demoProject())],
  ])('after any sequence of edits equals an evaluation from scratch (%s)', (_name, start) => {
    fc.assert(
      fc.property(fc.array(editArb, { minLength: 1, maxLength: 10 }), (edits) => {
        let p = start();
        evaluateProject(p, undefined, { skipValidation: true });
        for (const e of edits) {
          p = apply(p, e);
          const ev = evaluateProject(p, undefined, { skipValidation: true });
          expect(shown(p, ev)).toEqual(shown(p, fresh(p)));
        }
      }),
      { numRuns: 40 },
    );
  });

  it('an earlier evaluation keeps its results after the project is edited and evaluated again', () => {
    const p = isoGeneral(demoProject());
    const before = evaluateProject(p);
    const expected = shown(p, fresh(p));
    const q = { ...p, candidates: p.candidates.map((c, i) => (i === 0 ? { ...c, lwaDb: 80 } : c)) };
    evaluateProject(q);
    expect(shown(p, before)).toEqual(expected);
  });

  it('pathTableFor after a duty and a receiver moved holds the numbers of buildPathTable from scratch', () => {
    let p = isoGeneral(demoProject());
    pathTableFor(p);
    p = { ...p, duties: p.duties.map((d, i) => (i === 3 ? { ...d, location: { kind: 'point', x: 33, y: -12 } } : d)) };
    pathTableFor(p);
    p = { ...p, receivers: p.receivers.map((r, i) => (i === 1 ? { ...r, x: r.x + 7 } : r)) };
    const reused = pathTableFor(p);
    const scratch = buildPathTable(structuredClone(p));
    expect(reused.broadbandDb).toEqual(scratch.broadbandDb);
    expect(reused.receiverDb).toEqual(scratch.receiverDb);
    expect(reused.hasBands).toEqual(scratch.hasBands);
    expect(reused.bandTransmission).toEqual(scratch.bandTransmission);
    expect(reused.entries).toEqual(scratch.entries);
  });

  it('a path-table entry read after the project was changed in place still describes the project as it was built', () => {
    const p = isoGeneral(demoProject());
    const table = buildPathTable(p);
    const expected = buildPathTable(structuredClone(p)).entries;
    p.receivers[0]!.x += 50;
    (p.duties[0]!.location as { x: number }).x -= 20;
    expect(table.entries).toEqual(expected);
  });
});
