import { describe, expect, it } from 'vitest';
import { dutyCost } from '../../../../src/ledger/costs/cost.ts';
import type { Candidate, Duty } from '../../../../src/ledger/model/model.ts';

const duty = (over: Partial<Duty> = {}): Duty => ({
  id: 'u1',
  name: 'Dig',
  phaseId: 'ph',
  count: 1,
  onTimePct: 50,
  durationDays: 9,
  location: { kind: 'point', x: 0, y: 0 },
  baselineCandidateId: 'c1',
  ...over,
});
const candidate = (over: Partial<Candidate> = {}): Candidate => ({
  id: 'c1',
  dutyId: 'u1',
  label: 'Excavator',
  category: 'excavator',
  lwaDb: 100,
  declaration: 'guaranteed',
  lwaOrigin: 'declared',
  character: 'none',
  energy: 'diesel',
  source: 'test',
  cost: { kind: 'hire', dayRate: 75, weekRate: 420 },
  runningPerDay: 38,
  fixedCharges: 90,
  ...over,
});

describe('dutyCost', () => {
  it('dutyCost of a 9-day hire for 2 units: 2 × (1 week 420 + 2 days × 75 + running 9 × 38 + charges 90) = 2,004', () => {
    // Working (common practice for hire): machine 420 + 150 = 570; running 342; charges 90; per unit 1,002; × 2 = 2,004.
    const c = dutyCost(candidate(), duty({ count: 2 }), 'GBP');
    expect(c.total).toBe(2004);
    expect(c.explanation).toBe('2 units × (1 week £420 + 2 days £75 each + running 9 d × £38 + charges £90) = £2,004');
  });

  it('dutyCost says when a hire is rounded up to a whole week', () => {
    const c = dutyCost(
      candidate({ cost: { kind: 'hire', dayRate: 100, weekRate: 150 }, runningPerDay: 0, fixedCharges: 0 }),
      duty(),
    );
    expect(c.total).toBe(300);
    expect(c.explanation).toContain('covers 14 d, cheaper than 9 d');
  });

  it('dutyCost of a purchase spreads price less resale over the life: (48,000 − 30,000) × 20 / 1,500 = 240', () => {
    // Straight-line spreading of the net cost over the working life (common practice in plant costing).
    const c = dutyCost(
      candidate({
        cost: { kind: 'purchase', price: 48000, lifeDays: 1500, resaleValue: 30000 },
        runningPerDay: 10,
        fixedCharges: 0,
      }),
      duty({ durationDays: 20 }),
    );
    expect(c.total).toBeCloseTo(240 + 200, 9);
    expect(c.explanation).toContain('purchase (£48,000 − resale £30,000) × 20 d / 1500 d life');
  });

  it('dutyCost in a currency without a symbol writes the ISO 4217 code', () => {
    expect(dutyCost(candidate({ runningPerDay: 0, fixedCharges: 0 }), duty(), 'CHF').explanation).toBe(
      '1 week CHF 420 + 2 days CHF 75 each = CHF 570',
    );
  });

  it.each<[string, Partial<Candidate>, Partial<Duty>]>([
    ['a NaN day rate', { cost: { kind: 'hire', dayRate: NaN } }, {}],
    ['a negative running cost', { runningPerDay: -5 }, {}],
    ['a resale above the price', { cost: { kind: 'purchase', price: 100, lifeDays: 10, resaleValue: 200 } }, {}],
    ['a zero life', { cost: { kind: 'purchase', price: 100, lifeDays: 0, resaleValue: 0 } }, {}],
    ['a fractional duration', {}, { durationDays: 2.5 }],
    ['zero units', {}, { count: 0 }],
  ])('dutyCost with %s is NaN with a reason, never 0', (_what, c, d) => {
    const cost = dutyCost(candidate(c), duty(d));
    expect(cost.total).toBeNaN();
    expect(cost.explanation).toMatch(/^not computed: /);
  });
});

describe('a computed cost as data', () => {
  it('gives candidateId, total and explanation to JSON, in that order, like a plain cost', () => {
    // Worked by hand (common practice for hire): 9 days = 1 week £420 + 2 days × £75 = £570; running 9 × £38 = £342;
    // charges £90; one unit: £1,002.
    const c = dutyCost(candidate(), duty(), 'GBP');
    const plain = JSON.parse(JSON.stringify(c)) as Record<string, unknown>;
    expect(Object.keys(plain)).toEqual(['candidateId', 'total', 'explanation']);
    expect(plain.total).toBe(1002);
    expect(plain.explanation).toBe(c.explanation);
    expect(c.explanation).toContain('£1,002');
  });
});
