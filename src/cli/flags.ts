/**
 * Flag parsing for the command line. Every command declares its flags; anything
 * else is refused with a one-line message naming the flag, the value and what is
 * accepted (a {@link UsageError}, exit code 2).
 */
import { parseArgs } from 'node:util';

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
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i] as string;
    if (!arg.startsWith('--')) {
      joined.push(arg);
      continue;
    }
    const name = arg.slice(2).split('=')[0] as string;
    const spec = specs[name];
    if (!spec) {
      const known = Object.keys(specs).map((k) => `--${k}`).join(', ');
      throw new UsageError(`${arg}: unknown flag (accepted: ${known})`);
    }
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
  const options: Record<string, { type: 'string' | 'boolean' }> = {};
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
  return { values: parsed.values as ParsedFlags['values'], positionals: parsed.positionals };
}

/** A flag's value as a number; a word where a number belongs is a usage error. */
export function numberFlag(values: ParsedFlags['values'], name: string, accepted: string): number | undefined {
  const raw = values[name];
  if (raw === undefined) return undefined;
  if (typeof raw !== 'string') throw new UsageError(`--${name}: missing value (give ${accepted})`);
  const text = raw.trim();
  const n = text === '' ? NaN : Number(text);
  if (!Number.isFinite(n)) throw new UsageError(`--${name}: ${JSON.stringify(raw)} is not a number (give ${accepted})`);
  return n;
}

/** A flag that must be present. */
export function requiredNumber(values: ParsedFlags['values'], name: string, accepted: string): number {
  const n = numberFlag(values, name, accepted);
  if (n === undefined) throw new UsageError(`--${name}: missing (give ${accepted})`);
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
