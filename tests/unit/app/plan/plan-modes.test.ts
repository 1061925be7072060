/**
 * What the Site plan tab reads from its text boxes: a barrier's top height, the drawing's
 * scale from two clicked points and the distance typed between them, and north.
 */
import { describe, expect, it } from 'vitest';
import { readNorth, readPlanNumber, readScale } from '../../../../src/app/plan/plan-modes.ts';
import { PLAN_NUMBERS, readCurrencyCode } from '../../../../src/ledger/catalogue/index.ts';

describe('the drawing’s scale', () => {
  const pixels = [
    { x: 10, y: 20 },
    { x: 110, y: 20 },
  ];

  it('is the typed distance over the pixels between the points (worked by hand: 25 m over 100 px is 0.25 m a pixel)', () => {
    expect(readScale(pixels, '25', '.')).toBeCloseTo(0.25, 12);
    expect(readScale(pixels, '25 m', '.')).toBeCloseTo(0.25, 12);
    expect(readScale(pixels, '25,5', ',')).toBeCloseTo(0.255, 12);
  });

  it('refuses a distance of nothing, one that cannot be read, and points at one place, saying what is accepted', () => {
    expect(readScale(pixels, '0', '.')).toBe(
      'Distance: "0" is out of range (use the distance between the two points in metres above 0, e.g. 25)',
    );
    expect(readScale(pixels, 'twenty', '.')).toMatch(/^Distance: "twenty" is not a number \(use the distance/);
    expect(readScale([pixels[0]!, pixels[0]!], '25', '.')).toMatch(/at one place on the drawing/);
    expect(readScale([pixels[0]!], '25', '.')).toMatch(/needs two points/);
  });
});

describe('north and a barrier’s top height', () => {
  it('reads a bearing within one turn either way, with the degree sign', () => {
    expect(readNorth('90', '.')).toBe(90);
    expect(readNorth('-45°', '.')).toBe(-45);
    expect(readNorth('400', '.')).toBe(
      'North: "400" is out of range (use a bearing in degrees from -360 to 360 (0: north is up on the drawing))',
    );
  });

  it('reads a hoarding’s height of 2.4 m (common practice: site hoardings stand about 2–3.6 m) with either separator', () => {
    expect(readPlanNumber(PLAN_NUMBERS.barrierHeightM, 'Barrier height', '2.4 m', '.')).toBe(2.4);
    expect(readPlanNumber(PLAN_NUMBERS.barrierHeightM, 'Barrier height', '2,4', ',')).toBe(2.4);
    expect(readPlanNumber(PLAN_NUMBERS.barrierHeightM, 'Barrier height', '0', '.')).toBe(
      'Barrier height: "0" is out of range (use a barrier top height in metres above 0 and up to 100, e.g. 2.4)',
    );
    expect(readPlanNumber(PLAN_NUMBERS.barrierHeightM, 'Barrier height', '240 cm', '.')).toMatch(/is not a number/);
  });
});

describe('the project’s currency', () => {
  it('takes a three-letter ISO 4217 code in either case and refuses words', () => {
    expect(readCurrencyCode(' eur ')).toEqual({ ok: true, value: 'EUR' });
    expect(readCurrencyCode('pounds')).toEqual({
      ok: false,
      problem: 'is not accepted',
      accepted: 'use an ISO 4217 currency code of three capital letters, e.g. "GBP" or "EUR"',
    });
  });
});
