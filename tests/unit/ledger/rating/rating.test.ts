import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  characterPenaltyDb,
  declaredRatedLwaDb,
  mayBeOffBasis,
  ratedSoundPower,
} from '../../../../src/ledger/rating/rating.ts';
import { checkPermissible } from '../../../../src/ledger/rating/permissible.ts';
import { operatorExposure } from '../../../../src/ledger/checks/operator-exposure.ts';
import type { Candidate, ProjectSettings } from '../../../../src/ledger/model/model.ts';

const settings: ProjectSettings = {
  referenceDistanceM: 10,
  characterPenaltyDb: 3,
  levelBasis: 'guaranteed',
  decimalSeparator: '.',
};

function candidate(over: Partial<Candidate> = {}): Candidate {
  return {
    id: 'c1',
    dutyId: 'd1',
    label: 'Test machine',
    category: 'excavator',
    declaration: 'guaranteed',
    lwaOrigin: 'declared',
    character: 'none',
    energy: 'diesel',
    source: 'test',
    cost: { kind: 'hire', dayRate: 100 },
    runningPerDay: 0,
    fixedCharges: 0,
    lwaDb: 100,
    ...over,
  };
}

describe('ratedSoundPower (ISO 4871:1996 declarations)', () => {
  it('a guaranteed value is used as declared on the guaranteed basis', () => {
    expect(ratedSoundPower(candidate({ lwaDb: 103 }), settings).lwaDb).toBe(103);
  });
  it('a measured pair (101, K 2) rates at 103 on the guaranteed basis (ISO 4871: Ld = L + K)', () => {
    const r = ratedSoundPower(candidate({ lwaDb: 101, declaration: 'measured', uncertaintyDb: 2 }), settings);
    expect(r.lwaDb).toBe(103);
    expect(r.explanation).toContain('K 2.0');
  });
  it('a measured pair rates at L on the measured basis', () => {
    expect(
      ratedSoundPower(candidate({ lwaDb: 101, declaration: 'measured', uncertaintyDb: 2 }), {
        ...settings,
        levelBasis: 'measured',
      }).lwaDb,
    ).toBe(101);
  });
  it('a guaranteed value with K rates at Ld − K on the measured basis (ISO 4871: L = Ld − K)', () => {
    expect(
      ratedSoundPower(candidate({ lwaDb: 105, uncertaintyDb: 3 }), { ...settings, levelBasis: 'measured' }).lwaDb,
    ).toBe(102);
  });
  it('no declared LWA: the Directive 2000/14/EC permissible level stands in (excavator 100 kW: 80 + 11·lg 100 = 102, Art. 12 item 4)', () => {
    const r = ratedSoundPower(
      candidate({ lwaDb: undefined, directiveCategory: 'excavator', netPowerKw: 100 }),
      settings,
    );
    expect(r.lwaDb).toBe(102);
    expect(r.standIn).toBe(true);
  });
  it('no declared LWA and no directive type: not computed (NaN), never 0', () => {
    const r = ratedSoundPower(candidate({ lwaDb: undefined }), settings);
    expect(r.lwaDb).toBeNaN();
    expect(r.standIn).toBe(false);
  });
  it('an unreadable LWA (NaN) is not computed', () => {
    expect(ratedSoundPower(candidate({ lwaDb: NaN }), settings).lwaDb).toBeNaN();
  });
});

describe('characterPenaltyDb', () => {
  it.each([0, 3, 6] as const)('a tonal candidate draws the project penalty of %d dB', (p) => {
    expect(characterPenaltyDb(candidate({ character: 'tonal' }), { ...settings, characterPenaltyDb: p })).toBe(p);
  });
  it('a candidate without character draws no penalty', () => {
    expect(characterPenaltyDb(candidate(), settings)).toBe(0);
  });
  it('a penalty never lowers a level (property)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('none', 'tonal', 'impulsive') as fc.Arbitrary<Candidate['character']>,
        fc.constantFrom(0, 3, 6) as fc.Arbitrary<0 | 3 | 6>,
        (character, p) => {
          return characterPenaltyDb(candidate({ character }), { ...settings, characterPenaltyDb: p }) >= 0;
        },
      ),
    );
  });
});

describe('checkPermissible', () => {
  it('flags an excavator of 100 kW declared at 104 dB as over its 102 dB permissible level (Directive 2000/14/EC Art. 12 item 4)', () => {
    const r = checkPermissible(candidate({ lwaDb: 104, directiveCategory: 'excavator', netPowerKw: 100 }));
    expect(r.permissible?.levelDb).toBe(102);
    expect(r.overPermissible).toBe(true);
  });
  it('a measured pair is compared as L + K (ISO 4871; the directive limits guaranteed levels)', () => {
    expect(
      checkPermissible(
        candidate({
          lwaDb: 101,
          declaration: 'measured',
          uncertaintyDb: 1.5,
          directiveCategory: 'excavator',
          netPowerKw: 100,
        }),
      ).overPermissible,
    ).toBe(true);
  });
  it('an Article 13 type has no permissible level and says so', () => {
    const r = checkPermissible(candidate({ directiveCategory: 'piling-rig' }));
    expect(r.permissible).toBeUndefined();
    expect(r.note).toMatch(/Article 13/);
  });
  it('a breaker without its mass asks for the mass', () => {
    expect(checkPermissible(candidate({ directiveCategory: 'hand-held-breaker' })).note).toMatch(/mass/);
  });
});

describe('operatorExposure', () => {
  it('LpA 90 dB(A) for 2 h a day gives L_EX,8h 84.0 and the lower action value (ISO 9612; Directive 2003/10/EC Art. 3)', () => {
    const e = operatorExposure(candidate({ operatorLpaDb: 90, operatorHoursPerDay: 2 }));
    expect(e?.dailyExposureDb).toBeCloseTo(83.98, 2);
    expect(e?.band).toBe('lower action value');
  });
  it('no LpA gives no exposure figure', () => {
    expect(operatorExposure(candidate())).toBeUndefined();
  });
});

describe('declaredRatedLwaDb: the number of ratedSoundPower without its words', () => {
  it('equals ratedSoundPower(...).lwaDb for any declared LWA, K, declaration and basis (random; reference: the full rating)', () => {
    const k = fc.oneof(
      fc.constant(undefined),
      fc.constant(null),
      fc.constant(NaN),
      fc.double({ min: 0, max: 6, noNaN: true }),
    );
    fc.assert(
      fc.property(
        fc.oneof(fc.double({ min: 60, max: 130, noNaN: true }), fc.constantFrom(NaN, Infinity, undefined, null)),
        k,
        fc.constantFrom('guaranteed', 'measured'),
        fc.constantFrom('guaranteed', 'measured'),
        (lwaDb, uncertaintyDb, declaration, levelBasis) => {
          const c = { lwaDb, uncertaintyDb, declaration } as unknown as Candidate;
          const settings = { levelBasis } as ProjectSettings;
          const fast = declaredRatedLwaDb(c, levelBasis);
          const full = ratedSoundPower(c, settings, () => undefined);
          if (typeof lwaDb === 'number' && Number.isFinite(lwaDb)) expect(fast).toBe(full.lwaDb);
          else expect(fast).toBeUndefined();
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe('mayBeOffBasis: false only where ratedSoundPower sets no offBasis', () => {
  it('never false for a candidate the full rating marks off the basis (random; reference: the full rating)', () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.double({ min: 60, max: 130, noNaN: true }), fc.constantFrom(NaN, Infinity, undefined, null)),
        fc.oneof(fc.constantFrom(undefined, null, NaN), fc.double({ min: 0, max: 6, noNaN: true })),
        fc.constantFrom('guaranteed', 'measured'),
        fc.constantFrom('guaranteed', 'measured'),
        (lwaDb, uncertaintyDb, declaration, levelBasis) => {
          const c = { lwaDb, uncertaintyDb, declaration } as unknown as Candidate;
          const full = ratedSoundPower(c, { levelBasis } as ProjectSettings, () => 100);
          if (full.offBasis !== undefined) expect(mayBeOffBasis(c, levelBasis)).toBe(true);
        },
      ),
      { numRuns: 500 },
    );
  });
});
