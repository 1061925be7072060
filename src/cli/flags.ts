/**
 * Flag parsing for the command line. Every command declares its flags; anything
 * else is refused with a one-line message naming the flag, the value and what is
 * accepted (a {@link UsageError}, exit code 2).
 */
import { parseArgs } from 'node:util';
import type { NumberRule } from '../ledger/validate/field-checks.ts';

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

export interface ParsedFlags {
  values: Record<string, string | boolean | undefined>;
  positionals: string[];
}

/** Parses argv against the flag specs; unknown flags and missing values are usage errors. */
export function parseFlags(argv: readonly string[], specs: FlagSpecs, positionals = 0): ParsedFlags {
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

/** A plain decimal number read from text, or NaN (hexadecimal, "Infinity", words). */
export function parseDecimal(text: string): number {
  const t = text.trim();
  return DECIMAL.test(t) ? Number(t) : NaN;
}

/** Whether a number lies in a rule's range (and is whole when the rule says so). */
export function inRange(rule: NumberRule, n: number): boolean {
  if (!Number.isFinite(n)) return false;
  if (rule.min !== undefined && (rule.aboveMin ? n <= rule.min : n < rule.min)) return false;
  if (rule.max !== undefined && n > rule.max) return false;
  return !rule.integer || Number.isInteger(n);
}

/**
 * A flag's value as a number. Only plain decimal numbers are read (no hexadecimal, no
 * "Infinity"); with a rule, the value must also lie in its range (the project file's
 * ranges, `ledger/validate/validate-rules.ts`) and be whole when the rule says so.
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
  const text = raw.trim();
  const n = DECIMAL.test(text) ? Number(text) : NaN;
  if (!Number.isFinite(n))
    throw new UsageError(`--${name}: ${JSON.stringify(raw)} is not a number (give ${rule.accepted})`);
  const below = rule.min !== undefined && (rule.aboveMin ? n <= rule.min : n < rule.min);
  const above = rule.max !== undefined && n > rule.max;
  if (below || above) throw new UsageError(`--${name}: ${text} is out of range (give ${rule.accepted})`);
  if (rule.integer && !Number.isInteger(n))
    throw new UsageError(`--${name}: ${text} is not a whole number (give ${rule.accepted})`);
  return n;
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
export function helpText(usage: string, summary: string, specs: FlagSpecs): string {
  const rows = Object.entries(specs).map(([k, s]) => {
    const left = `  --${k}${s.value ? ` ${s.value}` : ''}`;
    return `${left.padEnd(34)} ${s.help}`;
  });
  return `${usage}\n\n${summary}\n\nFlags:\n${rows.join('\n')}\n`;
}
