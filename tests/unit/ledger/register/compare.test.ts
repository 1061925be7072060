import { describe, expect, it } from 'vitest';
import { demoRegister } from '../../../../src/ledger/register/demo-register.ts';
import { wholeLifeCost } from '../../../../src/ledger/register/whole-life-cost.ts';
import { compareMachines } from '../../../../src/ledger/register/compare.ts';
import { nonDominated } from '../../../../src/ledger/register/non-dominated.ts';
import { fleetView } from '../../../../src/ledger/register/fleet-view.ts';
import type { RegisterMachine } from '../../../../src/ledger/register/model.ts';

const machine = (id: string): RegisterMachine => demoRegister().machines.find((m) => m.id === id)!;

describe('wholeLifeCost', () => {
  it('owned: (165,000 − 55,000) / 8 years + 95 × 200 days = 32,750 a year', () => {
    // worked by hand: 110,000 / 8 = 13,750; 95 × 200 = 19,000; total 32,750
    const c = wholeLifeCost(machine('m1'), 200);
    expect(c.ownershipPerYear).toBe(13750);
    expect(c.runningPerYear).toBe(19000);
    expect(c.ownedPerYear).toBe(32750);
    expect(c.lifeYears).toBe(8);
  });

  it('a life of 1,600 working days at 200 days a year is 8 years: (158,000 − 40,000) / 8 + 110 × 200 = 36,750', () => {
    // worked by hand: 1600 / 200 = 8 years; 118,000 / 8 = 14,750; 110 × 200 = 22,000
    const c = wholeLifeCost(machine('m3'), 200);
    expect(c.lifeYears).toBe(8);
    expect(c.ownedPerYear).toBe(36750);
    // at 160 days a year the same life lasts 10 years: 11,800 + 17,600 = 29,400 (worked by hand)
    expect(wholeLifeCost(machine('m3'), 160).ownedPerYear).toBe(29400);
  });

  it('hired for 200 days: 7 months + 1 week (25,200 + 1,100) + running 19,000 = 45,300', () => {
    // worked by hand: 200 = 7 × 28 + 4; 7 × 3,600 = 25,200; the 4 days cost less as one week (1,100 < 4 × 320 = 1,280)
    expect(wholeLifeCost(machine('m1'), 200).hiredPerYear).toBe(45300);
  });

  it('no purchase terms or no hire terms give NaN, never zero', () => {
    expect(wholeLifeCost(machine('m5'), 200).hiredPerYear).toBeNaN();
    const { purchase: _p, ...noPurchase } = machine('m1');
    expect(wholeLifeCost(noPurchase, 200).ownedPerYear).toBeNaN();
  });
});

describe('nonDominated', () => {
  it('marks the points no other beats on both', () => {
    // worked by hand: (3, 99) is beaten by (2, 98); (2, 98) and (1, 100) trade cost against noise
    expect(
      nonDominated([
        { cost: 1, noise: 100 },
        { cost: 2, noise: 98 },
        { cost: 3, noise: 99 },
      ]),
    ).toEqual([true, true, false]);
  });
  it('equal points do not beat each other; NaN points take no part', () => {
    expect(
      nonDominated([
        { cost: 1, noise: 100 },
        { cost: 1, noise: 100 },
        { cost: NaN, noise: 90 },
      ]),
    ).toEqual([true, true, false]);
  });
  it('an empty list gives an empty list', () => {
    expect(nonDominated([])).toEqual([]);
  });
});

describe('compareMachines', () => {
  const excavators = compareMachines(demoRegister(), {
    type: 'excavator',
    criterionDb: 65,
    onTimePct: 100,
    workingDaysPerYear: 200,
  });
  const row = (id: string) => excavators.rows.find((r) => r.machineId === id)!;

  it('takes the machines of one directive type', () => {
    expect(excavators.rows.map((r) => r.machineId)).toEqual(['m1', 'm2', 'm3']);
  });

  it('directive margin: permissible 102 dB for a 110 kW excavator', () => {
    // Directive 2000/14/EC Art. 12 (as amended by 2005/88/EC), excavators P > 15 kW: 80 + 11·lg P;
    // worked by hand: 80 + 11 × 2.0414 = 102.46 → rounded 102 dB
    expect(row('m1').permissibleDb).toBe(102);
    expect(row('m1').directiveMarginDb).toBe(0);
    expect(row('m2').directiveMarginDb).toBe(3);
    // 115 kW: 80 + 11 × 2.0607 = 102.67 → 103 dB (worked by hand); LWA 100 → 3 dB under
    expect(row('m3').directiveMarginDb).toBe(3);
  });

  it('reference: the loudest machine unless chosen; m2 against m1: 3 dB, half the footprint, 7.5 dB per 1,000 a year', () => {
    // worked by hand: footprints 2·10^3.7/4 = 0.5 × 5,011.9 = 2,505.9 m² (102 dB) and 0.5 × 2,511.9 = 1,255.9 m² (99 dB);
    // reduction 1,250.0 m² (49.9 %); whole-life cost m2 = 118,000/8 + 92 × 200 = 33,150, extra 400 a year;
    // 3 dB / 0.4 = 7.5 dB per 1,000; 1,250.0 / 0.4 = 3,125.0 m² per 1,000
    expect(excavators.referenceId).toBe('m1');
    expect(row('m1').isReference).toBe(true);
    const a = row('m2').againstReference!;
    expect(a.dbReduction).toBe(3);
    expect(a.areaReductionM2).toBeCloseTo(1250.0, 1);
    expect(a.areaReductionPct).toBeCloseTo(49.9, 1);
    expect(a.extraCostPerYear).toBe(400);
    expect(a.dbPerThousand).toBeCloseTo(7.5, 9);
    expect(a.m2PerThousand).toBeCloseTo(3125.0, 0);
    expect(a.freeWin).toBe(false);
  });

  it('a quieter machine that costs no more is a free win, with no figure per 1,000', () => {
    // worked by hand: against m3 (36,750, 100 dB) m2 costs 3,600 less and is 1 dB quieter
    const c = compareMachines(demoRegister(), {
      type: 'excavator',
      criterionDb: 65,
      onTimePct: 100,
      referenceId: 'm3',
    });
    const a = c.rows.find((r) => r.machineId === 'm2')!.againstReference!;
    expect(a.freeWin).toBe(true);
    expect(a.dbPerThousand).toBeNaN();
  });

  it('marks the machines no other beats on both cost and LWA: m1 and m2, not m3', () => {
    // worked by hand: m3 (36,750, 100 dB) is dearer and louder than m2 (33,150, 99 dB)
    expect(excavators.rows.map((r) => r.nonDominated)).toEqual([true, true, false]);
  });

  it('operator L_EX,8h at the buyer’s hours: 76 dB(A) for 6 h is 74.75 dB(A)', () => {
    // ISO 9612:2009 L_EX,8h = L + 10·lg(Te/8 h); worked by hand: 76 + 10·lg 0.75 = 76 − 1.249 = 74.75
    const c = compareMachines(demoRegister(), {
      type: 'excavator',
      criterionDb: 65,
      onTimePct: 100,
      operatorHoursPerDay: 6,
    });
    expect(c.rows[0]!.exposure!.dailyExposureDb).toBeCloseTo(74.75, 2);
  });

  it('a machine without a declared LWA: the permissible level stands in, marked', () => {
    const register = demoRegister();
    delete register.machines[0]!.lwaDb;
    register.machines[0]!.lwaOrigin = 'permissible-stand-in';
    const r = compareMachines(register, { type: 'excavator', criterionDb: 65, onTimePct: 100 }).rows[0]!;
    expect(r.standIn).toBe(true);
    expect(r.lwaDb).toBe(102);
  });

  it('refuses bad working days and hours with a message naming them', () => {
    expect(() => compareMachines(demoRegister(), { criterionDb: 65, onTimePct: 100, workingDaysPerYear: 0 })).toThrow(
      /working days a year: 0 is out of range/,
    );
    expect(() => compareMachines(demoRegister(), { criterionDb: 65, onTimePct: 100, operatorHoursPerDay: 30 })).toThrow(
      /operator hours a day: 30 is out of range/,
    );
  });
});

describe('fleetView', () => {
  it('100 dB LWA: one excavator over, replaced by the cheapest compliant one (158,000); no compressor over', () => {
    // worked by hand: excavators 102, 99, 100 dB → one over; compliant prices 178,000 and 158,000
    const v = fleetView(demoRegister(), 100);
    const ex = v.rows.find((r) => r.type === 'excavator')!;
    expect(ex).toMatchObject({ machines: 3, over: 1, overIds: ['m1'], replacementId: 'm3', replacementCost: 158000 });
    expect(v.rows.find((r) => r.type === 'compressor')).toMatchObject({ machines: 2, over: 0, replacementCost: 0 });
    expect(v.totalOver).toBe(1);
    expect(v.totalReplacementCost).toBe(158000);
  });

  it('97 dB LWA: no excavator meets it (no replacement), one compressor replaced for 18,000', () => {
    const v = fleetView(demoRegister(), 97);
    expect(v.rows.find((r) => r.type === 'excavator')!.replacementCost).toBeNaN();
    expect(v.typesWithoutReplacement).toEqual(['excavator']);
    expect(v.rows.find((r) => r.type === 'compressor')).toMatchObject({ over: 1, replacementCost: 18000 });
    expect(v.totalReplacementCost).toBe(18000);
  });
});
