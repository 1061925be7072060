import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { demoRegister } from '../../../../src/ledger/register/demo-register.ts';
import { parseRegisterFile, serializeRegister } from '../../../../src/ledger/register/register-file.ts';
import { validateRegister } from '../../../../src/ledger/register/validate-register.ts';
import { machinesFromImport } from '../../../../src/ledger/register/from-candidates.ts';
import type { Candidate } from '../../../../src/ledger/model/model.ts';

const schema = JSON.parse(
  readFileSync(fileURLToPath(new URL('../../../../static/register.schema.json', import.meta.url)), 'utf8'),
);

describe('register files', () => {
  it('serializeRegister → parseRegisterFile gives back the same register', () => {
    const register = demoRegister();
    const back = parseRegisterFile(serializeRegister(register));
    expect(back).toEqual({ register });
  });

  it('an unread cell is written as null with its text kept, and read back as NaN', () => {
    const register = { ...demoRegister(), unreadCells: { 'machines/m2/lwaDb': '99,5 dB?' } };
    register.machines[1]!.lwaDb = NaN;
    const text = serializeRegister(register);
    expect(text).toContain('"lwaDb": null');
    const back = parseRegisterFile(text);
    expect('register' in back && back.register.machines[1]!.lwaDb).toBeNaN();
    expect('register' in back && back.register.unreadCells).toEqual({ 'machines/m2/lwaDb': '99,5 dB?' });
    expect(validateRegister('register' in back ? back.register : register)[0]!.message).toBe(
      'Machine "Brackwater E-20 excavator 20 t, low-noise pack", LWA: "99,5 dB?" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
    );
  });

  it('refuses a project file, a newer version and broken JSON with a message saying what is accepted', () => {
    const p = (t: string) =>
      'problems' in parseRegisterFile(t)
        ? (parseRegisterFile(t) as { problems: { message: string }[] }).problems[0]!.message
        : 'read';
    expect(p('{"format":"plant-noise-ledger/project","version":2}')).toBe(
      'Format: "plant-noise-ledger/project" is not a register file (this is a project file; import it as a project)',
    );
    expect(p('{"format":"plant-noise-ledger/register","version":9,"settings":{},"machines":[]}')).toBe(
      'Version: 9 is newer than this program reads (it reads versions 1 to 1; open the file with a newer version of the program)',
    );
    expect(p('{"format": "plant-noise-ledger/register",}')).toBe(
      'Line 1, column 42: expected a property name in double quotes, found "}" (the file must be valid JSON)',
    );
    expect(p('{"format":"plant-noise-ledger/register","version":1,"settings":{},"machines":{}}')).toBe(
      'machines: {} is not a list (use a JSON array [ … ])',
    );
  });

  it('validateRegister finds nothing wrong with the invented register and lists each problem with its path', () => {
    expect(validateRegister(demoRegister())).toEqual([]);
    const bad = demoRegister();
    bad.machines[0]!.purchase!.resaleValue = 200000;
    bad.machines[1]!.id = 'm1';
    bad.settings.workingDaysPerYear = 400;
    const problems = validateRegister(bad);
    expect(problems.map((p) => p.path)).toEqual([
      '$.settings.workingDaysPerYear',
      '$.machines[1].id',
      '$.machines[0].purchase.resaleValue',
    ]);
    expect(problems[2]!.message).toBe(
      'Machine "Tarnfield TX200 excavator 20 t", resale value: 200000 is above the price 165000 (use a resale value from 0 up to the price)',
    );
  });

  it('static/register.schema.json names the format and version and allows every field the invented register uses', () => {
    expect(schema.$schema).toBe('https://json-schema.org/draft/2020-12/schema');
    expect(schema.properties.format.const).toBe('plant-noise-ledger/register');
    expect(schema.properties.version.const).toBe(1);
    const allowed = new Set(Object.keys(schema.$defs.machine.properties));
    for (const m of demoRegister().machines) {
      for (const key of Object.keys(m)) expect(allowed).toContain(key);
      for (const key of schema.$defs.machine.required as string[]) expect(m).toHaveProperty(key);
    }
    for (const key of Object.keys(demoRegister())) expect(Object.keys(schema.properties)).toContain(key);
  });
});

describe('machinesFromImport', () => {
  const candidate = (id: string, cost: Candidate['cost']): Candidate => ({
    id,
    dutyId: '',
    label: `Pump ${id}`,
    category: 'pump',
    lwaDb: 93,
    declaration: 'guaranteed',
    lwaOrigin: 'declared',
    character: 'none',
    energy: 'diesel',
    source: 'list.csv row 2',
    cost,
    runningPerDay: 30,
    fixedCharges: 0,
  });

  it('keeps hire rates as hire terms and a purchase life in days as working days, with fresh ids and unread cells moved', () => {
    const out = machinesFromImport(
      [
        candidate('c1', { kind: 'hire', dayRate: 40, weekRate: 150 }),
        candidate('c2', { kind: 'purchase', price: NaN, resaleValue: 500, lifeDays: 1200 }),
      ],
      { 'candidates/c2/cost.price': 'ask us' },
      ['m1'],
    );
    expect(out.machines.map((m) => m.id)).toEqual(['m2', 'm3']);
    expect(out.machines[0]!.hire).toEqual({ dayRate: 40, weekRate: 150 });
    expect(out.machines[1]!.purchase).toEqual({ price: NaN, resaleValue: 500, life: 1200, lifeUnit: 'working-days' });
    expect(out.unreadCells).toEqual({ 'machines/m3/purchase.price': 'ask us' });
  });
});
