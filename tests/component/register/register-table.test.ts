/** The register grid's editing: typed text read or kept, purchase terms begun and ended, copies into a project, files merged. */
import { describe, expect, it } from 'vitest';
import { emptyRegister, type Register } from '../../../src/ledger/register/model.ts';
import { demoRegister } from '../../../src/ledger/register/demo-register.ts';
import { validateRegister } from '../../../src/ledger/register/validate-register.ts';
import {
  applyRegisterEdits,
  deleteMachines,
  registerProblems,
  registerTable,
} from '../../../src/app/register/register-table.ts';
import { candidatesFromRegister } from '../../../src/app/register/to-project.ts';
import { mergeRegister } from '../../../src/app/register/register-files.ts';
import { buyerComparison, readField, sortRows, DAYS_RULE } from '../../../src/app/register/buyer-view.ts';
import { blankProject } from '../../../src/app/state/blank-project.ts';

const table = registerTable('.');
const edit = (r: Register, rowId: string | null, columnId: string, text: string, newRow?: number) =>
  applyRegisterEdits(r, table, [{ rowId, columnId, text, ...(newRow !== undefined ? { newRow } : {}) }]);

describe('register grid edits', () => {
  it('typing into an empty register makes the first machine m1; text that cannot be read is kept', () => {
    let r = edit(emptyRegister(), null, 'label', 'Hollin EX-20', 0);
    expect(r.machines.map((m) => [m.id, m.label])).toEqual([['m1', 'Hollin EX-20']]);
    r = edit(r, 'm1', 'lwaDb', '12O');
    expect(r.machines[0]!.lwaDb).toBeNaN();
    expect(r.unreadCells).toEqual({ 'machines/m1/lwaDb': '12O' });
    const problems = registerProblems(r, table, validateRegister(r));
    expect([...problems.values()]).toContain(
      '"Hollin EX-20" (row 1), LWA: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
    );
    r = edit(r, 'm1', 'lwaDb', '103 dB');
    expect(r.machines[0]!.lwaDb).toBe(103);
    expect(r.unreadCells).toBeUndefined();
  });

  it('a price starts purchase terms in years with the rest flagged, not filled in; emptying every amount removes them', () => {
    let r = edit(emptyRegister(), null, 'label', 'Pellow Q20', 0);
    r = edit(r, 'm1', 'price', '£182,000');
    expect(r.machines[0]!.purchase).toEqual({ price: 182000, lifeUnit: 'years' });
    const paths = validateRegister(r).map((p) => p.path);
    expect(paths).toContain('$.machines[0].purchase.resaleValue');
    expect(paths).toContain('$.machines[0].purchase.life');
    r = edit(r, 'm1', 'price', '');
    expect(r.machines[0]!.purchase).toBeUndefined();
    // a life unit of working days chosen by hand is kept even with no amount yet
    r = edit(r, 'm1', 'lifeUnit', 'working days');
    expect(r.machines[0]!.purchase).toEqual({ lifeUnit: 'working-days' });
  });

  it('the life is read with the range of its unit: 8 years, 1600 working days; 1600 in a row kept in years is refused', () => {
    let r = edit(emptyRegister(), null, 'label', 'Pellow Q20', 0);
    r = edit(r, 'm1', 'life', '8 years');
    expect(r.machines[0]!.purchase).toEqual({ life: 8, lifeUnit: 'years' });
    r = edit(r, 'm1', 'life', '1600');
    expect(r.machines[0]!.purchase?.life).toBeNaN();
    expect(r.unreadCells).toEqual({ 'machines/m1/purchase.life': '1600' });
    const problems = registerProblems(r, table, validateRegister(r));
    // ledger/catalogue/register-fields.ts: a life in years above 0 and up to 100
    expect([...problems.values()]).toContain(
      '"Pellow Q20" (row 1), Life: "1600" is out of range (use a working life in years above 0 and up to 100, e.g. 8)',
    );
    r = edit(r, 'm1', 'lifeUnit', 'working days');
    r = edit(r, 'm1', 'life', '1600 days');
    expect(r.machines[0]!.purchase).toEqual({ life: 1600, lifeUnit: 'working-days' });
  });

  it('hire rates start hire terms; deleting a machine drops its unread cells', () => {
    let r = edit(emptyRegister(), null, 'label', 'Garrick 200', 0);
    r = edit(r, 'm1', 'dayRate', '250');
    expect(r.machines[0]!.hire).toEqual({ dayRate: 250 });
    r = edit(r, 'm1', 'netPowerKw', 'lots');
    r = deleteMachines(r, table, ['m1']);
    expect(r.machines).toEqual([]);
    expect(r.unreadCells).toBeUndefined();
  });
});

describe('register machines into a project', () => {
  it('copies remember their register entry and take the next free candidate ids', () => {
    const project = blankProject();
    const { candidates } = candidatesFromRegister(demoRegister(), ['m2', 'm4'], project, 'd1');
    expect(candidates.map((c) => [c.id, c.dutyId, c.registerLink?.machineId])).toEqual([
      ['c1', 'd1', 'm2'],
      ['c2', 'd1', 'm4'],
    ]);
  });
});

describe('the cost a copy carries', () => {
  it('hire on request; a machine without hire terms gets missing amounts, never invented ones', () => {
    const project = blankProject();
    // demo m1 has purchase and hire terms, m3 purchase only (src/ledger/register/demo-register.ts)
    const own = candidatesFromRegister(demoRegister(), ['m1'], project, 'd1').candidates[0]!;
    expect(own.cost.kind).toBe('purchase');
    const [hired, noHire] = candidatesFromRegister(demoRegister(), ['m1', 'm3'], project, 'd1', 'hire').candidates;
    expect(hired!.cost.kind).toBe('hire');
    expect(hired!.registerLink?.basis).toBe('hire');
    expect(noHire!.cost).toEqual({ kind: 'hire', dayRate: NaN });
  });
});

describe('a register file read into a register that holds machines', () => {
  it('adds the machines under free ids, keeps the register’s own settings and says what was renamed', () => {
    const current = { ...emptyRegister('Yard fleet'), machines: [demoRegister().machines[0]!] };
    const { register, message } = mergeRegister(current, demoRegister(), 'supplier.register.json');
    expect(register.name).toBe('Yard fleet');
    expect(register.machines.map((m) => m.id)).toEqual(['m1', 'm6', 'm2', 'm3', 'm4', 'm5']);
    expect(message).toContain('(m1 → m6: ids already in use)');
  });
});

describe('buyer page choices', () => {
  it('a criterion that cannot be read gives a message and no comparison; good choices compare', () => {
    const bad = buyerComparison(
      demoRegister(),
      { type: 'excavator', criterionText: '6S', onTimeText: '100', referenceId: '', costBasis: 'owned' },
      '.',
    );
    expect(bad.comparison).toBeUndefined();
    expect(bad.messages).toEqual(['Criterion: "6S" is not a number (use a level L_Aeq in dB from 20 to 120, e.g. 65)']);
    const good = buyerComparison(
      demoRegister(),
      { type: 'excavator', criterionText: '65', onTimeText: '100', referenceId: '', costBasis: 'owned' },
      '.',
    );
    // the demo's excavators, reference the loudest (m1, 102 dB: tests/unit/register/compare.test.ts)
    expect(good.comparison?.rows.map((r) => r.machineId)).toEqual(['m1', 'm2', 'm3']);
    expect(good.comparison?.referenceId).toBe('m1');
    expect(readField('Working days a year', '200.5', DAYS_RULE, '.')).toEqual({
      message:
        'Working days a year: "200.5" is not a whole number (use a whole number of days from 1 to 366, e.g. 200)',
    });
  });
});

describe('figure sources', () => {
  it('are typed as column: source pairs; a pair naming no column is kept as typed and marked', () => {
    let r = edit(emptyRegister(), null, 'label', 'Hollin EX-20', 0);
    r = edit(r, 'm1', 'figureSources', 'LWA: data sheet 2025; Price: quotation 14/2026');
    expect(r.machines[0]!.figureSources).toEqual({ lwaDb: 'data sheet 2025', 'purchase.price': 'quotation 14/2026' });
    expect(table.columns.find((c) => c.id === 'figureSources')!.display(r.machines[0]!)).toBe(
      'LWA: data sheet 2025; Price: quotation 14/2026',
    );
    r = edit(r, 'm1', 'figureSources', 'noise from the yard');
    expect(r.machines[0]!.figureSources).toEqual({ lwaDb: 'data sheet 2025', 'purchase.price': 'quotation 14/2026' });
    expect(r.unreadCells).toEqual({ 'machines/m1/figureSources': 'noise from the yard' });
  });
});

describe('sorting the comparison', () => {
  it('sorts by a figure either way, figures not known always last', () => {
    const c = buyerComparison(
      demoRegister(),
      { type: '', criterionText: '65', onTimeText: '100', referenceId: '', costBasis: 'owned' },
      '.',
    ).comparison!;
    // demo hire terms: m3 and m5 have none, so their hired cost is not known (demo-register.ts)
    expect(
      sortRows(c.rows, 'hired', false)
        .map((r) => r.machineId)
        .slice(-2)
        .sort(),
    ).toEqual(['m3', 'm5']);
    expect(
      sortRows(c.rows, 'hired', true)
        .map((r) => r.machineId)
        .slice(-2)
        .sort(),
    ).toEqual(['m3', 'm5']);
    // LWA of the demo: m4 96, m5 98, m2 99, m3 100, m1 102
    expect(sortRows(c.rows, 'lwa', false).map((r) => r.machineId)).toEqual(['m4', 'm5', 'm2', 'm3', 'm1']);
  });
});
