/**
 * An invented register for examples and tests: three 20 t excavators and two site
 * compressors from made-up makers, with made-up prices. No real brand or machine.
 */
import { REGISTER_FORMAT, REGISTER_VERSION, type Register, type RegisterMachine } from './model.ts';

const base = { declaration: 'guaranteed', lwaOrigin: 'declared', character: 'none', energy: 'diesel' } as const;

const MACHINES: RegisterMachine[] = [
  {
    ...base,
    id: 'm1',
    label: 'Tarnfield TX200 excavator 20 t',
    category: 'excavator 20 t',
    directiveCategory: 'excavator',
    netPowerKw: 110,
    lwaDb: 102,
    operatorLpaDb: 76,
    source: 'maker data sheet, invented',
    purchase: { price: 165000, resaleValue: 55000, life: 8, lifeUnit: 'years' },
    hire: { dayRate: 320, weekRate: 1100, monthRate: 3600 },
    runningPerDay: 95,
  },
  {
    ...base,
    id: 'm2',
    label: 'Brackwater E-20 excavator 20 t, low-noise pack',
    category: 'excavator 20 t',
    directiveCategory: 'excavator',
    netPowerKw: 110,
    lwaDb: 99,
    operatorLpaDb: 72,
    source: 'maker data sheet, invented',
    purchase: { price: 178000, resaleValue: 60000, life: 8, lifeUnit: 'years' },
    hire: { dayRate: 360, weekRate: 1250, monthRate: 4000 },
    runningPerDay: 92,
  },
  {
    ...base,
    id: 'm3',
    label: 'Orlin HX21 excavator 20 t',
    category: 'excavator 20 t',
    directiveCategory: 'excavator',
    netPowerKw: 115,
    lwaDb: 100,
    operatorLpaDb: 75,
    source: 'dealer quotation, invented',
    figureSources: { 'purchase.life': 'own records of the previous model' },
    purchase: { price: 158000, resaleValue: 40000, life: 1600, lifeUnit: 'working-days' },
    runningPerDay: 110,
  },
  {
    ...base,
    id: 'm4',
    label: 'Quenby QC-30 compressor, silenced',
    category: 'compressor',
    directiveCategory: 'compressor',
    netPowerKw: 30,
    lwaDb: 96,
    operatorLpaDb: 78,
    source: 'maker data sheet, invented',
    purchase: { price: 18000, resaleValue: 4000, life: 10, lifeUnit: 'years' },
    hire: { dayRate: 70, weekRate: 220, monthRate: 700 },
    runningPerDay: 60,
  },
  {
    ...base,
    id: 'm5',
    label: 'Dallow AirPak 30 compressor',
    category: 'compressor',
    directiveCategory: 'compressor',
    netPowerKw: 30,
    lwaDb: 98,
    operatorLpaDb: 82,
    source: 'marking, invented',
    purchase: { price: 14500, resaleValue: 3000, life: 10, lifeUnit: 'years' },
    runningPerDay: 65,
  },
];

/** A fresh copy of the invented register. */
export function demoRegister(): Register {
  return {
    format: REGISTER_FORMAT,
    version: REGISTER_VERSION,
    name: 'Invented plant register',
    currency: 'GBP',
    settings: { workingDaysPerYear: 200, operatorHoursPerDay: 8 },
    machines: structuredClone(MACHINES),
  };
}
