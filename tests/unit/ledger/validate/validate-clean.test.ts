/**
 * candidateIsClean, the quick test that lets validation skip writing messages for
 * candidates with nothing to report, must agree with the full field checks.
 * Reference for every check: checkCandidate (./validate-items.ts), the field-by-field
 * checks that write the messages — clean exactly when they find nothing.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  candidateIsClean,
  candidatesWithUnreadCells,
  checkIdsQuickly,
  dutyIsClean,
  idsWithUnreadCells,
} from '../../../../src/ledger/validate/validate-clean.ts';
import {
  candidatesAreClean,
  checkCandidate,
  checkDuty,
  validateDuties,
  type Lists,
} from '../../../../src/ledger/validate/validate-items.ts';
import { checkIds, ProblemList } from '../../../../src/ledger/validate/field-checks.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';

/** Mostly a good value, sometimes a bad one, so that clean and faulty candidates both come up often. */
const pick = (good: unknown[], bad: unknown[]) =>
  fc.oneof({ arbitrary: fc.constantFrom(...good), weight: 20 }, { arbitrary: fc.constantFrom(...bad), weight: 1 });
/** A number field: good values, or the usual bad ones (missing, null, NaN, infinite, negative, huge, text, fractional). */
const value = (...good: unknown[]) =>
  pick(good, [undefined, null, NaN, Infinity, -1, 1e12, '12O', '', 0.5, 170.5, true]);
const optional = (...good: unknown[]) => value(undefined, ...good);

const candidateArb = fc.record(
  {
    id: fc.constantFrom('c1', 'c2'),
    dutyId: pick(['d1', 'd2'], ['nope', undefined]),
    label: pick(['Mini excavator'], ['', '  ', undefined, 7]),
    category: pick(['excavator', ''], [undefined, 3]),
    directiveCategory: pick([undefined, 'excavator'], ['', ' ', 4]),
    netPowerKw: optional(55, 110),
    directiveQuantity: optional(500),
    lwaDb: optional(93, 104.5, 40, 150), // the catalogue's ends (ledger/catalogue/machine-numbers.ts)
    declaration: pick(['guaranteed', 'measured'], ['declared', undefined]),
    uncertaintyDb: optional(2, 0, 10),
    lwaOrigin: pick(['declared', 'from-watts', 'from-pressure', 'permissible-stand-in'], ['guess', undefined]),
    bandsDb: fc.oneof(
      { arbitrary: fc.constantFrom(undefined, [98, 101, 103, 104, 102, 99, 94, 87]), weight: 6 },
      { arbitrary: fc.constantFrom([98, 101, 103], 'loud'), weight: 1 },
      { arbitrary: fc.array(value(0, 170, 99), { minLength: 8, maxLength: 8 }), weight: 2 },
    ),
    operatorLpaDb: optional(82, 40, 140),
    operatorHoursPerDay: optional(6, 24),
    character: pick(['none', 'tonal', 'impulsive'], ['loud', undefined]),
    energy: pick(['diesel', 'petrol', 'electric', 'battery', 'hybrid', 'other'], ['steam', undefined]),
    source: pick(['data sheet', ''], [undefined, 1]),
    cost: fc.oneof(
      {
        arbitrary: fc.record({
          kind: fc.constant('hire'),
          dayRate: value(75, 0),
          weekRate: optional(420),
          monthRate: optional(1500),
        }),
        weight: 5,
      },
      {
        arbitrary: fc.record({
          kind: fc.constant('purchase'),
          price: value(48000, 0),
          lifeDays: value(1500),
          resaleValue: value(30000, 0, 60000),
        }),
        weight: 5,
      },
      { arbitrary: fc.constantFrom(undefined, null, 'hire', { kind: 'lease', dayRate: 1 }), weight: 1 },
    ),
    runningPerDay: value(38, 0),
    fixedCharges: value(90, 0),
    pinned: pick([undefined, true, false], ['yes']),
    excluded: pick([undefined, false], [true, 1]),
  },
  { requiredKeys: ['id'] },
);

describe('candidateIsClean', () => {
  it('is true exactly when checkCandidate finds no problem (any mix of good and bad fields)', () => {
    const dutyIds = new Set(['d1', 'd2']);
    let cleanSeen = 0;
    fc.assert(
      fc.property(candidateArb, (c) => {
        const p = new ProblemList();
        checkCandidate(p, c as Record<string, unknown>, 0, dutyIds);
        const clean = candidateIsClean(c as Record<string, unknown>, dutyIds, new Set());
        if (clean) cleanSeen++;
        expect(clean).toBe(p.problems.length === 0);
      }),
      { numRuns: 3000 },
    );
    expect(cleanSeen).toBeGreaterThan(30); // both answers were exercised
  });

  it('is false for a candidate with text kept in an unread cell, so the text is reported', () => {
    const c = demoProject().candidates[0] as unknown as Record<string, unknown>;
    const unread = candidatesWithUnreadCells({ [`candidates/${String(c.id)}/lwaDb`]: '12O' });
    expect(candidateIsClean(c, new Set([String(c.dutyId)]), new Set())).toBe(true); // the demo candidate itself is clean (validateProject(demoProject()) finds nothing)
    expect(candidateIsClean(c, new Set([String(c.dutyId)]), unread)).toBe(false);
  });

  it('candidatesWithUnreadCells reads the id between "candidates/" and the last "/", ids with "/" included', () => {
    // key pattern "<list>/<id>/<field>" of Project.unreadCells (src/ledger/model/model.ts); fields never hold a "/"
    expect([
      ...candidatesWithUnreadCells({
        'candidates/c1/lwaDb': 'x',
        'candidates/a/b/cost.dayRate': 'y',
        'duties/d1/count': 'z',
      }),
    ]).toEqual(['c1', 'a/b']);
  });

  it('checkIdsQuickly gives the ids of checkIds and the same problems, for clean and faulty lists', () => {
    const lists = [
      [{ id: 'a' }, { id: 'b' }],
      [{ id: 'a' }, { id: 'a', name: 'Twice' }],
      [{ id: '' }, { id: 3 }, {}],
    ];
    for (const items of lists) {
      const quick = new ProblemList();
      const full = new ProblemList();
      // reference: checkIds of ./field-checks.ts on the same list
      expect(checkIdsQuickly(quick, '$.candidates', 'Candidate', items)).toEqual(
        checkIds(full, '$.candidates', 'Candidate', items),
      );
      expect(quick.problems).toEqual(full.problems);
    }
  });

  it('validateProject with many clean candidates and one faulty one reports only the faulty one, at its index', () => {
    const p = demoProject();
    p.candidates[7] = { ...p.candidates[7]!, lwaDb: 300 };
    // the catalogue's LWA range (src/ledger/catalogue/machine-numbers.ts): 40 to 150 dB
    expect(validateProject(p)).toEqual([
      {
        path: '$.candidates[7].lwaDb',
        message: `Candidate ${JSON.stringify(p.candidates[7]!.label)}, LWA: 300 is out of range (use a sound power level in dB from 40 to 150, e.g. 104.5)`,
      },
    ]);
  });
});

const dutyArb = fc.record(
  {
    id: fc.constantFrom('d1', 'd2'),
    name: pick(['Break out the yard slab'], ['', '  ', undefined, 7]),
    phaseId: pick(['ph1'], ['nope', undefined]),
    count: value(1, 3),
    onTimePct: value(50, 100, 1),
    durationDays: value(10, 1),
    sourceHeightM: optional(1.5, 0),
    onTimeRangePct: pick(
      [undefined],
      [
        { lowPct: 40, highPct: 60 },
        { lowPct: 70, highPct: 60 },
      ],
    ),
    location: fc.oneof(
      { arbitrary: fc.record({ kind: fc.constant('point'), x: value(0, -250, 30.5), y: value(12, 0) }), weight: 8 },
      {
        arbitrary: fc.constantFrom(
          undefined,
          null,
          { kind: 'distances', distancesM: { r1: 40 } },
          { kind: 'distances', distancesM: {} },
          { kind: 'blob', x: 1, y: 2 },
        ),
        weight: 2,
      },
    ),
    baselineCandidateId: pick(['c1'], ['c2', 'c9', undefined]),
  },
  { requiredKeys: ['id'] },
);
const mineArb = fc.array(
  fc.record(
    { id: fc.constantFrom('c1', 'c2', 'c3'), pinned: pick([undefined, false], [true]) },
    { requiredKeys: ['id'] },
  ),
  { maxLength: 4 },
);

describe('dutyIsClean', () => {
  it('with candidatesAreClean is true only when checkDuty finds no problem, and true for most duties that have none', () => {
    let cleanSeen = 0;
    let missed = 0;
    fc.assert(
      fc.property(dutyArb, mineArb, (d, mine) => {
        const lists: Lists = {
          unread: {},
          phaseIds: new Set(['ph1']),
          receiverIds: new Set(['r1']),
          receivers: [],
          duties: [d as Record<string, unknown>],
          candidates: mine.map((c) => ({ ...c, dutyId: d.id })),
        };
        const p = new ProblemList();
        checkDuty(p, lists, d as Record<string, unknown>, 0, lists.candidates);
        const quick =
          dutyIsClean(d as Record<string, unknown>, lists.phaseIds, new Set()) &&
          candidatesAreClean(d as Record<string, unknown>, lists.candidates);
        if (quick) {
          cleanSeen++;
          expect(p.problems).toEqual([]);
        } else if (p.problems.length === 0) missed++;
        // validateDuties lists what checkDuty lists (the id check aside: ids here are good).
        const v = new ProblemList();
        validateDuties(v, lists);
        expect(v.problems).toEqual(p.problems);
      }),
      { numRuns: 3000 },
    );
    expect(cleanSeen).toBeGreaterThan(30); // both answers were exercised
    // Only a range, a distances location or a baseline-free duty with nothing to report takes the full check.
    expect(missed).toBeLessThan(cleanSeen);
  });

  it('is false for a duty with text kept in an unread cell, so the text is reported', () => {
    const d = demoProject().duties[0] as unknown as Record<string, unknown>;
    const phaseIds = new Set([String(d.phaseId)]);
    expect(dutyIsClean(d, phaseIds, new Set())).toBe(true); // the demo duty itself is clean
    const unread = idsWithUnreadCells({ [`duties/${String(d.id)}/count`]: 'two' }, 'duties');
    expect(dutyIsClean(d, phaseIds, unread)).toBe(false);
  });

  it('idsWithUnreadCells holds every id an unread key could name, ids and fields with "/" included', () => {
    expect([
      ...idsWithUnreadCells(
        { 'duties/d1/count': 'x', 'duties/a/b/location.distancesM.r/1': 'y', 'candidates/c1/lwaDb': 'z' },
        'duties',
      ),
    ]).toEqual(['d1', 'a', 'a/b', 'a/b/location.distancesM.r']);
  });
});
