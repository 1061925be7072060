/**
 * The machine fields chosen from a fixed list: the stored values, the label each shows in the
 * grid, and the words a supplier list may use for it. The grid (`app/tables/candidates.ts`,
 * `app/register/register-table.ts`), the importer (`io/import/fields.ts`) and validation
 * read the lists here.
 */
import type { Candidate } from '../model/model.ts';
import type { ChoiceField } from './field.ts';

export const DECLARATION: ChoiceField<Candidate['declaration']> = {
  path: 'declaration',
  choices: [
    { value: 'guaranteed', label: 'guaranteed', words: ['guaranteed', 'declared', 'ld', 'marking', 'g'] },
    { value: 'measured', label: 'measured + K', words: ['measured', 'l', 'm', 'test'] },
  ],
  header: 'Declared as',
  describe: 'how the LWA is declared: guaranteed (a maximum), measured (a typical value, plus K) or estimated',
  importLabel: 'Declared as (guaranteed/measured)',
  workbookHeader: 'Declaration (guaranteed / measured)',
};

export const LWA_ORIGIN: ChoiceField<Candidate['lwaOrigin']> = {
  path: 'lwaOrigin',
  choices: [
    { value: 'declared', label: 'declared', words: ['declared', 'marking', 'data sheet'] },
    { value: 'from-watts', label: 'from watts', words: ['from watts', 'watts'] },
    { value: 'from-pressure', label: 'from pressure', words: ['from pressure', 'pressure', 'back calculated'] },
    {
      value: 'permissible-stand-in',
      label: 'permissible stand-in',
      words: ['permissible stand in', 'stand in', 'permissible'],
    },
  ],
  header: 'LWA obtained as',
  describe:
    'declared (marking or data sheet), worked from a sound power in watts, worked back from a pressure level measured at a distance, or the Directive 2000/14/EC permissible level standing in',
  importLabel: 'LWA obtained as (declared/watts/pressure)',
  workbookHeader: 'LWA obtained as',
  formerHeaders: ['LWA origin'],
};

export const CHARACTER: ChoiceField<Candidate['character']> = {
  path: 'character',
  choices: [
    { value: 'none', label: 'none', words: ['none', 'no', 'n', 'broadband', 'neither'] },
    { value: 'tonal', label: 'tonal', words: ['tonal', 'tone', 'tones', 't'] },
    { value: 'impulsive', label: 'impulsive', words: ['impulsive', 'impulse', 'impact', 'i', 'percussive'] },
  ],
  header: 'Character',
  describe: 'none, tonal or impulsive; tonal and impulsive machines draw the project’s character penalty at receivers',
  importLabel: 'Tonal/impulsive character',
  workbookHeader: 'Character (none / tonal / impulsive)',
};

export const ENERGY: ChoiceField<Candidate['energy']> = {
  path: 'energy',
  choices: [
    { value: 'diesel', label: 'diesel', words: ['diesel', 'gas oil', 'hvo', 'red diesel', 'd'] },
    { value: 'petrol', label: 'petrol', words: ['petrol', 'gasoline', 'unleaded', 'p'] },
    { value: 'electric', label: 'electric', words: ['electric', 'electricity', 'mains', 'e', 'elec'] },
    { value: 'battery', label: 'battery', words: ['battery', 'battery electric', 'cordless', 'bev'] },
    { value: 'hybrid', label: 'hybrid', words: ['hybrid', 'diesel electric', 'diesel/electric'] },
    { value: 'other', label: 'other', words: ['other', 'lpg', 'gas', 'hydrogen', 'manual'] },
  ],
  header: 'Power source',
  describe: 'what drives the machine: diesel, electric, battery, hybrid…; counted by an electric-share clause',
  importLabel: 'Power source (fuel or energy)',
  workbookHeader: 'Power source',
  formerHeaders: ['Energy'],
};

export const COST_KIND: ChoiceField<Candidate['cost']['kind']> = {
  path: 'cost.kind',
  choices: [
    { value: 'hire', label: 'hire', words: ['hire', 'rent', 'rental', 'hired'] },
    { value: 'purchase', label: 'purchase', words: ['purchase', 'buy', 'bought', 'own', 'owned'] },
  ],
  header: 'Cost basis',
  describe: 'hire (day, week and month rates) or purchase (price spread over the working life, less resale)',
  importLabel: 'Cost basis (hire/purchase)',
  workbookHeader: 'Cost basis (hire / purchase)',
};

/** The choices as the grid takes them: value and label. */
export function gridChoices<T extends string>(field: ChoiceField<T>): { value: T; label: string }[] {
  return field.choices.map((c) => ({ value: c.value, label: c.label }));
}
