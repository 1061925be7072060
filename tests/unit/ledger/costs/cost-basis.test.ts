/** Switching a machine between hire and purchase keeps both sets of figures (project file version 9). */
import { describe, expect, it } from 'vitest';
import { freshCost, withCostBasis } from '../../../../src/ledger/costs/cost-basis.ts';
import { parseProjectFile, serializeProject } from '../../../../src/ledger/file/project-file.ts';
import { validateProject } from '../../../../src/ledger/validate/validate.ts';
import type { Candidate } from '../../../../src/ledger/model/model.ts';
import { twoDutyProject } from '../fixtures.ts';

function hired(project = twoDutyProject()): Candidate {
  const c = project.candidates[0]!;
  return { ...c, cost: { kind: 'hire', dayRate: 420, weekRate: 1900, monthRate: 6200 } };
}

describe('withCostBasis', () => {
  it('switching to purchase sets the hire rates aside; switching back restores them exactly as typed', () => {
    const c = hired();
    const bought = withCostBasis(c, 'purchase');
    expect(bought.cost.kind).toBe('purchase');
    expect(bought.setAsideCost).toEqual({ kind: 'hire', dayRate: 420, weekRate: 1900, monthRate: 6200 });
    const priced: Candidate = {
      ...bought,
      cost: { kind: 'purchase', price: 85000, lifeDays: 1800, resaleValue: 20000 },
    };
    const back = withCostBasis(priced, 'hire');
    expect(back.cost).toEqual({ kind: 'hire', dayRate: 420, weekRate: 1900, monthRate: 6200 });
    expect(back.setAsideCost).toEqual({ kind: 'purchase', price: 85000, lifeDays: 1800, resaleValue: 20000 });
    expect(withCostBasis(back, 'purchase').cost).toEqual(priced.cost);
  });

  it('a basis never filled in starts not filled in (NaN, resale 0), and validation says "not filled in", never "NaN"', () => {
    const p = twoDutyProject();
    const c = hired(p);
    expect(withCostBasis(c, 'purchase').cost).toEqual(freshCost('purchase'));
    p.candidates[0] = withCostBasis(c, 'purchase');
    const messages = validateProject(p).map((x) => x.message);
    expect(messages.some((m) => /price: not filled in/.test(m))).toBe(true);
    expect(messages.join('\n')).not.toMatch(/NaN/);
  });

  it('the same candidate when it is already on that basis', () => {
    const c = hired();
    expect(withCostBasis(c, 'hire')).toBe(c);
  });

  it('set-aside figures survive a project file: written, read back, and restored with an unread amount as NaN', () => {
    const p = twoDutyProject();
    const aside = withCostBasis({ ...hired(p), cost: { kind: 'hire', dayRate: NaN } }, 'purchase');
    p.candidates[0] = { ...aside, cost: { kind: 'purchase', price: 85000, lifeDays: 1800, resaleValue: 20000 } };
    const read = parseProjectFile(serializeProject(p));
    if (!('project' in read)) throw new Error('not read');
    expect(read.project.candidates[0]!.setAsideCost).toEqual({ kind: 'hire', dayRate: null });
    expect(validateProject(read.project)).toEqual(validateProject(p));
    const back = withCostBasis(read.project.candidates[0]!, 'hire');
    expect(back.cost.kind === 'hire' && Number.isNaN(back.cost.dayRate)).toBe(true);
  });

  it('validation refuses set-aside figures that are not numbers, naming the field', () => {
    const p = twoDutyProject();
    p.candidates[0] = { ...p.candidates[0]!, setAsideCost: { kind: 'hire', dayRate: 'lots' as unknown as number } };
    expect(validateProject(p).map((x) => x.path)).toContain('$.candidates[0].setAsideCost.dayRate');
  });
});
