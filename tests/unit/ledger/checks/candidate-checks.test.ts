import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { candidateChecks, checkCandidate } from '../../../../src/ledger/checks/candidate-checks.ts';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { demoProject } from '../../../../src/ledger/model/demo.ts';
import { ARTICLE_12_TYPES } from '../../../../src/core/standards/directive-2000-14-ec/index.ts';
import type { Candidate, Project } from '../../../../src/ledger/model/model.ts';
import { candidate, twoDutyProject } from '../fixtures.ts';

/** Tolerance for levels worked by hand to two decimals, dB. */
const TOLERANCE_DB = 0.01;

const project = (over: Partial<Project['settings']> = {}): Project => {
  const p = twoDutyProject();
  p.settings = { ...p.settings, ...over };
  return p;
};
const check = (c: Partial<Candidate>, settings: Partial<Project['settings']> = {}) =>
  checkCandidate(project(settings), candidate(c));

describe('checkCandidate: Directive 2000/14/EC permissible level', () => {
  it('an excavator of 100 kW declared at 104 dB is over its permissible 102 dB by 2.0 dB', () => {
    // Directive 2000/14/EC Art. 12 item 4 (as amended by 2005/88/EC), worked by hand: 80 + 11·lg 100 = 80 + 22 = 102.
    const r = check({ lwaDb: 104, directiveCategory: 'excavator', netPowerKw: 100 });
    expect(r.permissible).toEqual({ levelDb: 102, working: expect.stringContaining('80 + 11·lg'), stage: 'II' });
    expect(r.overPermissible).toBe(true);
    expect(r.permissibleNote).toBe(
      'guaranteed 104.0 dB is over the permissible 102 dB by 2.0 dB (Directive 2000/14/EC, Stage II)',
    );
    expect(r.standIn).toBe(false);
  });

  it('a generator of 5 kW declared at exactly its permissible 97 dB is not over', () => {
    // Art. 12 item 7, 2 < Pel ≤ 10 kW, worked by hand: 96 + lg 5 = 96.70 → 97 (nearest integer); the limit is "must not exceed".
    const r = check({ lwaDb: 97, directiveCategory: 'generator', directiveQuantity: 5 });
    expect(r.permissible?.levelDb).toBe(97);
    expect(r.overPermissible).toBe(false);
    expect(r.permissibleNote).toBeUndefined();
  });

  it('a measured pair (L 100, K 3) of a 100 kW excavator is compared as L + K = 103 > 102, on either level basis', () => {
    // ISO 4871:1996: declared value Ld = L + K; the directive limits the guaranteed level. Art. 12 item 4: 102 dB.
    const pair = {
      lwaDb: 100,
      declaration: 'measured' as const,
      uncertaintyDb: 3,
      directiveCategory: 'excavator',
      netPowerKw: 100,
    };
    const guaranteed = check(pair);
    expect(guaranteed.overPermissible).toBe(true);
    expect(guaranteed.ratedLwaDb).toBe(103);
    expect(guaranteed.basis).toBe('guaranteed');
    const measured = check(pair, { levelBasis: 'measured' });
    expect(measured.ratedLwaDb).toBe(100);
    expect(measured.basis).toBe('measured');
    expect(measured.overPermissible).toBe(true);
  });

  it('a compressor of 40 kW without a declared LWA takes its permissible 98 dB as a stand-in, marked as such', () => {
    // Art. 12 item 8, P > 15 kW, worked by hand: 95 + 2·lg 40 = 95 + 3.20 = 98.20 → 98.
    const r = check({
      lwaDb: undefined,
      lwaOrigin: 'permissible-stand-in',
      directiveCategory: 'compressor',
      netPowerKw: 40,
    });
    expect(r.standIn).toBe(true);
    expect(r.ratedLwaDb).toBe(98);
    expect(r.overPermissible).toBe(false);
    expect(r.permissibleNote).toMatch(
      /^no declared LWA: the permissible level stands in, conservatively \(Directive 2000\/14\/EC, Stage II\): 95 \+ 2·lg P/,
    );
  });

  it('a 20 kg combustion-engine hand-held breaker without an LWA stands in at the Stage I 108 dB (Stage II indicative only)', () => {
    // 2005/88/EC lists hand-held internal-combustion-engine breakers 15 < m < 30 kg as Stage II indicative only, so Stage I applies:
    // Art. 12 item 5 Stage I, worked by hand: 94 + 11·lg 20 = 94 + 14.31 = 108.31 → 108.
    const r = check({
      lwaDb: undefined,
      lwaOrigin: 'permissible-stand-in',
      directiveCategory: 'hand-held-breaker-combustion',
      directiveQuantity: 20,
    });
    expect(r.ratedLwaDb).toBe(108);
    expect(r.permissible?.stage).toBe('I (Stage II indicative only)');
  });

  it('an Article 13 type has no permissible level and the note says so', () => {
    const r = check({ directiveCategory: 'piling-rig' });
    expect(r.permissible).toBeUndefined();
    expect(r.overPermissible).toBe(false);
    expect(r.permissibleNote).toMatch(/Article 13/);
  });

  it('an Article 12 type without its quantity asks for it', () => {
    expect(check({ directiveCategory: 'hand-held-breaker' }).permissibleNote).toMatch(/give the mass \(kg\)/);
    expect(check({ directiveCategory: 'excavator', netPowerKw: NaN }).permissibleNote).toMatch(
      /give the net power \(kW\)/,
    );
  });

  it('a candidate without a directive category has no permissible level and no note', () => {
    const r = check({});
    expect(r.permissible).toBeUndefined();
    expect(r.permissibleNote).toBeUndefined();
    expect(r.overPermissible).toBe(false);
  });

  it('an unreadable LWA is not computed (NaN) and no stand-in replaces what the user typed', () => {
    const r = check({ lwaDb: NaN, directiveCategory: 'excavator', netPowerKw: 100 });
    expect(r.ratedLwaDb).toBeNaN();
    expect(r.standIn).toBe(false);
  });

  it('no LWA, no bands and no directive type: not computed, never 0', () => {
    const r = check({ lwaDb: undefined });
    expect(r.ratedLwaDb).toBeNaN();
    expect(r.ratedExplanation).toBe('no declared LWA');
  });
});

describe('checkCandidate: character penalty and operator exposure', () => {
  it.each([0, 3, 6] as const)('a tonal candidate carries the project penalty of %d dB; a neutral one 0', (p) => {
    expect(check({ character: 'tonal' }, { characterPenaltyDb: p }).penaltyDb).toBe(p);
    expect(check({ character: 'impulsive' }, { characterPenaltyDb: p }).penaltyDb).toBe(p);
    expect(check({ character: 'none' }, { characterPenaltyDb: p }).penaltyDb).toBe(0);
  });

  it('LpA 90 dB(A) for 2 h a day: L_EX,8h 83.98, the lower action value, 85 dB(A) reached after 2.52 h', () => {
    // ISO 9612:2009 definition, worked by hand: 90 + 10·lg(2/8) = 90 − 6.02 = 83.98.
    // Directive 2003/10/EC Art. 3: 80 ≤ 83.98 < 85 → lower exposure action value.
    // NIOSH 98-126 (85 dB(A), 3 dB exchange): 8 h / 2^((90 − 85)/3) = 2.52 h (its table: 90 dB(A), 2 h 31 min).
    const e = check({ operatorLpaDb: 90, operatorHoursPerDay: 2 }).exposure!;
    expect(Math.abs(e.dailyExposureDb - 83.98)).toBeLessThan(TOLERANCE_DB);
    expect(e.band).toBe('lower action value');
    expect(Math.abs(e.hoursTo85 - 2.52)).toBeLessThan(TOLERANCE_DB);
  });

  it('LpA 103 dB(A) for 2 h a day reaches the limit value; 85 dB(A) is reached after 7.5 min', () => {
    // ISO 9612:2009: 103 + 10·lg(2/8) = 96.98; Directive 2003/10/EC Art. 3: ≥ 87 → exposure limit value.
    // NIOSH 98-126 table: 103 dB(A), 7 min 30 s = 0.125 h.
    const e = check({ operatorLpaDb: 103, operatorHoursPerDay: 2 }).exposure!;
    expect(Math.abs(e.dailyExposureDb - 96.98)).toBeLessThan(TOLERANCE_DB);
    expect(e.band).toBe('limit value');
    expect(e.hoursTo85).toBeCloseTo(0.125, 9);
  });

  it('LpA 85 dB(A) for 8 h gives L_EX,8h 85.0, the upper action value, 8 h to 85 dB(A)', () => {
    // ISO 9612:2009: Te = T0 gives L_EX,8h = L_Aeq; Directive 2003/10/EC Art. 3: 85 = upper action value; NIOSH 98-126: 85 dB(A), 8 h.
    const e = check({ operatorLpaDb: 85, operatorHoursPerDay: 8 }).exposure!;
    expect(e.dailyExposureDb).toBeCloseTo(85, 9);
    expect(e.band).toBe('upper action value');
    expect(e.hoursTo85).toBeCloseTo(8, 9);
  });

  it.each([
    [{ operatorLpaDb: 90 }, 'hours missing'],
    [{ operatorHoursPerDay: 4 }, 'LpA missing'],
    [{ operatorLpaDb: NaN, operatorHoursPerDay: 4 }, 'LpA unreadable'],
    [{ operatorLpaDb: 90, operatorHoursPerDay: 0 }, 'no hours'],
    [{ operatorLpaDb: 90, operatorHoursPerDay: 25 }, 'more than a day'],
  ] as [Partial<Candidate>, string][])('no exposure figure when %o (%s)', (over) => {
    expect(check(over).exposure).toBeUndefined();
  });
});

describe('candidateChecks', () => {
  const demo = demoProject();
  const ev = evaluateProject(demo);
  const checks = candidateChecks(demo, ev);

  it('candidateChecks gives one entry per candidate id', () => {
    expect(Object.keys(checks).sort()).toEqual(demo.candidates.map((c) => c.id).sort());
  });

  it('candidateChecks with the evaluation agrees with candidateChecks without it (the same rated LWA the predictions used)', () => {
    expect(candidateChecks(demo)).toEqual(checks);
  });

  it('candidateChecks of the demo exercises every check: a stand-in, an over-permissible level, a penalty, exposure', () => {
    // Dumper item 3 of Art. 12, P ≤ 55 kW → 101 dB (Directive 2000/14/EC as amended by 2005/88/EC).
    expect(checks['dump-unlisted']).toMatchObject({
      standIn: true,
      ratedLwaDb: 101,
      permissible: { levelDb: 101, stage: 'II' },
    });
    // Excavator 120 kW, worked by hand: 80 + 11·lg 120 = 102.87 → 103; declared 105 is over by 2.0 dB.
    expect(checks['dig-21t']).toMatchObject({ overPermissible: true, permissible: { levelDb: 103 } });
    expect(checks['slab-rig-breaker']!.penaltyDb).toBe(3);
    expect(checks['wall-petrol-saw']!.exposure?.band).toBe('limit value');
    // A walk-behind vibratory plate over 3 kW is Stage II indicative only (2005/88/EC): Stage I 8 < P ≤ 70 kW → 109 dB.
    expect(checks['mat-plate']).toMatchObject({
      overPermissible: false,
      permissible: { levelDb: 109, stage: 'I (Stage II indicative only)' },
    });
  });

  it('candidateChecks of an empty project is empty', () => {
    expect(candidateChecks({ ...demo, candidates: [] })).toEqual({});
  });
});

describe('candidateChecks properties', () => {
  const categories = ARTICLE_12_TYPES.map((t) => t.category);

  it('the stand-in never applies when a declared level exists', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 30, max: 160, noNaN: true }),
        fc.constantFrom(...categories),
        fc.double({ min: 0.5, max: 500, noNaN: true }),
        fc.constantFrom('guaranteed', 'measured') as fc.Arbitrary<'guaranteed' | 'measured'>,
        fc.constantFrom('declared', 'permissible-stand-in') as fc.Arbitrary<Candidate['lwaOrigin']>,
        (lwaDb, directiveCategory, quantity, levelBasis, lwaOrigin) => {
          const r = check(
            { lwaDb, directiveCategory, netPowerKw: quantity, directiveQuantity: quantity, lwaOrigin },
            { levelBasis },
          );
          return r.standIn === false && r.ratedLwaDb === lwaDb;
        },
      ),
    );
  });

  it('exposure rises with hours and with level', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 40, max: 130, noNaN: true }),
        fc.double({ min: 0.1, max: 12, noNaN: true }),
        fc.double({ min: 0.01, max: 5, noNaN: true }),
        (level, hours, more) => {
          const lex = (l: number, h: number) =>
            check({ operatorLpaDb: l, operatorHoursPerDay: h }).exposure!.dailyExposureDb;
          return lex(level + more, hours) > lex(level, hours) && lex(level, hours + more) > lex(level, hours);
        },
      ),
    );
  });

  it('a penalty never lowers a level: the contribution with it is the contribution without it plus penaltyDb ≥ 0', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 60, max: 140, noNaN: true }),
        fc.constantFrom(0, 3, 6) as fc.Arbitrary<0 | 3 | 6>,
        fc.constantFrom('tonal', 'impulsive') as fc.Arbitrary<Candidate['character']>,
        (lwaDb, penalty, character) => {
          const p = project({ characterPenaltyDb: penalty });
          p.candidates = [
            candidate({ id: 'a1', dutyId: 'u1', lwaDb }),
            candidate({ id: 'b1', dutyId: 'u2', lwaDb: 100 }),
          ];
          const plain = evaluateProject(p).contributionDb('a1', 'r1');
          p.candidates[0]!.character = character;
          const withPenalty = evaluateProject(p).contributionDb('a1', 'r1');
          const penaltyDb = checkCandidate(p, p.candidates[0]!).penaltyDb;
          return penaltyDb >= 0 && withPenalty >= plain && Math.abs(withPenalty - plain - penaltyDb) < 1e-9;
        },
      ),
      { numRuns: 50 },
    );
  });
});
