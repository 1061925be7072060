/**
 * Sound power given in watts or as a pressure level at a distance is converted to LWA and
 * marked as converted.
 */
import { describe, expect, it } from 'vitest';
import { buildPreview, prepareImport, readTable } from '../../../../src/io/import/index.ts';

const TOLERANCE_DB = 0.01;
const enc = (s: string) => new TextEncoder().encode(s);

async function preview(csv: string, options: { pressureDistanceM?: number; directivityQ?: 1 | 2 | 4 | 8 } = {}) {
  const table = await readTable(enc(csv), 'list.csv');
  return buildPreview(table, { ...prepareImport(table), dutyId: 'd1', ...options });
}

describe('sound power in watts', () => {
  it.each([
    [1, 120], // 1 W → 120 dB re 1 pW (common practice; Lw = 10·lg(W / 1 pW))
    [0.01, 100], // 10·lg(0.01 / 1e-12) = 10·lg(1e10) = 100 dB (worked by hand)
    [0.5, 116.99], // 120 + 10·lg 0.5 = 120 − 3.01 = 116.99 dB (worked by hand)
  ])('a "Sound power (W)" cell of %d W becomes LWA %d dB, marked from-watts', async (watts, lwa) => {
    const p = await preview(`Model,Sound power (W),Rate per day\nA,${watts},10\n`);
    const c = p.candidates[0];
    expect(c?.lwaDb).toBeCloseTo(lwa, 2);
    expect(Math.abs((c?.lwaDb ?? NaN) - lwa)).toBeLessThan(TOLERANCE_DB);
    expect(c?.lwaOrigin).toBe('from-watts');
    expect(c?.source).toContain('from a sound power of');
    expect(p.notes.join(' ')).toContain('marked "from watts"');
  });

  it('0 W is out of range, its text kept', async () => {
    const p = await preview('Model,Sound power (W),Rate per day\nA,0,10\n');
    expect(p.problems[0]?.message).toBe(
      'Row 2, Sound power (W): "0" is out of range (use watts greater than 0, e.g. 0.5)',
    );
    expect(p.candidates[0]?.lwaDb).toBeNaN();
    expect(p.unreadCells['candidates/c1/lwaDb']).toBe('0');
  });
});

describe('sound pressure level at a stated distance', () => {
  // Back-calculation Lw = Lp + 20·lg r + 10.99 − 10·lg Q (domain primer §2; textbook point source).
  it('LpA 72 dB at 10 m (header), Q = 2: LWA = 72 + 20 + 10.99 − 3.01 = 99.98 dB, marked from-pressure', async () => {
    const p = await preview('Model,LpA at 10 m,Rate per day\nPump,72,30\n');
    const c = p.candidates[0];
    expect(Math.abs((c?.lwaDb ?? NaN) - 99.98)).toBeLessThan(TOLERANCE_DB); // worked by hand
    expect(c?.lwaOrigin).toBe('from-pressure');
    expect(c?.source).toBe(
      'list.csv, row 2; LWA 100.0 dB back-calculated from LpA 72 dB at 10 m, Q = 2 (Lw = Lp + 20·lg r + 10.99 − 10·lg Q)',
    );
    expect(p.notes.join(' ')).toContain('Q = 2 (machine on hard ground)');
  });

  it('LpA 78 dB at 7 m from a distance column, Q = 2: 78 + 16.90 + 7.98 = 102.88 dB', async () => {
    // 20·lg 7 = 16.902; 10.99 − 10·lg 2 = 7.98 (worked by hand)
    const p = await preview('Model,Sound pressure dB(A),Distance m,Rate per day\nGen,78,7,30\n');
    expect(Math.abs((p.candidates[0]?.lwaDb ?? NaN) - 102.88)).toBeLessThan(TOLERANCE_DB);
  });

  it('LpA 80 dB at 1 m stated for the whole list with Q = 1: 80 + 0 + 10.99 = 90.99 dB', async () => {
    const p = await preview('Model,LpA dB,Rate per day\nFan,80,5\n', { pressureDistanceM: 1, directivityQ: 1 });
    expect(Math.abs((p.candidates[0]?.lwaDb ?? NaN) - 90.99)).toBeLessThan(TOLERANCE_DB); // 10·lg(4π) = 10.99 (worked by hand)
  });

  it('a pressure level with no distance is flagged and kept', async () => {
    const p = await preview('Model,LpA dB,Rate per day\nFan,80,5\n');
    expect(p.rows[0]?.flagged).toBe(true);
    expect(p.problems[0]?.message).toBe(
      'Row 2, LpA dB: 80 dB has no distance (map a distance column, state it in the header as "at 10 m", or give the distance for the whole list)',
    );
    expect(p.unreadCells['candidates/c1/lwaDb']).toBe('LpA 80 dB, distance not stated');
  });

  it('a declared LWA in the same row wins over the pressure level', async () => {
    const p = await preview('Model,LWA,LpA at 10 m,Rate per day\nA,101,72,5\n');
    expect(p.candidates[0]?.lwaDb).toBe(101);
    expect(p.candidates[0]?.lwaOrigin).toBe('declared');
  });
});
