/**
 * Every problem of a register, each with its JSON path and a message in the core's
 * pattern (where, the value, what is wrong, what is accepted). Never throws.
 * O(machines).
 */
import type { DataProblem } from '../model/results.ts';
import { ProblemList, checkIds } from '../validate/field-checks.ts';
import { RULES, validationRule } from '../validate/validate-rules.ts';
import { CURRENCY_CODE, LIFE_UNIT, lifeFieldOf } from '../catalogue/index.ts';
import { CURRENCY_ACCEPTED } from '../validate/validate-rules.ts';
import { checkMachineNoise } from '../validate/machine-checks.ts';
import type { Register } from './model.ts';

type Obj = Record<string, unknown>;
const asObj = (x: unknown): Obj => (typeof x === 'object' && x !== null && !Array.isArray(x) ? (x as Obj) : {});

const ENERGIES = ['diesel', 'petrol', 'electric', 'battery', 'hybrid', 'other'] as const;
const DAYS_PER_YEAR = {
  min: 1,
  max: 366,
  integer: true,
  accepted: 'a whole number of working days a year from 1 to 366, e.g. 200',
};

/** Problems of a register; an empty list when it is fine. */
export function validateRegister(register: Register): DataProblem[] {
  const root = register as unknown as Obj;
  const p = new ProblemList(asObj(root.unreadCells) as Record<string, string>);
  p.text('$.name', 'Register name', root.name, false, 'text, e.g. "Hire fleet 2026"');
  if (typeof root.currency !== 'string' || !CURRENCY_CODE.pattern.test(root.currency))
    p.add('$.currency', 'Currency', root.currency, 'is not accepted', CURRENCY_ACCEPTED);
  const settings = asObj(root.settings);
  if (p.object('$.settings', 'Settings', root.settings)) {
    p.number(
      '$.settings.workingDaysPerYear',
      'Working days a year',
      settings.workingDaysPerYear,
      DAYS_PER_YEAR,
      'settings/-/workingDaysPerYear',
    );
    p.number(
      '$.settings.operatorHoursPerDay',
      'Operator hours a day',
      settings.operatorHoursPerDay,
      RULES.operatorHours,
      'settings/-/operatorHoursPerDay',
    );
  }
  if (!p.list('$.machines', 'Machines', root.machines)) return p.problems;
  const machines = (root.machines as unknown[]).map(asObj);
  checkIds(p, '$.machines', 'Machine', machines, 'label');
  machines.forEach((m, i) => {
    const path = `$.machines[${i}]`;
    const where = `Machine ${typeof m.label === 'string' && m.label.trim() !== '' ? JSON.stringify(m.label) : i + 1}`;
    const cell = (f: string) => `machines/${String(m.id)}/${f}`;
    p.text(`${path}.label`, `${where}, label`, m.label, true, 'a name for the machine, e.g. "Excavator 20 t, stage V"');
    p.text(`${path}.category`, `${where}, category`, m.category, false, 'text, e.g. "excavator 20 t"');
    if (m.directiveCategory !== undefined)
      p.text(
        `${path}.directiveCategory`,
        `${where}, directive type`,
        m.directiveCategory,
        true,
        'a category word, e.g. "excavator"',
      );
    checkMachineNoise(p, path, where, m, cell);
    p.optionalNumber(
      `${path}.operatorLpaDb`,
      `${where}, operator LpA`,
      m.operatorLpaDb,
      RULES.operatorLpaDb,
      cell('operatorLpaDb'),
    );
    p.oneOf(`${path}.character`, `${where}, character`, m.character, ['none', 'tonal', 'impulsive']);
    p.oneOf(`${path}.energy`, `${where}, energy`, m.energy, ENERGIES);
    p.text(
      `${path}.source`,
      `${where}, data source`,
      m.source,
      false,
      'text naming where the data came from, e.g. "data sheet 2025"',
    );
    if (
      m.figureSources !== undefined &&
      p.object(`${path}.figureSources`, `${where}, figure sources`, m.figureSources)
    ) {
      for (const [k, v] of Object.entries(asObj(m.figureSources)))
        p.text(`${path}.figureSources.${k}`, `${where}, source of ${k}`, v, false, 'text');
    }
    p.number(
      `${path}.runningPerDay`,
      `${where}, running cost per day`,
      m.runningPerDay,
      RULES.money,
      cell('runningPerDay'),
    );
    if (m.purchase !== undefined && p.object(`${path}.purchase`, `${where}, purchase`, m.purchase)) {
      const b = asObj(m.purchase);
      const priceOk = p.number(
        `${path}.purchase.price`,
        `${where}, price`,
        b.price,
        RULES.money,
        cell('purchase.price'),
      );
      const resaleOk = p.number(
        `${path}.purchase.resaleValue`,
        `${where}, resale value`,
        b.resaleValue,
        RULES.money,
        cell('purchase.resaleValue'),
      );
      if (
        p.oneOf(
          `${path}.purchase.lifeUnit`,
          `${where}, life unit`,
          b.lifeUnit,
          LIFE_UNIT.choices.map((c) => c.value),
        )
      ) {
        p.number(
          `${path}.purchase.life`,
          `${where}, life`,
          b.life,
          validationRule(lifeFieldOf(b.lifeUnit)),
          cell('purchase.life'),
        );
      }
      if (priceOk && resaleOk && (b.resaleValue as number) > (b.price as number))
        p.add(
          `${path}.purchase.resaleValue`,
          `${where}, resale value`,
          b.resaleValue,
          `is above the price ${String(b.price)}`,
          'use a resale value from 0 up to the price',
        );
    }
    if (m.hire !== undefined && p.object(`${path}.hire`, `${where}, hire`, m.hire)) {
      const h = asObj(m.hire);
      p.number(`${path}.hire.dayRate`, `${where}, day rate`, h.dayRate, RULES.money, cell('hire.dayRate'));
      p.optionalNumber(`${path}.hire.weekRate`, `${where}, week rate`, h.weekRate, RULES.money, cell('hire.weekRate'));
      p.optionalNumber(
        `${path}.hire.monthRate`,
        `${where}, month rate`,
        h.monthRate,
        RULES.money,
        cell('hire.monthRate'),
      );
    }
  });
  return p.problems;
}
