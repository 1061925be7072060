import { describe, expect, it } from 'vitest';
import { suggestField, suggestMapping } from '../../../../src/io/import/index.ts';

// Header wordings as they appear in supplier and hire lists (common practice of the trade).
describe('suggestField(header) maps header words to candidate fields', () => {
  it.each([
    ['LWA', 'lwaDb'],
    ['L_WA', 'lwaDb'],
    ['L(WA) dB', 'lwaDb'],
    ['LWA dB(A)', 'lwaDb'],
    ['Sound power level', 'lwaDb'],
    ['Sound power (dB)', 'lwaDb'],
    ['Noise dB(A)', 'lwaDb'],
    ['Guaranteed LWA', 'lwaDb'],
    ['Sound power (W)', 'soundPowerW'],
    ['Acoustic power, watts', 'soundPowerW'],
    ['LpA at 10 m', 'pressureDb'],
    ['Sound pressure @ 7m', 'pressureDb'],
    ['Measurement distance (m)', 'pressureDistanceM'],
    ['LpA operator', 'operatorLpaDb'],
    ['Operator ear dB(A)', 'operatorLpaDb'],
    ['Operator hours', 'operatorHoursPerDay'],
    ['K', 'uncertaintyDb'],
    ['Uncertainty K (dB)', 'uncertaintyDb'],
    ['kW', 'netPowerKw'],
    ['Net power', 'netPowerKw'],
    ['Engine power (kW)', 'netPowerKw'],
    ['Rate per day', 'dayRate'],
    ['Day rate £', 'dayRate'],
    ['£/day', 'dayRate'],
    ['Daily hire', 'dayRate'],
    ['Weekly rate', 'weekRate'],
    ['Rate £/week', 'weekRate'],
    ['Monthly hire €', 'monthRate'],
    ['Price', 'price'],
    ['Purchase price (EUR)', 'price'],
    ['Fuel', 'energy'],
    ['Fuel type', 'energy'],
    ['Fuel cost £/day', 'runningPerDay'],
    ['Delivery & collection', 'fixedCharges'],
    ['Label', 'label'],
    ['Model', 'label'],
    ['Machine', 'label'],
    ['Category', 'category'],
    ['Plant type', 'category'],
    ['Source', 'source'],
    ['Data sheet ref.', 'source'],
    ['Character', 'character'],
    ['Directive 2000/14 type', 'directiveCategory'],
    ['Service life (days)', 'lifeDays'],
    ['Resale value', 'resaleValue'],
    ['LWA origin', 'lwaOrigin'],
    ['LWA obtained as', 'lwaOrigin'],
    ['Source of LWA', 'source'],
    ['Power source', 'energy'],
    ['Cost basis (hire / purchase)', 'costKind'],
    ['Running per day, per unit', 'runningPerDay'],
    ['Pinned (must use)', 'pinned'],
    ['Excluded (must not use)', 'excluded'],
    ['Duty', 'dutyRef'],
    ['Directive quantity (kg, cm or kW)', 'directiveQuantity'],
    ['Size for limit (kg, cm or kW)', 'directiveQuantity'],
    ['63 Hz', 'band63'],
    ['1 kHz', 'band1000'],
    ['8k', 'band8000'],
  ] as const)('suggestField(%j) is %s', (header, field) => {
    expect(suggestField(header)).toBe(field);
  });

  it.each(['', 'Notes', 'Colour', '__proto__', 'constructor'])('suggestField(%j) is null', (header) => {
    expect(suggestField(header)).toBeNull();
  });
});

describe('suggestMapping(headers)', () => {
  it('suggestMapping gives each field to its first column only', () => {
    expect(suggestMapping(['Model', 'LWA', 'LWA (repeat)', 'Day rate', null, 'Notes'])).toEqual([
      'label',
      'lwaDb',
      null,
      'dayRate',
      null,
      null,
    ]);
  });
});
