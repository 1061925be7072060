/**
 * The quick-calculation commands run for real: `node src/cli/bin.mjs <command> …`,
 * checking standard output, standard error and the exit code.
 */
import { describe, expect as globalExpect, it } from 'vitest';
import { execFile } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));

interface Run {
  code: number | null;
  out: string;
  err: string;
}

/** Runs `ledger <args>` as a child process (tests run concurrently: each start-up takes seconds). */
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

/** A bad-input answer: exit 2, nothing on stdout, exactly one line on stderr, no stack trace. */
function expectOneLineRefusal(expect: typeof globalExpect, r: Run, pattern: RegExp): void {
  expect(r.code).toBe(2);
  expect(r.out).toBe('');
  expect(r.err.trimEnd().split('\n')).toHaveLength(1);
  expect(r.err).not.toMatch(/\n\s+at /);
  expect(r.err).toMatch(pattern);
}

describe.concurrent('ledger level', () => {
  it('prints 63.0 dB(A) for LWA 105 dB at 50 m with the default Q = 2, and the ±3 dB caution', async ({ expect }) => {
    // common practice: 105 − 20·lg 50 − 7.98 = 63.04
    const r = await ledger('level', '--lw', '105', '--distance', '50');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^63\.0 dB\(A\)/);
    // Spreading 10·lg(2/(4π·50²)) = 10·lg(6.366e-5) = −41.96 dB, worked by hand (common practice).
    expect(r.out).toMatch(/Point-source spreading 10·lg\(Q\/\(4πr²\)\), Q = 2, r = 50\.0 m\s+-42\.0 dB/);
    // The caution in full: ISO 9613-2:1996 Table 5 (±3 dB up to 1 km) and where it states nothing.
    expect(r.out).toContain(
      'Predictions are estimates (ISO 9613-2 quotes ±3 dB up to 1 km, and states no accuracy beyond 1 km, above 30 m mean height or for screened or reflected paths); a competent acoustician and the local authority’s rules decide.',
    );
    expect(r.err).toBe('');
  });
  it('--json prints level and the terms used, with façade, screening, on-time and count', async ({ expect }) => {
    const r = await ledger(
      'level',
      '--lw',
      '100',
      '--distance',
      '10',
      '--q',
      '1',
      '--count',
      '10',
      '--on-time',
      '50',
      '--facade',
      '--screening',
      'hidden',
      '--json',
    );
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out) as Record<string, number>;
    expect(Object.keys(out)).toEqual(['level', 'method', 'lw', 'spreading', 'count', 'onTime', 'facade', 'screening']);
    expect(out.count).toBeCloseTo(10, 2); // common practice: ten units +10 dB
    expect(out.onTime).toBeCloseTo(-3.01, 2); // common practice: 10·lg 0.5
    expect(out.facade).toBe(3); // common practice: façade +3 dB
    expect(out.screening).toBe(-10); // common practice: fully hidden −10 dB
    // common practice: 100 − 20 − 10.99 + 10 − 3.01 + 3 − 10 = 68.99 (Q = 1, r = 10 m)
    expect(out.level).toBeCloseTo(69.0, 1);
  });
  it("--method iso9613-2 --json with --lw gives the standard's terms with its signs (general method at 500 Hz over hard ground)", async ({
    expect,
  }) => {
    const r = await ledger('level', '--lw', '105', '--distance', '100', '--method', 'iso9613-2', '--json');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out) as Record<string, unknown>;
    expect(out.adiv).toBe(51); // ISO 9613-2:1996 eq. 7: 20·lg 100 + 11 = 51, an attenuation, positive
    expect(out.aatm).toBe(0.19); // eq. 8 with α(500 Hz, 10 °C, 70 %) = 1.9 dB/km (ISO 9613-2:1996 Table 2, from memory): 0.19
    // Table 3 by hand, G = 0, h_s 1.5, h_r 4, d_p ≈ 100 m ≤ 30·5.5 so q = 0: A_gr = −1.5 − 1.5 + 0 = −3 (a gain)
    expect(out.agr).toBe(-3);
    expect(out.dc).toBe(0); // general method: D_Ω = 0, the reflection is in A_gr (clause 7.3.1)
    expect(out.dOmega).toBe(0);
    expect(out.groundMethod).toBe('general');
    // eq. 3 by hand: 105 + 0 − (51 + 0.19 − 3) = 56.81
    expect(out.level).toBe(56.81);
    expect(out.accuracyDb).toBe(3); // Table 5: mean height 2.75 m, 100 m: ±3 dB
  });
  it('--ground-method alternative gives eq. 10 and D_Ω as part of D_c, and warns over hard ground', async ({
    expect,
  }) => {
    const r = await ledger(
      'level',
      '--lw',
      '105',
      '--distance',
      '200',
      '--method',
      'iso9613-2',
      '--ground-method',
      'alternative',
      '--json',
    );
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out) as Record<string, unknown>;
    expect(out.agr).toBe(4.29); // eq. 10 by hand: 4.8 − (2·2.75/200)·(17 + 300/200) = 4.291
    // eq. 11 by hand: d_p² = 40000 − 6.25; 10·lg{1 + (39993.75 + 6.25)/(39993.75 + 30.25)} = 3.009
    expect(out.dOmega).toBe(3.01);
    expect(out.dc).toBe(3.01);
    expect((out.notes as string[]).join(' ')).toMatch(
      /Alternative ground method .* G = 0: the standard meant it for ground that is mostly porous/,
    );
  });
  it('--c0 2 at 200 m gives C_met = 1.45 dB, subtracted (eq. 22)', async ({ expect }) => {
    const r = await ledger('level', '--lw', '105', '--distance', '200', '--method', 'iso9613-2', '--c0', '2', '--json');
    const out = JSON.parse(r.out) as Record<string, number>;
    expect(out.cmet).toBe(1.45); // eq. 22 by hand: 2·(1 − 10·5.5/199.98) = 1.450
  });
  it('--method iso9613-2 with --bands gives a bands table and no single A-weighted A terms', async ({ expect }) => {
    const r = await ledger(
      'level',
      '--bands',
      '95,98,101,102,100,97,93,88',
      '--distance',
      '200',
      '--method',
      'iso9613-2',
      '--ground',
      '1',
      '--hs',
      '1',
      '--hr',
      '4',
      '--temperature',
      '15',
      '--humidity',
      '50',
      '--barrier-path-difference',
      '1',
      '--json',
    );
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out) as Record<string, unknown>;
    for (const k of ['adiv', 'aatm', 'agr', 'abar']) expect(out).not.toHaveProperty(k);
    const bands = out.bands as {
      hz: number;
      lw: number;
      dc: number;
      adiv: number;
      agr: number;
      abar: number;
      dz: number;
      a: number;
      lp: number;
    }[];
    expect(bands.map((b) => b.hz)).toEqual([63, 125, 250, 500, 1000, 2000, 4000, 8000]);
    const b63 = bands[0]!;
    expect(b63.adiv).toBe(57.02); // eq. 7 by hand: 20·lg 200 + 11 = 57.02
    expect(b63.agr).toBe(-3.75); // Table 3 at 63 Hz, G = 1: A_s = A_r = −1.5, A_m = −3q with q = 1 − 30·5/199.98 = 0.2499: −3.75
    expect(b63.abar).toBeCloseTo(b63.dz + 3.75, 1); // eq. 12: A_bar = D_z − A_gr
    // L_p = L_w + D_c − A in every band (eq. 3)
    for (const b of bands) expect(b.lp).toBeCloseTo(b.lw + b.dc - b.a, 1);
    expect(out.accuracyDb).toBeNull(); // Table 5 excludes screened paths
    expect(out.lpA).toBe(out.level);
  });
  it('refuses a barrier together with a rule-of-thumb screening under ISO 9613-2, with one line', async ({
    expect,
  }) => {
    expectOneLineRefusal(
      expect,
      await ledger(
        'level',
        '--lw',
        '105',
        '--distance',
        '100',
        '--method',
        'iso9613-2',
        '--screening',
        'hidden',
        '--barrier-path-difference',
        '1',
      ),
      /^ledger level: --screening: "hidden" given together with --barrier-path-difference/,
    );
  });
  it('under ISO 9613-2 a hidden machine over hard ground: D_z = 10 replaces A_gr, A_bar = 10 − (−3) = 13', async ({
    expect,
  }) => {
    const r = await ledger(
      'level',
      '--lw',
      '105',
      '--distance',
      '100',
      '--method',
      'iso9613-2',
      '--screening',
      'hidden',
      '--json',
    );
    const out = JSON.parse(r.out) as Record<string, number>;
    expect(out.dz).toBe(10); // rule of thumb, hidden: 10 dB (common practice), taken as D_z
    expect(out.abar).toBe(13); // eq. 12 by hand: 10 − (−3) = 13
    expect(out).not.toHaveProperty('screening');
    expect(out.level).toBe(43.81); // eq. 3 by hand: 105 − (51 + 0.19 − 3 + 13) = 43.81
  });
  it('--help describes the flags and exits 0', async ({ expect }) => {
    const r = await ledger('level', '--help');
    expect(r.code).toBe(0);
    expect(r.out).toContain('--barrier-path-difference');
    expect(r.out).toContain('--ground-method <general|alternative>');
    expect(r.out).toContain('Lp = Lw + D_c − A − C_met'); // ISO 9613-2:1996 eqs 3, 4, 6
    expect(r.out).toMatch(/states no accuracy beyond 1 km/); // Table 5
  });
  it.for<[string[], RegExp]>([
    [
      ['level', '--lw', '100', '--distance', '5', '--speed', '3'],
      /^ledger level: --speed: unknown flag \(accepted: --lw, /,
    ],
    [['level', '--lw', '100', '--distance'], /^ledger level: --distance: missing value \(give <m> after it\)/],
    [
      ['level', '--lw', 'loud', '--distance', '5'],
      /^ledger level: --lw: "loud" is not a number \(give a sound power level in dB from 40 to 150/,
    ],
    [
      ['level', '--lw', '100', '--distance', '-3'],
      /^ledger level: --distance: -3 is out of range \(give a distance in metres above 0/,
    ],
    [
      ['level', '--lw', '100', '--distance', '5', '--on-time', '120'],
      /^ledger level: --on-time: 120 is out of range \(give a percentage above 0 and up to 100, e.g. 60\)/,
    ],
    [
      ['level', '--lw', '100', '--distance', '5', '--q', '3'],
      /^ledger level: --q: 3 is not accepted \(use 1 free field, 2 on hard ground/,
    ],
    [
      ['level', '--lw', '100', '--distance', '5', '--method', 'iso9613-2', '--humidity', '5'],
      /^ledger level: --humidity: 5 is out of range \(give a relative humidity from 10 to 100 %/,
    ],
    [
      ['level', '--lw', '100', '--distance', '5', '--method', 'quick'],
      /^ledger level: --method: "quick" is not accepted \(give simple or iso9613-2\)/,
    ],
    [
      ['level', '--lw', '100', '--distance', '5', '--hs', '2'],
      /^ledger level: --hs: applies to --method iso9613-2 only/,
    ],
    [['level', '--distance', '5'], /^ledger level: --lw: missing \(give an A-weighted sound power level in dB/],
    [
      ['level', '--lw', '100', '--distance', '5', '--screening', 'lots'],
      /^ledger level: --screening: "lots" is not accepted \(give a reduction in dB from 0 to 40/,
    ],
  ])('ledger %j refuses with one line: %s', async ([args, pattern], { expect }) => {
    expectOneLineRefusal(expect, await ledger(...args), pattern);
  });
});

describe.concurrent('ledger absorption', () => {
  it('--json keys the eight bands "63" … "8000" and matches ISO 9613-2:1996 Table 2 at 20 °C, 70 % (from memory)', async ({
    expect,
  }) => {
    const r = await ledger('absorption', '--temperature', '20', '--humidity', '70', '--json');
    expect(r.code).toBe(0);
    const out = JSON.parse(r.out) as Record<string, number>;
    expect(Object.keys(out)).toEqual(['63', '125', '250', '500', '1000', '2000', '4000', '8000']);
    expect(Math.abs((out['1000'] as number) - 5.0)).toBeLessThanOrEqual(0.05); // ISO 9613-2:1996 Table 2, 20 °C 70 %: 5.0 dB/km (from memory)
    expect(Math.abs((out['8000'] as number) - 76.6)).toBeLessThanOrEqual(0.05); // same row: 76.6 dB/km (from memory)
  });
  it('prints a table in dB/km', async ({ expect }) => {
    const r = await ledger('absorption', '--temperature', '10', '--humidity', '70');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/8000 Hz\s+117 dB\/km/); // ISO 9613-2:1996 Table 2, 10 °C 70 %: 117 dB/km (from memory)
  });
  it.for<[string[], RegExp]>([
    [
      ['absorption', '--temperature', '60', '--humidity', '50'],
      /^ledger absorption: --temperature: 60 is out of range \(give a temperature from -20 to 50 °C/,
    ],
    [
      ['absorption', '--temperature', '20'],
      /^ledger absorption: --humidity: missing \(give a relative humidity from 10 to 100 %/,
    ],
    [
      ['absorption', '--temperature', '20', '--humidity', '50', '--pressure', '300'],
      /^ledger absorption: --pressure: 300 is out of range/,
    ],
  ])('ledger %j refuses with one line: %s', async ([args, pattern], { expect }) => {
    expectOneLineRefusal(expect, await ledger(...args), pattern);
  });
});

describe.concurrent('ledger power', () => {
  it('--watts 1 prints 120.0 dB', async ({ expect }) => {
    const r = await ledger('power', '--watts', '1');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^120\.0 dB re 1 pW/); // common practice: 1 W is 120 dB
  });
  it('--lw 100 prints 0.01 W', async ({ expect }) => {
    const r = await ledger('power', '--lw', '100');
    expect(r.code).toBe(0);
    expect(r.out).toBe('0.01 W\n'); // common practice: 100 dB re 1 pW = 10^-2 W
  });
  it.for<[string[], RegExp]>([
    [['power'], /^ledger power: --watts: missing/],
    [['power', '--watts', '0'], /^ledger power: --watts: 0 is out of range \(give a sound power in watts from 1e-12/],
    [['power', '--watts', '1', '--lw', '120'], /^ledger power: --lw: given together with --watts/],
  ])('ledger %j refuses with one line: %s', async ([args, pattern], { expect }) => {
    expectOneLineRefusal(expect, await ledger(...args), pattern);
  });
});

describe.concurrent('ledger back', () => {
  it('--lp 80 --distance 10 (Q = 2) prints 108.0 dB', async ({ expect }) => {
    // common practice: Lw = Lp + 20·lg r + 10.99 − 10·lg Q = 80 + 20 + 7.98
    const r = await ledger('back', '--lp', '80', '--distance', '10');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/^108\.0 dB re 1 pW/);
  });
  it('--q 1 at 0.282 m gives Lw = Lp', async ({ expect }) => {
    const r = await ledger('back', '--lp', '90', '--distance', '0.2821', '--q', '1');
    expect(r.out).toMatch(/^90\.0 dB/); // common practice: Lp = Lw at r = 1/√(4π) ≈ 0.282 m for Q = 1
  });
  it.for<[string[], RegExp]>([
    [['back', '--lp', '80', '--distance', '0'], /^ledger back: --distance: 0 is out of range/],
    [['back', '--lp', '80', '--distance', '10', '--q', '5'], /^ledger back: --q: 5 is not accepted/],
  ])('ledger %j refuses with one line: %s', async ([args, pattern], { expect }) => {
    expectOneLineRefusal(expect, await ledger(...args), pattern);
  });
});
