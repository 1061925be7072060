/**
 * The site plan's numbers and the level map's are read alike everywhere: validation of a
 * stored project, the Site plan tab's reader (`app/plan/plan-modes.ts`) and `ledger map`'s
 * flags all take the range and unit words of `ledger/catalogue/plan-fields.ts`.
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { byFlag, byValidation, values } from './reader-probes.ts';
import { MAP_NUMBERS, PLAN_NUMBERS, fieldAccepts, type NumberField } from '../../../../src/ledger/catalogue/index.ts';
import { PLAN_RULES } from '../../../../src/ledger/validate/validate-plan.ts';
import type { NumberRule } from '../../../../src/ledger/validate/field-checks.ts';
import { readPlanNumber } from '../../../../src/app/plan/plan-modes.ts';
import { FLAG_RULES } from '../../../../src/cli/flag-rules.ts';

const byPlan = (field: NumberField, text: string) => typeof readPlanNumber(field, 'x', text, '.') === 'number';

const STORED: [string, NumberField, NumberRule][] = [
  ['barrier top height', PLAN_NUMBERS.barrierHeightM, PLAN_RULES.barrierHeightM],
  ['drawing north', PLAN_NUMBERS.northDeg, PLAN_RULES.northDeg],
  ['drawing scale', PLAN_NUMBERS.metresPerPixel, PLAN_RULES.metresPerPixel],
  ['drawing size', PLAN_NUMBERS.imagePx, PLAN_RULES.imagePx],
];

describe.each(STORED)('%s: validation and the Site plan tab accept the same values', (_name, field, rule) => {
  it('a number is accepted by both exactly when the catalogue range holds', () => {
    fc.assert(
      fc.property(values(field), (value) => {
        const expected = fieldAccepts(field, value);
        expect(byValidation(rule, value)).toBe(expected);
        expect(byPlan(field, String(value))).toBe(expected);
      }),
      { numRuns: 200 },
    );
  });
});

const MAP: [string, NumberField, NumberRule][] = [
  ['map height', MAP_NUMBERS.pointHeightM, FLAG_RULES.mapHeightM],
  ['map spacing', MAP_NUMBERS.spacingM, FLAG_RULES.mapSpacingM],
  ['isoline step', MAP_NUMBERS.isolineStepDb, FLAG_RULES.isolineStepDb],
];

describe.each(MAP)('%s: the map panel and `ledger map` accept the same text', (_name, field, flag) => {
  it('a number, alone or with a unit word, is accepted by both exactly when the catalogue range holds', () => {
    fc.assert(
      fc.property(values(field), fc.constantFrom('', ...field.suffixes.map((s) => ` ${s}`)), (value, unit) => {
        const text = `${value}${unit}`;
        const expected = fieldAccepts(field, value);
        expect(byPlan(field, text)).toBe(expected);
        expect(byFlag(flag, text)).toBe(expected);
      }),
      { numRuns: 200 },
    );
  });
});
