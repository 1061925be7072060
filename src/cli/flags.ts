/**
 * Flag parsing for the command line. Every command declares its flags; anything
 * else is refused with a one-line message naming the flag, the value and what is
 * accepted (a {@link UsageError}, exit code 2).
 */
import { parseArgs } from 'node:util';
import type { NumberRule } from '../ledger/validate/field-checks.ts';
import { readNumberCell, type DecimalSeparator, type ReadRule } from '../ledger/catalogue/index.ts';

export type { NumberRule };

/** A mistake in how the command was called. Printed alone, exit code 2. */
export class UsageError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UsageError';
  }
}

export interface FlagSpec {
  /** 'string' flags take a value; 'boolean' flags do not. */
  type: 'string' | 'boolean';
  /** Shown in --help: what the value is, e.g. "<dB>". */
  value?: string;
  /** Shown in --help. */
  help: string;
}

export type FlagSpecs = Record<string, FlagSpec>;

/**
 * The flag every command takes: numbers written with a decimal comma, as a spreadsheet in a
 * European locale writes them ("12,5 m", "1.250,5"). It applies to every number a flag takes
 * and to delimited text the command reads (a supplier list, octave bands).
 */
export const DECIMAL_COMMA = 'decimal-comma';
const DECIMAL_COMMA_SPEC: FlagSpec = {
  type: 'boolean',
  help: 'read numbers with a decimal comma ("12,5 m", "1.250,5"), in flags and in delimited text read',
};

/** The decimal separator the command reads numbers with: a comma with --decimal-comma, else a point. */
export function separatorOf(values: ParsedFlags['values']): DecimalSeparator {
  return values[DECIMAL_COMMA] === true ? ',' : '.';
}

export interface ParsedFlags {
  values: Record<string, string | boolean | undefined>;
  positionals: string[];
}

/** Parses argv against the flag specs; unknown flags and missing values are usage errors. */
export function parseFlags(argv: readonly string[], commandSpecs: FlagSpecs, positionals = 0): ParsedFlags {
  const specs: FlagSpecs = { ...commandSpecs, [DECIMAL_COMMA]: DECIMAL_COMMA_SPEC };
  // Joins "--flag value" into "--flag=value" so values such as "-4" are not read as flags.
  const joined: string[] = [];
  const seen = new Set<string>();
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i] as string;
    if (!arg.startsWith('--')) {
      joined.push(arg);
      continue;
    }
    const name = arg.slice(2).split('=')[0] as string;
    const spec = Object.hasOwn(specs, name) ? specs[name] : undefined;
    if (!spec) {
      const known = Object.keys(specs)
        .map((k) => `--${k}`)
        .join(', ');
      throw new UsageError(`${arg}: unknown flag (accepted: ${known})`);
    }
    if (seen.has(name)) throw new UsageError(`--${name}: given more than once (give it once)`);
    seen.add(name);
    if (spec.type === 'string' && !arg.includes('=')) {
      const next = argv[i + 1];
      if (next === undefined || (next.startsWith('--') && next.length > 2)) {
        throw new UsageError(`--${name}: missing value (give ${spec.value ?? 'a value'} after it)`);
      }
      joined.push(`${arg}=${next}`);
      i++;
    } else {
      joined.push(arg);
    }
  }
  const options: Record<string, { type: 'string' | 'boolean' }> = Object.create(null) as Record<
    string,
    { type: 'string' | 'boolean' }
  >;
  for (const [k, s] of Object.entries(specs)) options[k] = { type: s.type };
  let parsed;
  try {
    parsed = parseArgs({ args: joined, options, allowPositionals: true, strict: true, allowNegative: false });
  } catch (e) {
    throw new UsageError((e as Error).message.split('\n')[0] ?? 'could not read the flags');
  }
  if (parsed.positionals.length > positionals) {
    const extra = parsed.positionals[positionals] as string;
    throw new UsageError(
      positionals === 0
        ? `${JSON.stringify(extra)}: unexpected argument (this command takes flags only; see --help)`
        : `${JSON.stringify(extra)}: unexpected argument (this command takes ${positionals} file name${positionals > 1 ? 's' : ''}; see --help)`,
    );
  }
  const values = Object.create(null) as ParsedFlags['values'];
  for (const [k, v] of Object.entries(parsed.values)) values[k] = v as string | boolean | undefined;
  return { values, positionals: parsed.positionals };
}

/** A plain decimal number: optional sign, digits with an optional point, optional exponent. No hex, no "Infinity", no "1_000". */
const DECIMAL = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/** A flag's rule as the catalogue's reader takes it: the range, wholeness, unit words and signs. */
export function flagReadRule(rule: NumberRule): ReadRule {
  return {
    accepted: rule.accepted,
    ...(rule.min !== undefined ? { min: rule.min } : {}),
    ...(rule.max !== undefined ? { max: rule.max } : {}),
    ...(rule.aboveMin ? { minExclusive: true } : {}),
    ...(rule.integer ? { whole: true } : {}),
    ...(rule.suffixes ? { suffixes: rule.suffixes } : {}),
    ...(rule.prefixes ? { prefixes: rule.prefixes } : {}),
  };
}

/**
 * A number given as a flag's value, read as the grid reads a cell (`ledger/catalogue/read-number.ts`):
 * a decimal point, thousands marks between groups of three digits, the unit words of the
 * rule ("104 dB(A)", "12 m", "6 h") and a currency sign on money; no hexadecimal, no
 * "Infinity". Refused with the grid's words for what is wrong, naming the flag: `--lw: "loud"
 * is not a number (give …)`, `--lw: 160 is out of range (give …)`.
 */
export function readFlagNumber(name: string, raw: string, rule: NumberRule, separator: DecimalSeparator = '.'): number {
  const reading = readNumberCell(raw, separator, flagReadRule(rule));
  if (reading.ok) return reading.value;
  const text = raw.trim();
  const shown = DECIMAL.test(text) ? text : JSON.stringify(raw);
  const comma =
    separator === '.' && readNumberCell(raw, ',', flagReadRule(rule)).ok
      ? `; for a decimal comma add --${DECIMAL_COMMA}`
      : '';
  throw new UsageError(`--${name}: ${shown} ${reading.problem} (give ${rule.accepted}${comma})`);
}

/**
 * A flag's value as a number, read by {@link readFlagNumber}; with a rule, the value must
 * also lie in its range (the project file's ranges, `ledger/validate/validate-rules.ts`, from
 * the field catalogue) and be whole when the rule says so.
 */
export function numberFlag(
  values: ParsedFlags['values'],
  name: string,
  accepted: string | NumberRule,
): number | undefined {
  const raw = Object.hasOwn(values, name) ? values[name] : undefined;
  if (raw === undefined) return undefined;
  const rule: NumberRule = typeof accepted === 'string' ? { accepted } : accepted;
  if (typeof raw !== 'string') throw new UsageError(`--${name}: missing value (give ${rule.accepted})`);
  return readFlagNumber(name, raw, rule, separatorOf(values));
}

/**
 * The decimal separator of delimited text a command reads: `--decimal . | ,` when given, a
 * comma with --decimal-comma, else undefined (found from the cells). The two disagreeing is refused.
 */
export function textSeparatorOf(values: ParsedFlags['values']): DecimalSeparator | undefined {
  const given = values.decimal;
  if (given !== undefined && given !== '.' && given !== ',')
    throw new UsageError(`--decimal: ${JSON.stringify(given)} is not accepted (give . or ,)`);
  if (given === '.' && values[DECIMAL_COMMA] === true)
    throw new UsageError(`--decimal: "." disagrees with --${DECIMAL_COMMA} (give one of them)`);
  return given ?? (values[DECIMAL_COMMA] === true ? ',' : undefined);
}

/**
 * Guards a computed result: a value that is not a finite number (e.g. a distance so small
 * that 4πr² underflows) is refused naming the flag that led to it.
 */
export function finiteResult(value: number, flag: string, given: string, accepted: string): number {
  if (!Number.isFinite(value))
    throw new UsageError(`--${flag}: ${given} gives a result that is not a finite number (${value}); give ${accepted}`);
  return value;
}

/** A flag that must be present. */
export function requiredNumber(values: ParsedFlags['values'], name: string, accepted: string | NumberRule): number {
  const n = numberFlag(values, name, accepted);
  if (n === undefined)
    throw new UsageError(`--${name}: missing (give ${typeof accepted === 'string' ? accepted : accepted.accepted})`);
  return n;
}

/** Formats the --help text of a command from its specs. */
export function helpText(usage: string, summary: string, commandSpecs: FlagSpecs): string {
  const specs: FlagSpecs = { ...commandSpecs, [DECIMAL_COMMA]: DECIMAL_COMMA_SPEC };
  const rows = Object.entries(specs).map(([k, s]) => {
    const left = `  --${k}${s.value ? ` ${s.value}` : ''}`;
    return `${left.padEnd(34)} ${s.help}`;
  });
  return `${usage}\n\n${summary}\n\nFlags:\n${rows.join('\n')}\n`;
}
