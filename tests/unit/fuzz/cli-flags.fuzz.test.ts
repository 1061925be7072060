/**
 * Fuzz of the command line's flags (fast-check): whatever is typed, a quick-calculation
 * command either prints finite figures (exit 0) or one line naming what is wrong (exit 2);
 * it never throws, never prints Infinity or NaN, never reads hexadecimal.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { main } from '../../../src/cli/main.ts';
import { numberFlag, UsageError } from '../../../src/cli/flags.ts';
import { FLAG_RULES } from '../../../src/cli/flag-rules.ts';

async function run(argv: string[]) {
  let out = '';
  let err = '';
  const code = await main(argv, { out: (t) => (out += t), err: (t) => (err += t) });
  return { code, out, err };
}

/** Text a user might type for a number: plain, exotic and hostile. */
const numberText = fc.oneof(
  fc.double({ noNaN: false }).map(String),
  fc.integer({ min: -1e6, max: 1e6 }).map(String),
  fc.double({ min: -50, max: 200, noNaN: true }).map((n) => n.toFixed(1)),
  fc.double({ min: -50, max: 200, noNaN: true }).map((n) => n.toFixed(1)),
  fc.constantFrom(
    '0x10',
    '0b11',
    '0o7',
    '1e308',
    '-1e308',
    '1e-300',
    'Infinity',
    '-Infinity',
    'NaN',
    '',
    ' ',
    '1_000',
    '١٢',
    '12,5',
    '+.5',
    '5.',
    '.',
    '-',
    'e5',
    '1e',
    '٣',
  ),
  fc.string({ maxLength: 8 }),
);

describe('numberFlag', () => {
  it('returns a finite number inside the rule’s range, or throws a UsageError naming the flag', () => {
    const rules = Object.values(FLAG_RULES);
    fc.assert(
      fc.property(numberText, fc.integer({ min: 0, max: rules.length - 1 }), (text, k) => {
        const rule = rules[k]!;
        try {
          const n = numberFlag({ x: text }, 'x', rule) as number;
          expect(Number.isFinite(n)).toBe(true);
          if (rule.min !== undefined) expect(n >= rule.min).toBe(true);
          if (rule.max !== undefined) expect(n <= rule.max).toBe(true);
          expect(/^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/.test(text)).toBe(true);
        } catch (e) {
          expect(e).toBeInstanceOf(UsageError);
          expect((e as Error).message.startsWith('--x: ')).toBe(true);
        }
      }),
      { numRuns: 2000 },
    );
  });
});

const flagNames = [
  'lw',
  'distance',
  'count',
  'on-time',
  'q',
  'screening',
  'watts',
  'level',
  'hours',
  'lp',
  'temperature',
  'humidity',
  'pressure',
  'power',
  'bands',
];
const argvFor = (command: string) =>
  fc
    .array(fc.tuple(fc.constantFrom(...flagNames), numberText), { maxLength: 5 })
    .map((pairs) => [command, ...pairs.flatMap(([f, v]) => [`--${f}`, v])]);

describe('quick-calculation commands under random flags', () => {
  it.each(['level', 'power', 'back', 'exposure', 'absorption', 'limit'])(
    'ledger %s: exit 0 with finite figures, or exit 2 with one line',
    async (command) => {
      await fc.assert(
        fc.asyncProperty(argvFor(command), async (argv) => {
          const r = await run(argv);
          expect([0, 2]).toContain(r.code);
          if (r.code === 0) {
            expect(r.out).not.toMatch(/Infinity|NaN/);
            expect(r.err).toBe('');
          } else {
            expect(r.err.trimEnd().split('\n')).toHaveLength(1);
            expect(r.err.startsWith(`ledger ${command}: `)).toBe(true);
          }
        }),
        { numRuns: 300 },
      );
    },
  );
});
