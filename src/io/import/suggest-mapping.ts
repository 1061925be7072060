/**
 * Suggested column mapping from header words. Each rule names a field and a pattern over
 * the header's plain words (see headerWords); the first rule that matches a header wins,
 * so specific rules ("operator LpA", "fuel per day") come before general ones ("LpA",
 * "fuel"). A field is suggested for one column only (the first); the octave bands likewise.
 * The user may change every suggestion. O(columns × rules).
 */
import { OCTAVE_BANDS_HZ } from '../../ledger/model/model.ts';
import type { ImportField, BandField } from './fields.ts';
import { headerWords } from './header-words.ts';
import type { ColumnMapping, RawCell } from './types.ts';

interface Rule {
  field: ImportField;
  pattern: RegExp;
  /** The header must not match this. */
  unless?: RegExp;
  /** The header must also match this. */
  needs?: RegExp;
}

const MONEY_WORDS = /\b(rate|hire|price|cost|charge|gbp|eur|usd)\b|[£€$]/;
const PRESSURE = /\b(lpa|lp|laeq|spl|sound pressure|pressure level|pressure)\b/;

const RULES: readonly Rule[] = [
  { field: 'source', pattern: /\b(source of|data source|source)\b/, unless: /\b(power|energy) source\b/ },
  { field: 'lwaOrigin', pattern: /\b(lwa origin|origin of lwa|lwa from|lwa obtained as)\b/ },
  { field: 'costKind', pattern: /\b(cost basis|hire or purchase|hire per purchase)\b/ },
  { field: 'pinned', pattern: /^pinned\b|\bmust use\b/ },
  { field: 'excluded', pattern: /^excluded\b|\bmust not use\b/ },
  { field: 'dutyRef', pattern: /^duty\b|\bduty id\b|\bduty name\b/ },
  { field: 'directiveQuantity', pattern: /\b(directive quantity|size for limit)\b/ },
  {
    field: 'operatorHoursPerDay',
    pattern: /\b(operator|driver|exposure)\b.*\b(hours|hrs|h)\b|\bhours per day\b|\bexposure time\b/,
  },
  { field: 'operatorLpaDb', pattern: /\b(operator|driver|cab|workstation|work station|ear|seat)\b/ },
  { field: 'uncertaintyDb', pattern: /\buncertainty\b|^k\b|\bk (db|value)\b|\bk$/ },
  { field: 'pressureDistanceM', pattern: /\b(distance|radius)\b/ },
  { field: 'pressureDb', pattern: PRESSURE },
  {
    field: 'soundPowerW',
    pattern: /\b(sound|acoustic) power\b.*\b(w|watt|watts)\b|\bwatts?\b/,
    unless: /\b(db|dba|level|lwa|kw)\b/,
  },
  { field: 'character', pattern: /\b(character|tonal|impulsive|tonality)\b/ },
  { field: 'lwaDb', pattern: /\b(lwa|lw|sound power|noise|sound level|dba|db a|db|decibels?|acoustic)\b/ },
  { field: 'declaration', pattern: /\b(declaration|declared as|value type|guaranteed or measured)\b/ },
  { field: 'runningPerDay', pattern: /\brunning\b/ },
  {
    field: 'runningPerDay',
    pattern: /\b(fuel|energy|electricity)\b/,
    needs: MONEY_WORDS,
    unless: /\b(type|kind|source)\b/,
  },
  {
    field: 'fixedCharges',
    pattern: /\b(delivery|collection|transport|haulage|one off|fixed|mobilisation|mobilization|carriage)\b/,
  },
  { field: 'weekRate', pattern: /\b(week|weekly|wk|wkly)\b/ },
  { field: 'monthRate', pattern: /\b(month|monthly|mth|4 weeks?|28 days?)\b/ },
  { field: 'dayRate', pattern: /\b(day|daily|dayrate)\b/, unless: /\b(life|hours)\b/ },
  { field: 'lifeDays', pattern: /\b(life|lifetime|service life|working life)\b/ },
  { field: 'resaleValue', pattern: /\b(resale|residual|salvage|trade in)\b/ },
  { field: 'price', pattern: /\b(price|purchase|buy|cost|list price|rrp)\b/ },
  {
    field: 'netPowerKw',
    pattern: /\b(kw|power|engine|output|rating)\b/,
    unless: /\b(kva|electric power|source|type)\b/,
  },
  { field: 'directiveQuantity', pattern: /\b(breaker mass|cutting width|kva|electric power|directive quantity)\b/ },
  { field: 'directiveCategory', pattern: /\b(directive|2000 per 14|2000 14|annex|article 12|article 13)\b/ },
  { field: 'energy', pattern: /\b(fuel|energy|power source|drive|propulsion|engine type)\b/ },
  {
    field: 'label',
    pattern: /\b(label|model|machine|name|description|item|product|equipment|plant|unit)\b/,
    unless: /\b(type|category|class|group)\b/,
  },
  { field: 'category', pattern: /\b(category|class|group|type|kind|family)\b/ },
  { field: 'source', pattern: /\b(reference|ref|data sheet|datasheet|document|supplier|manufacturer|origin)\b/ },
];

const BAND_WORDS: readonly [RegExp, BandField][] = OCTAVE_BANDS_HZ.map((hz) => {
  const k = hz >= 1000 ? `(?:${hz}|${hz / 1000} ?k|${hz / 1000} ?khz)` : `${hz}`;
  return [new RegExp(`^(?:lw |band |octave )?${k}(?: ?hz)?(?: db)?$`), `band${hz}` as BandField];
});

/**
 * The field a header suggests, or null.
 * @example suggestField('Sound power (W)') // 'soundPowerW'
 * @example suggestField('L_WA dB(A)') // 'lwaDb'
 * @example suggestField('Rate £/week') // 'weekRate'
 */
export function suggestField(header: string): ImportField | null {
  const words = headerWords(header);
  if (words === '') return null;
  for (const [pattern, field] of BAND_WORDS) if (pattern.test(words)) return field;
  for (const rule of RULES) {
    if (!rule.pattern.test(words)) continue;
    if (rule.unless?.test(words)) continue;
    if (rule.needs && !rule.needs.test(words)) continue;
    // A bare "day"/"week"/"month" column is a rate only if it speaks of money or hire.
    if (
      (rule.field === 'dayRate' || rule.field === 'weekRate' || rule.field === 'monthRate') &&
      !MONEY_WORDS.test(words) &&
      !/\b(daily|weekly|monthly)\b/.test(words)
    )
      continue;
    return rule.field;
  }
  return null;
}

/** Header text of a cell, for matching and display. */
export function headerText(cell: RawCell | undefined): string {
  if (cell === null || cell === undefined) return '';
  return String(cell).trim();
}

/**
 * A suggested mapping for a header row: each column's suggested field, each field used once.
 * @example suggestMapping(['Model', 'LWA dB', 'Day rate £']) // ['label', 'lwaDb', 'dayRate']
 */
export function suggestMapping(headers: readonly RawCell[]): ColumnMapping {
  const used = new Set<ImportField>();
  return headers.map((cell) => {
    const field = suggestField(headerText(cell));
    if (field === null || used.has(field)) return null;
    used.add(field);
    return field;
  });
}
