import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { dailyExposureDb, dailyExposureFromTasksDb } from '../../../../src/core/standards/iso9612-2009.ts';
import {
  EXPOSURE_VALUES_DB,
  PEAK_VALUES_DBC,
  exposureBand,
} from '../../../../src/core/standards/directive-2003-10-ec.ts';
import { allowedHours, OSHA_CRITERION } from '../../../../src/core/allowed-exposure-time.ts';
import { exposureFor } from '../../../../src/ledger/checks/operator-exposure.ts';

const TOL = 0.05;

describe('dailyExposureDb (ISO 9612:2009 L_EX,8h = L_Aeq,Te + 10·lg(Te/8 h))', () => {
  it.each([
    // level, hours, expected L_EX,8h — source beside each
    [85, 8, 85.0, 'ISO 9612: Te = T0 gives L_EX,8h = L_Aeq (definition)'],
    [90, 2, 84.0, 'common practice: 2 h at 90 dB(A) ≈ 84 dB(A) (UK exposure ready-reckoner)'],
    [88, 4, 85.0, 'common practice: halving the time lowers exposure by 3 dB'],
    [100, 0.25, 84.9, 'worked by hand: 100 + 10·lg(0.25/8) = 84.95'],
    [80, 10, 81.0, 'worked by hand: 80 + 10·lg(10/8) = 80.97'],
  ])('dailyExposureDb(%d dB, %d h) ≈ %d', (level, hours, expected) => {
    expect(Math.abs(dailyExposureDb(level, hours) - expected)).toBeLessThanOrEqual(TOL + 0.01);
  });

  it('dailyExposureFromTasksDb adds tasks energetically (worked by hand: 2 h at 90 and 6 h at 80 → 10·lg(0.25·10^9 + 0.75·10^8) = 85.1)', () => {
    expect(
      dailyExposureFromTasksDb([
        { levelDb: 90, hours: 2 },
        { levelDb: 80, hours: 6 },
      ]),
    ).toBeCloseTo(85.12, 1);
  });

  it.each([0, -1, 25, NaN])('dailyExposureDb refuses %s hours with a message naming hours', (h) => {
    expect(() => dailyExposureDb(90, h)).toThrow(/hours/);
  });
});

describe('Directive 2003/10/EC Article 3 values', () => {
  it('exposure values are 80, 85 and 87 dB(A) (Directive 2003/10/EC Art. 3(1))', () => {
    expect(EXPOSURE_VALUES_DB).toEqual({ lowerAction: 80, upperAction: 85, limit: 87 });
  });
  it('peak values are 135, 137 and 140 dB(C) (Directive 2003/10/EC Art. 3(1))', () => {
    expect(PEAK_VALUES_DBC).toEqual({ lowerAction: 135, upperAction: 137, limit: 140 });
  });
  it.each([
    [79.9, 'below lower action value'],
    [80, 'lower action value'],
    [84.9, 'lower action value'],
    [85, 'upper action value'],
    [87, 'limit value'],
  ] as const)('exposureBand(%d) is %s (Directive 2003/10/EC Art. 3)', (lex, band) => {
    expect(exposureBand(lex)).toBe(band);
  });
});

describe('allowedHours (NIOSH 98-126: 85 dB(A) criterion, 3 dB exchange rate)', () => {
  // NIOSH Criteria for a Recommended Standard (1998), Table 1-1 of permissible durations.
  it.each([
    [85, 8],
    [88, 4],
    [91, 2],
    [94, 1],
    [97, 0.5],
    [100, 0.25],
    [82, 16],
  ])('allowedHours(%d) is %d h', (level, hours) => {
    expect(allowedHours(level)).toBeCloseTo(hours, 6);
  });
  it('OSHA 29 CFR 1910.95 Table G-16: 95 dB(A) allows 4 h with the 90/5 rule', () => {
    expect(allowedHours(95, OSHA_CRITERION)).toBeCloseTo(4, 6);
  });
});

describe('exposure properties', () => {
  it('exposure rises with hours and with level', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 40, max: 130, noNaN: true }),
        fc.double({ min: 0.1, max: 12, noNaN: true }),
        fc.double({ min: 0.01, max: 5, noNaN: true }),
        (level, hours, more) => {
          const base = exposureFor(level, hours).dailyExposureDb;
          return (
            exposureFor(level + more, hours).dailyExposureDb > base &&
            (hours + more > 24 || exposureFor(level, hours + more).dailyExposureDb > base)
          );
        },
      ),
    );
  });
});
