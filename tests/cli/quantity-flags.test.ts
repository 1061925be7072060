/**
 * A flag that takes a quantity reads it as the grid reads a cell, through the field
 * catalogue's reader: its unit words ("104 dB(A)", "12 m", "8 h"), thousands marks and
 * currency signs are accepted, and what is refused gets the grid's words for what is wrong.
 * Runs the real `ledger` command.
 */
import { describe, expect, it } from 'vitest';
import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { FLAG_RULES } from '../../src/cli/flag-rules.ts';
import { numberFlag } from '../../src/cli/flags.ts';

const root = fileURLToPath(new URL('../..', import.meta.url));

interface Run {
  code: number | null;
  out: string;
  err: string;
}

function ledger(...args: string[]): Promise<Run> {
  return new Promise((resolve) => {
    execFile(
      process.execPath,
      ['src/cli/bin.mjs', ...args],
      { cwd: root, encoding: 'utf8', timeout: 60_000 },
      (error, stdout, stderr) => {
        const code = error ? (typeof error.code === 'number' ? error.code : null) : 0;
        resolve({ code, out: stdout, err: stderr });
      },
    );
  });
}

describe('quantities with their units on the command line', () => {
  it('level --lw "104 dB" --distance "12 m" gives what --lw 104 --distance 12 gives', async () => {
    const [withUnits, plain] = await Promise.all([
      ledger('level', '--lw', '104 dB', '--distance', '12 m', '--json'),
      ledger('level', '--lw', '104', '--distance', '12', '--json'),
    ]);
    expect(withUnits.code).toBe(0);
    expect(withUnits.out).toBe(plain.out);
    // worked by hand: 104 + 10·lg(2 / (4π·12²)) = 104 − 29.57 = 74.43 dB (hemispherical spreading, Q = 2)
    expect((JSON.parse(withUnits.out) as { level: number }).level).toBeCloseTo(74.43, 2);
  });

  it('exposure --level "85 dB(A)" --hours "8 h" reads both units', async () => {
    const r = await ledger('exposure', '--level', '85 dB(A)', '--hours', '8 h');
    expect(r.code).toBe(0);
    // worked by hand from L_EX,8h = L_Aeq,Te + 10·lg(Te / 8 h) (ISO 9612:2009): 8 h at 85 dB(A) gives 85 dB(A),
    // Directive 2003/10/EC's upper action value (Article 3)
    expect(r.out).toMatch(/^LEX,8h 85\.0 dB\(A\): upper action value/);
  });

  it.each([
    [
      ['level', '--lw', '104,5', '--distance', '12'],
      'ledger level: --lw: "104,5" is not a number with a decimal point (give a sound power level in dB from 40 to 150, e.g. 104.5; for a decimal comma add --decimal-comma)\n',
    ],
    [
      ['level', '--lw', '160 dB', '--distance', '12'],
      'ledger level: --lw: "160 dB" is out of range (give a sound power level in dB from 40 to 150, e.g. 104.5)\n',
    ],
    [
      ['level', '--lw', '104', '--distance', '12 km'],
      'ledger level: --distance: "12 km" is not a number (give a distance in metres above 0, e.g. 45)\n',
    ],
    [
      ['level', '--lw', '104', '--distance', '12', '--count', '2.5 units'],
      'ledger level: --count: "2.5 units" is not a whole number (give a whole number of units from 1 to 1000)\n',
    ],
  ])('ledger %j refuses with the grid’s words', async (args, message) => {
    const r = await ledger(...args);
    expect(r.code).toBe(2);
    expect(r.err).toBe(message);
  });

  it('a sum of money takes thousands marks and a currency sign, as the grid does', () => {
    expect(numberFlag({ budget: '£12,500' }, 'budget', FLAG_RULES.money)).toBe(12500);
    expect(numberFlag({ budget: '12 500 EUR' }, 'budget', FLAG_RULES.money)).toBe(12500);
    expect(() => numberFlag({ budget: '12,5' }, 'budget', FLAG_RULES.money)).toThrow(
      '--budget: "12,5" is not a number with a decimal point (give an amount of money of 0 or more, e.g. 420; for a decimal comma add --decimal-comma)',
    );
  });

  it('eight bands separated by commas or semicolons, each with its unit or not', async () => {
    const [semi, comma] = await Promise.all([
      ledger('level', '--bands', '95 dB;98;101;102;100;97;93;88', '--distance', '10', '--json'),
      ledger('level', '--bands', '95,98,101,102,100,97,93,88', '--distance', '10', '--json'),
    ]);
    expect(semi.code).toBe(0);
    expect(semi.out).toBe(comma.out);
  });
});
