/**
 * One prediction engine: the quick calculation (singleMachineLevel, behind the app's quick
 * calculation and the command line's `level`), given what a user reads off a project for one
 * candidate and one receiver, gives the evaluation's contribution to 0.01 dB — for every
 * candidate and receiver of the demo and of random projects, under both methods.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { pathGeometry, sourceHeightOf } from '../../../../src/ledger/prediction/geometry.ts';
import { pathScreening } from '../../../../src/ledger/prediction/path-screening.ts';
import { overlapHours, spanHours } from '../../../../src/ledger/prediction/clock.ts';
import { characterPenaltyDb, ratedSoundPower } from '../../../../src/ledger/rating/rating.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import type { Candidate, Project, Propagation, Receiver } from '../../../../src/ledger/model/model.ts';
import { singleMachineLevel, type SingleMachineInput } from '../../../../src/core/single-machine-level.ts';
import { readForm, defaultForm } from '../../../../src/app/results/quick-calc-form.ts';
import { levelInput } from '../../../../src/cli/commands/level.ts';
import { candidate, duty, receiver, twoDutyProject } from '../fixtures.ts';

const ISO: Propagation = {
  method: 'iso9613-2:1996',
  temperatureC: 10,
  humidityPct: 70,
  pressureKPa: 101.325,
  groundFactor: 0.5,
  groundMethod: 'general',
  sourceHeightM: 1.5,
  c0Db: 2,
};

/** What a user types into the quick calculation for candidate c at receiver r, read off the project. */
function quickInput(p: Project, c: Candidate, r: Receiver): SingleMachineInput {
  const d = p.duties.find((x) => x.id === c.dutyId)!;
  const prop = p.propagation;
  const hs = sourceHeightOf(d, prop);
  const geo = pathGeometry(d, r, hs);
  const screen = pathScreening(d.id, r, geo.sourceAt, hs, p.barriers);
  const phase = p.phases.find((x) => x.id === d.phaseId)!;
  const period = p.periods.find((x) => x.id === phase.periodId)!;
  const input: SingleMachineInput = {
    lwDb: ratedSoundPower(c, p.settings).lwaDb,
    distanceM: geo.distanceM,
    count: d.count,
    onTimePct: d.onTimePct,
    facade: r.facade,
    hoursWorked: overlapHours(phase.start, phase.end, period.start, period.end),
    periodHours: spanHours(period.start, period.end),
    penaltyDb: characterPenaltyDb(c, p.settings),
  };
  if (screen.typed) input.screening = screen.typed;
  else if (screen.computed)
    input.screening = {
      kind: 'barrier',
      pathDifferenceM: screen.computed.pathDifferenceM,
      sourceToEdgeM: screen.computed.sourceToEdgeM,
      edgeToReceiverM: screen.computed.edgeToReceiverM,
    };
  if (prop.method === 'simple') {
    input.method = 'simple';
    input.q = prop.q;
  } else {
    input.method = 'iso9613-2';
    input.propagation = {
      sourceHeightM: hs,
      receiverHeightM: r.heightM,
      groundFactor: prop.groundFactor,
      groundMethod: prop.groundMethod,
      temperatureC: prop.temperatureC,
      humidityPct: prop.humidityPct,
      pressureKPa: prop.pressureKPa,
      cmet: { c0Db: prop.c0Db },
    };
    if (c.bandsDb?.length === 8) input.bandsDb = c.bandsDb;
  }
  return input;
}

/** Every computable contribution of the project against the quick calculation; returns how many were compared. */
function compareAll(p: Project): number {
  const ev = evaluateProject(p);
  let compared = 0;
  for (const c of p.candidates) {
    for (const r of p.receivers) {
      const matrix = ev.contributionDb(c.id, r.id);
      if (!Number.isFinite(matrix)) continue;
      const quick = singleMachineLevel(quickInput(p, c, r)).levelDb;
      expect(Math.abs(quick - matrix), `${c.id} at ${r.id}: quick ${quick}, matrix ${matrix}`).toBeLessThan(0.01);
      compared++;
    }
  }
  return compared;
}

describe('one prediction engine: the quick calculation gives the matrix contribution', () => {
  it('every candidate and receiver of the demo, simple method', () => {
    const p = demoProject();
    p.propagation = { method: 'simple', q: 2 };
    expect(compareAll(p)).toBe(p.candidates.length * p.receivers.length);
  });

  it('every candidate and receiver of the demo, ISO 9613-2:1996 general and alternative ground methods', () => {
    for (const groundMethod of ['general', 'alternative'] as const) {
      const p = demoProject();
      p.propagation = { ...ISO, groundMethod } as Propagation;
      expect(compareAll(p)).toBe(p.candidates.length * p.receivers.length);
    }
  });

  const screeningArb = fc.oneof(
    fc.constant(undefined),
    fc.constant({ kind: 'top-visible' as const }),
    fc.constant({ kind: 'hidden' as const }),
    fc.record({ kind: fc.constant('explicit' as const), db: fc.integer({ min: 0, max: 20 }) }),
  );
  const projectArb = fc
    .record({
      iso: fc.boolean(),
      groundMethod: fc.constantFrom('general' as const, 'alternative' as const),
      q: fc.constantFrom(1 as const, 2 as const, 4 as const, 8 as const),
      g: fc.constantFrom(0, 0.5, 1),
      c0: fc.constantFrom(0, 2),
      barrier: fc.boolean(),
      penalty: fc.constantFrom(0, 3, 6),
      workStart: fc.constantFrom('07:00', '08:00', '10:30'),
      receivers: fc.array(
        fc.record({
          x: fc.integer({ min: -300, max: 300 }),
          y: fc.integer({ min: 30, max: 300 }),
          h: fc.constantFrom(1.5, 4, 10),
          facade: fc.boolean(),
          screening: screeningArb,
        }),
        { minLength: 1, maxLength: 3 },
      ),
      duties: fc.array(
        fc.record({
          x: fc.integer({ min: -100, max: 100 }),
          y: fc.integer({ min: -100, max: -20 }),
          h: fc.constantFrom(0.5, 1.5, 3),
          count: fc.integer({ min: 1, max: 4 }),
          onTime: fc.integer({ min: 5, max: 100 }),
          machines: fc.array(
            fc.record({
              lwa: fc.double({ min: 80, max: 120, noNaN: true }),
              bands: fc.option(fc.array(fc.integer({ min: 70, max: 115 }), { minLength: 8, maxLength: 8 }), {
                nil: undefined,
              }),
              tonal: fc.boolean(),
            }),
            { minLength: 1, maxLength: 3 },
          ),
        }),
        { minLength: 1, maxLength: 3 },
      ),
    })
    .map((a): Project => {
      const p = twoDutyProject();
      p.propagation = a.iso
        ? { ...ISO, groundMethod: a.groundMethod, groundFactor: a.g, c0Db: a.c0 }
        : { method: 'simple', q: a.q };
      p.settings.characterPenaltyDb = a.penalty;
      p.phases[0]!.start = a.workStart;
      p.barriers = a.barrier
        ? [
            {
              id: 'b1',
              name: 'Hoarding',
              heightM: 3,
              points: [
                { x: -400, y: 0 },
                { x: 400, y: 0 },
              ],
            },
          ]
        : [];
      p.receivers = a.receivers.map((r, i) =>
        receiver({
          id: `r${i}`,
          name: `R${i}`,
          x: r.x,
          y: r.y,
          heightM: r.h,
          facade: r.facade,
          screening: r.screening ? { u0: r.screening } : {},
        }),
      );
      p.duties = a.duties.map((d, i) =>
        duty({
          id: `u${i}`,
          name: `U${i}`,
          count: d.count,
          onTimePct: d.onTime,
          sourceHeightM: d.h,
          location: { kind: 'point', x: d.x, y: d.y },
          baselineCandidateId: `u${i}c0`,
        }),
      );
      p.candidates = a.duties.flatMap((d, i) =>
        d.machines.map((m, k) =>
          candidate({
            id: `u${i}c${k}`,
            dutyId: `u${i}`,
            label: `C${k}`,
            lwaDb: m.lwa,
            ...(m.bands ? { bandsDb: m.bands } : {}),
            character: m.tonal ? 'tonal' : 'none',
          }),
        ),
      );
      return p;
    });

  it('every candidate and receiver of random projects, both methods, barriers on the plan and typed screening', () => {
    fc.assert(
      fc.property(projectArb, (p) => {
        expect(compareAll(p)).toBeGreaterThan(0);
      }),
      { numRuns: 150 },
    );
  });
});

describe('the quick calculation form and `ledger level` reproduce a contribution', () => {
  // twoDutyProject: candidate a1, LWA 105, 20 m (slant, 1.5 m both ends), Q = 2, 50 % on-time, one unit,
  // working hours 08:00–18:00 in a 07:00–19:00 period, façade. Worked by hand from the terms:
  // 105 − 20·lg 20 − 7.98 = 71.00; −3.01 on-time; 10·lg(10/12) = −0.79; +3 façade → 70.20 dB.
  const p = twoDutyProject();
  const matrix = evaluateProject(p).contributionDb('a1', 'r1');
  it('the hand-worked figure is the matrix contribution', () => {
    expect(matrix).toBeCloseTo(70.2, 1);
  });
  it('the app form with hours worked and the period length', () => {
    const form = defaultForm();
    Object.assign(form.text, { lw: '105', distance: '20', q: '2', onTime: '50', count: '1' });
    Object.assign(form.text, { hoursWorked: '10', periodHours: '12' });
    form.facade = true;
    const read = readForm(form);
    expect(read.ok).toBe(true);
    if (read.ok) expect(Math.abs(singleMachineLevel(read.input).levelDb - matrix)).toBeLessThan(0.01);
  });
  it('the form asks for the other hours when only one is given', () => {
    const form = defaultForm();
    form.text.hoursWorked = '10';
    const read = readForm(form);
    expect(read.ok).toBe(false);
    if (!read.ok) expect(read.problems.periodHours).toMatch(/Assessment period: nothing given \(give both hours/);
  });
  it('`ledger level` flags --hours-worked, --period-hours and --penalty', () => {
    const tonal = twoDutyProject();
    tonal.candidates[0]!.character = 'tonal';
    const withPenalty = evaluateProject(tonal).contributionDb('a1', 'r1');
    expect(withPenalty - matrix).toBeCloseTo(3, 10); // the project's penalty setting, 3 dB
    const input = levelInput({
      lw: '105',
      distance: '20',
      'on-time': '50',
      facade: true,
      'hours-worked': '10',
      'period-hours': '12',
      penalty: '3',
    });
    expect(Math.abs(singleMachineLevel(input).levelDb - withPenalty)).toBeLessThan(0.01);
  });
});
