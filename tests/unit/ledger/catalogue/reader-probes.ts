/**
 * Probes shared by the readers-agree tests: whether a reader takes a value, and the values
 * tried for a field (near each end of its range and anywhere around it).
 */
import fc from 'fast-check';
import type { NumberField } from '../../../../src/ledger/catalogue/index.ts';
import { ProblemList, type NumberRule } from '../../../../src/ledger/validate/field-checks.ts';
import { numberFlag } from '../../../../src/cli/flags.ts';

/** Whether validation of a stored project takes the value. */
export const byValidation = (rule: NumberRule, value: number) => new ProblemList().number('$.x', 'x', value, rule);

/** Whether a command-line flag takes the text. */
export const byFlag = (rule: NumberRule, text: string) => {
  try {
    return numberFlag({ x: text }, 'x', rule) !== undefined;
  } catch {
    return false;
  }
};

/** Values near each end of the range and anywhere around it, with at most one decimal. */
export function values(field: NumberField) {
  const near = fc
    .tuple(fc.constantFrom(field.min, field.max), fc.integer({ min: -20, max: 20 }))
    .map(([edge, step]) => Math.round((edge + step * 0.5) * 10) / 10);
  const around = fc
    .integer({ min: Math.round(field.min * 10) - 2000, max: Math.min(Math.round(field.max * 10) + 2000, 2e10) })
    .map((n) => n / 10);
  return fc.oneof(near, around);
}
