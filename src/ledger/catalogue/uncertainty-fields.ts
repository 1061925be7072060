/**
 * The settings of the model that says how sure compliance is (the project's `uncertainty`,
 * each optional; the defaults are in `uncertainty/settings.ts`). Each range is chosen with the
 * reason beside it. Validation (`uncertainty/validate-uncertainty.ts`), the Settings pane, the
 * workbook's confidence sheet (`io/workbook/confidence-sheet.ts`), the command line's `--draws`
 * and `--seed` and `static/project.schema.json` read them.
 */
import type { UncertaintySettings } from '../model/model.ts';
import type { NumberField } from './field.ts';
import { DB_SUFFIXES } from './suffixes.ts';

const factor = (
  path: string,
  accepted: string,
  why: string,
  header: string,
  describe: string,
  workbookHeader: string,
): NumberField => ({ path, unit: '', min: 0.5, max: 4, suffixes: [], accepted, why, header, describe, workbookHeader });

const accuracy = (path: string, header: string, describe: string, workbookHeader: string): NumberField => ({
  path,
  unit: 'dB',
  min: 0,
  max: 20,
  suffixes: DB_SUFFIXES,
  accepted: 'an accuracy in ± dB from 0 to 20, e.g. 3',
  why: 'ISO 9613-2:1996 Table 5 states ±1 to ±3 dB for its own method; 20 dB is far beyond any prediction method and catches a slipped digit',
  header,
  describe,
  workbookHeader,
});

export const UNCERTAINTY_NUMBERS = {
  defaultKDb: {
    path: 'uncertainty.defaultKDb',
    unit: 'dB',
    min: 0,
    max: 10,
    suffixes: DB_SUFFIXES,
    accepted: 'an uncertainty K in dB from 0 to 10, e.g. 3',
    why: 'the same range as a machine’s declared K: ISO 4871:1996 declarations carry K of about 1.5 to 4 dB in practice (common practice)',
    header: 'K assumed where none is declared',
    describe: 'K assumed for a machine that declares none, dB; the spread only, the levels are unchanged',
    workbookHeader: 'K assumed where none is declared',
  },
  kPerStandardDeviation: factor(
    'uncertainty.kPerStandardDeviation',
    'a factor from 0.5 to 4, e.g. 1.645',
    'K = f·σ: 1.645 for a one-sided 95 % (from memory of ISO 4871:1996); below 0.5 or above 4 standard deviations no declaration is meant',
    'K per standard deviation',
    'how many standard deviations the declared K stands for (K = f·σ; 1.645 one-sided 95 %, from memory of ISO 4871)',
    'K per standard deviation (K = f·σ; from memory of ISO 4871)',
  ),
  simpleMethodAccuracyDb: accuracy(
    'uncertainty.simpleMethodAccuracyDb',
    'Accuracy of the point-source method',
    'accuracy of the point-source method, ± dB',
    'Accuracy of the point-source method (±)',
  ),
  unstatedAccuracyDb: accuracy(
    'uncertainty.unstatedAccuracyDb',
    'Accuracy where ISO 9613-2 Table 5 states none',
    'accuracy of an ISO 9613-2 path outside its Table 5, ± dB',
    'Accuracy of an ISO 9613-2 path outside its Table 5 (±)',
  ),
  accuracyPerStandardDeviation: factor(
    'uncertainty.accuracyPerStandardDeviation',
    'a number of standard deviations from 0.5 to 4, e.g. 2',
    'a stated ± accuracy is commonly read as two standard deviations (about 95 % of predictions within it); the standard does not say, so it is a setting',
    'Standard deviations in a stated accuracy',
    'how many standard deviations a stated ± accuracy stands for',
    'Standard deviations a stated accuracy stands for',
  ),
  draws: {
    path: 'uncertainty.draws',
    unit: '',
    min: 100,
    max: 1_000_000,
    integer: true,
    suffixes: [],
    accepted: 'a whole number of draws from 100 to 1000000, e.g. 10000',
    why: 'fewer than 100 draws give a probability no better than ±5 %; a million take minutes in the browser and add nothing a reviewer could read',
    header: 'Monte Carlo draws',
    describe: 'how many random draws the simulation makes',
    workbookHeader: 'Monte Carlo draws',
  },
  seed: {
    path: 'uncertainty.seed',
    unit: '',
    min: 0,
    max: 4294967295,
    integer: true,
    suffixes: [],
    accepted: 'a whole number from 0 to 4294967295, e.g. 1',
    why: 'the random stream is seeded by a 32-bit whole number; the same seed gives the same figures',
    header: 'Random seed',
    describe: 'the seed of the random stream: the same seed gives the same figures',
    workbookHeader: 'Random seed',
  },
} as const satisfies Record<keyof UncertaintySettings, NumberField>;
