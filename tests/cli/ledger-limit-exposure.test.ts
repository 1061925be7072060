import { describe, expect, it } from 'vitest';
import { runLedger } from './run-ledger.ts';

describe('ledger limit', () => {
  it('ledger limit --type excavator --power 100 prints 102 dB (Directive 2000/14/EC Art. 12 item 4: 80 + 11·lg 100)', () => {
    const r = runLedger(['limit', '--type', 'excavator', '--power', '100']);
    expect(r.code).toBe(0);
    expect(r.stdout.split('\n')[0]).toBe('102 dB');
  });

  it('ledger limit --json gives the level (Directive 2000/14/EC Art. 12 item 8: 95 + 2·lg 40 = 98.2 → 98)', () => {
    const r = runLedger(['limit', '--type', 'compressor', '--power', '40', '--json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.permissibleLwaDb).toBe(98);
    expect(out.unroundedDb).toBeCloseTo(98.204, 3);
  });

  it('ledger limit --type hand-held-breaker --mass 20 prints 106 dB (Art. 12 item 5: 92 + 11·lg 20 = 106.3)', () => {
    expect(runLedger(['limit', '--type', 'hand-held-breaker', '--mass', '20']).stdout).toMatch(/^106 dB/);
  });

  it('ledger limit above the Article 12 power limit answers "no permissible level" and exits 0 (Directive 2000/14/EC Art. 12: excavators < 500 kW)', () => {
    const r = runLedger(['limit', '--type', 'excavator', '--power', '600']);
    expect(r.code).toBe(0);
    expect(r.stdout.split('\n')[0]).toBe('no permissible level');
    expect(r.stdout).toMatch(/600 kW is 500 kW or more, above Article 12's scope/);
    const j = runLedger(['limit', '--type', 'excavator', '--power', '600', '--json']);
    expect(j.code).toBe(0);
    expect(JSON.parse(j.stdout)).toMatchObject({ type: 'excavator', value: 600, permissibleLwaDb: null });
  });

  it('ledger limit --list names every required category', () => {
    const r = runLedger(['limit', '--list']);
    for (const c of [
      'excavator',
      'compressor',
      'hand-held-breaker',
      'wheeled-loader',
      'tracked-loader',
      'vibratory-compactor',
      'generator',
      'tower-crane',
      'lawnmower',
    ]) {
      expect(r.stdout).toContain(c);
    }
  });

  it.each([
    [['limit', '--type', 'crane', '--power', '3'], /"crane" is not an Article 12 type \(use one of/],
    [['limit', '--type', 'excavator', '--mass', '3'], /--mass: not used for excavator \(give --power <kW>/],
    [['limit', '--type', 'excavator', '--power', 'ten'], /--power: "ten" is not a number/],
    [['limit', '--type', 'excavator'], /--power: missing/],
    [['limit', '--type', 'excavator', '--power', '-4'], /out of range/],
    [['limit', '--kind', 'excavator'], /--kind: unknown flag/],
  ])('ledger %j exits 2 with one line', (args, message) => {
    const r = runLedger(args);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(message);
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).not.toMatch(/at .*\.ts:\d+/);
  });
});

describe('ledger exposure', () => {
  it('ledger exposure --level 90 --hours 2 gives 84.0 dB(A) (common practice: 2 h at 90 dB(A) ≈ 84) and 2.5 h to 85 (NIOSH 3 dB rule: 8/2^(5/3) = 2.52 h)', () => {
    const r = runLedger(['exposure', '--level', '90', '--hours', '2', '--json']);
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out.lex8h).toBeCloseTo(83.98, 2);
    expect(out.reached).toBe('lower action value');
    expect(out.hoursTo85).toBeCloseTo(2.52, 2);
  });

  it('ledger exposure prints the caution that a workplace assessment decides', () => {
    const r = runLedger(['exposure', '--level', '95', '--hours', '8']);
    expect(r.stdout).toMatch(/limit value/);
    expect(r.stdout).toMatch(/workplace noise exposure assessment/);
  });

  it.each([
    [['exposure', '--level', 'loud', '--hours', '2'], /--level: "loud" is not a number/],
    [['exposure', '--level', '90', '--hours', '30'], /hours: 30 is out of range/],
    [['exposure', '--hours', '3'], /--level: missing/],
  ])('ledger %j exits 2 naming the flag', (args, message) => {
    const r = runLedger(args);
    expect(r.code).toBe(2);
    expect(r.stderr).toMatch(message);
  });
});
