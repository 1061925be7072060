import { describe, expect, it } from 'vitest';
import { evaluateProject } from '../../../../src/ledger/prediction/evaluate.ts';
import { REFERENCE_RECEIVER_ID } from '../../../../src/ledger/model/model.ts';
import type { Project } from '../../../../src/ledger/model/model.ts';
import { candidate, duty, receiver, twoDutyProject } from '../fixtures.ts';

const TOLERANCE_DB = 0.01;

describe('evaluateProject, simple point source', () => {
  // Working (common practice): Lp = Lw + 10·lg(Q/(4πr²)) = Lw − 20·lg r − 10·lg(4π/Q); for Q = 2 the constant is 10·lg(2π) = 7.98 dB ("− 8").
  // On-time 10·lg η, units 10·lg n, working hours 10·lg(10 h / 12 h) = −0.79 dB, façade +3 dB (common practice, UK/Hong Kong construction guidance).
  // A: 105 − 20·lg 20 (26.02) − 7.98 = 71.00; − 3.01 (50 %) − 0.79 + 3 = 70.20 dB.
  // B: 100 − 20·lg 40 (32.04) − 7.98 = 59.98; + 3.01 (2 units) − 0.79 + 3 = 65.20 dB.
  // Phase total: 10·lg(10^7.020 + 10^6.520) = 65.20 + 10·lg(1 + 10^0.5) = 65.20 + 6.19 = 71.39 dB; limit 70 → margin −1.39.
  const ev = evaluateProject(twoDutyProject());

  it('contributionDb of duty A at 20 m is 70.20 dB', () => {
    expect(ev.contributionDb('a1', 'r1')).toBeCloseTo(70.2, 1);
    expect(Math.abs(ev.contributionDb('a1', 'r1') - 70.195)).toBeLessThan(TOLERANCE_DB);
  });

  it('contributionDb of duty B (two units at 40 m) is 65.20 dB', () => {
    expect(Math.abs(ev.contributionDb('b1', 'r1') - 65.195)).toBeLessThan(TOLERANCE_DB);
  });

  it('matrix gives the phase total 71.39 dB, margin −1.39 and over', () => {
    const cell = ev.matrix[0]!;
    expect(Math.abs(cell.levelDb - 71.389)).toBeLessThan(TOLERANCE_DB);
    expect(cell.limitDb).toBe(70);
    expect(Math.abs((cell.marginDb as number) + 1.389)).toBeLessThan(TOLERANCE_DB);
    expect(cell.over).toBe(true);
    expect(ev.worstReceiverByPhase.ph1).toBe('r1');
  });

  it('contribution terms add up to the level and name each correction', () => {
    const c = ev.contribution('a1', 'r1');
    const sum = c.terms.reduce((s, t) => s + t.db, 0);
    expect(sum).toBeCloseTo(c.levelDb, 9);
    expect(c.terms.map((t) => t.key)).toEqual(['lw', 'spreading', 'count', 'onTime', 'workingHours', 'facade']);
  });

  it('the reference receiver uses Q = 2 at the reference distance: 105 − 20·lg 10 − 7.98 − 3.01 − 0.79 = 73.22 dB', () => {
    // Hemispherical spreading at 10 m (common practice: −20·lg r − 8), no façade, no screening.
    expect(Math.abs(ev.contributionDb('a1', REFERENCE_RECEIVER_ID) - 73.216)).toBeLessThan(TOLERANCE_DB);
  });

  it('a fleet with the quieter candidate lowers the total; fleetCost adds the fleet’s costs', () => {
    const quiet = evaluateProject(twoDutyProject(), { u1: 'a2' });
    expect(quiet.matrix[0]!.levelDb).toBeLessThan(ev.matrix[0]!.levelDb);
    // a2: 5 days × 150 = 750; a1: 5 × 100 = 500; b1: 2 units × 5 days × 80 = 800.
    expect(quiet.fleetCost).toBe(1550);
    expect(ev.fleetCost).toBe(1300);
  });

  it('a slant distance uses both heights: source 1.5 m, receiver 31.5 m, 40 m apart → r = 50 m', () => {
    // √(40² + 30²) = 50 m; 100 − 20·lg 50 (33.98) − 7.98 = 58.04 dB, then − 0.79 + 3 = 60.25 dB.
    const p = twoDutyProject();
    p.receivers[0] = receiver({ heightM: 31.5 });
    p.duties = [duty({ id: 'u1', location: { kind: 'point', x: 40, y: 0 }, baselineCandidateId: 'a1' })];
    p.candidates = [candidate({ id: 'a1', lwaDb: 100 })];
    expect(Math.abs(evaluateProject(p).contributionDb('a1', 'r1') - 60.25)).toBeLessThan(TOLERANCE_DB);
  });

  it('a distances table is used as given', () => {
    const p = twoDutyProject();
    p.duties[0]!.location = { kind: 'distances', distancesM: { r1: 40 } };
    // Same as duty B's path: 105 − 32.04 − 7.98 − 3.01 − 0.79 + 3 = 64.17 dB.
    expect(Math.abs(evaluateProject(p).contributionDb('a1', 'r1') - 64.175)).toBeLessThan(TOLERANCE_DB);
  });

  it('screening "hidden" takes 10 dB and a tonal candidate draws the project penalty of 3 dB', () => {
    const p = twoDutyProject();
    p.receivers[0]!.screening = { u1: { kind: 'hidden' } };
    p.candidates[0]!.character = 'tonal';
    // 70.20 − 10 + 3 = 63.20 dB (rule of thumb −10 dB fully hidden; +3 dB character penalty, common practice).
    const c = evaluateProject(p).contribution('a1', 'r1');
    expect(Math.abs(c.levelDb - 63.195)).toBeLessThan(TOLERANCE_DB);
    expect(c.terms.find((t) => t.key === 'screening')?.db).toBe(-10);
    expect(c.terms.find((t) => t.key === 'penalty')?.db).toBe(3);
  });

  it('a measured (L, K) declaration is rated on L + K by default', () => {
    const p = twoDutyProject();
    p.candidates[0] = candidate({ id: 'a1', dutyId: 'u1', lwaDb: 102, declaration: 'measured', uncertaintyDb: 3 });
    // Guaranteed value L + K = 105 (ISO 4871): the same 70.20 dB as before.
    expect(Math.abs(evaluateProject(p).contributionDb('a1', 'r1') - 70.195)).toBeLessThan(TOLERANCE_DB);
  });
});

describe('evaluateProject, ISO 9613-2:1996', () => {
  function isoProject(groundMethod: 'general' | 'alternative'): Project {
    const p = twoDutyProject();
    p.propagation = {
      method: 'iso9613-2:1996',
      temperatureC: 10,
      humidityPct: 70,
      pressureKPa: 101.325,
      groundFactor: 0.5,
      groundMethod,
      sourceHeightM: 1.5,
      c0Db: 0,
    };
    p.phases[0] = { ...p.phases[0]!, start: '07:00', end: '19:00' };
    p.receivers = [receiver({ facade: false, x: 0, y: 0 })];
    p.duties = [duty({ id: 'u1', location: { kind: 'point', x: 100, y: 0 }, baselineCandidateId: 'a1' })];
    p.candidates = [candidate({ id: 'a1', lwaDb: 100 })];
    return p;
  }

  it('alternative method at 100 m, h_s = h_r = 1.5 m: L = 100 − 52.38 = 47.62 dB', () => {
    // ISO 9613-2:1996 eq. 7: A_div = 20·lg 100 + 11 = 51.00 dB.
    // Table 2 (10 °C, 70 %): α(500 Hz) = 1.9 dB/km → A_atm = 0.19 dB.
    // Eq. 10: A_gr = 4.8 − (2·1.5/100)(17 + 300/100) = 4.8 − 0.6 = 4.20 dB.
    // Eq. 11: D_Ω = 10·lg(1 + 100²/(100² + 3²)) = 3.01 dB.
    // L = 100 − (51 + 0.19 + 4.20 − 3.01) = 47.62 dB.
    const level = evaluateProject(isoProject('alternative')).contributionDb('a1', 'r1');
    expect(Math.abs(level - 47.62)).toBeLessThan(0.05);
  });

  it('general method with octave bands over hard ground: 53.69 dB, worked band by band by hand', () => {
    // Spectrum: 100 dB in the 500 Hz and 1 kHz bands, 0 dB elsewhere (those add < 1e-9 dB). G = 0, d = d_p = 100 m, h_s = h_r = 1.5 m.
    // ISO 9613-2:1996 eq. 7: A_div = 20·lg 100 + 11 = 51.00 dB.
    // Table 3 with G = 0: A_s = A_r = −1.5 dB in every band; d_p = 100 > 30(h_s + h_r) = 90 m, so
    //   q = 1 − 90/100 = 0.1 and A_m = −3q = −0.3 dB: A_gr = −3.3 dB (eq. 9).
    // Table 2 (10 °C, 70 %): α = 1.9 dB/km at 500 Hz, 3.7 dB/km at 1 kHz → A_atm = 0.19 and 0.37 dB.
    // A-weighting (IEC 61672-1:2013): −3.2 dB at 500 Hz, 0 at 1 kHz; D_c = 0 (D_Ω is in A_gr), C_met = 0.
    //   500 Hz: 100 − 3.2 − (51 + 0.19 − 3.3) = 48.91 dB; 1 kHz: 100 − (51 + 0.37 − 3.3) = 51.93 dB.
    //   L = 10·lg(10^4.891 + 10^5.193) = 53.69 dB.
    const p = isoProject('general');
    if (p.propagation.method === 'iso9613-2:1996') p.propagation.groundFactor = 0;
    p.candidates[0] = candidate({ id: 'a1', lwaDb: undefined, bandsDb: [0, 0, 0, 100, 100, 0, 0, 0] });
    const c = evaluateProject(p).contribution('a1', 'r1');
    expect(c.terms.some((t) => t.key === 'octavePath')).toBe(true);
    expect(c.terms.reduce((s, t) => s + t.db, 0)).toBeCloseTo(c.levelDb, 9);
    expect(Math.abs(c.levelDb - 53.69)).toBeLessThan(0.02); // Table 2 α is rounded; ISO 9613-1 α differs by < 0.005 dB here
  });

  it('a barrier with z = 1 m replaces the ground effect: 37.41 dB, worked by hand from eqs 10–14 and 18', () => {
    // Alternative method at 100 m (above: A_div 51.00, A_atm 0.19, A_gr 4.20, D_Ω = 10·lg(1 + 10000/10009) = 3.008 dB).
    // Edge taken midway: d_ss = d_sr = (d + z)/2 = 50.5 m. Eq. 18: K_met = exp[−(1/2000)·√(50.5·50.5·100/(2·1))]
    //   = exp(−357.09/2000) = 0.8365. λ = 340/500 = 0.68 m. Eq. 14: D_z = 10·lg(3 + (20/0.68)·1·1·0.8365) = 10·lg 27.603 = 14.41 dB.
    // Eq. 12: A_bar = D_z − A_gr = 14.41 − 4.20 = 10.21 dB, so A_gr + A_bar = D_z (the barrier replaces the ground effect).
    // L = 100 + 3.008 − (51.00 + 0.19 + 4.20 + 10.21) = 37.41 dB.
    const p = isoProject('alternative');
    p.receivers[0]!.screening = { u1: { kind: 'barrier', pathDifferenceM: 1 } };
    const c = evaluateProject(p).contribution('a1', 'r1');
    expect(Math.abs(c.levelDb - 37.41)).toBeLessThan(0.02);
    expect(Math.abs(c.terms.find((t) => t.key === 'abar')!.db + 10.21)).toBeLessThan(0.02); // subtracted: its term is −A_bar
  });
});

describe('evaluateProject with bad data', () => {
  it('a NaN LWA gives NaN contributions and phase totals with a problem at its path, never a throw', () => {
    const p = twoDutyProject();
    p.candidates[0]!.lwaDb = NaN;
    p.unreadCells = { 'candidates/a1/lwaDb': '12O' };
    const ev = evaluateProject(p);
    expect(ev.contributionDb('a1', 'r1')).toBeNaN();
    expect(ev.matrix[0]!.levelDb).toBeNaN();
    expect(ev.matrix[0]!.over).toBe(false);
    expect(ev.problems).toContainEqual({
      path: '$.candidates[0].lwaDb',
      message:
        'Candidate "A loud", LWA: "12O" is not a number (use a sound power level in dB from 40 to 150, e.g. 104.5)',
    });
    // the other duty is still computed
    expect(ev.contributionDb('b1', 'r1')).toBeCloseTo(65.195, 2);
  });

  it('a barrier with the simple method is a problem and that path is NaN', () => {
    const p = twoDutyProject();
    p.receivers[0]!.screening = { u1: { kind: 'barrier', pathDifferenceM: 1 } };
    const ev = evaluateProject(p);
    expect(ev.contributionDb('a1', 'r1')).toBeNaN();
    expect(ev.problems.some((x) => x.path === '$.receivers[0].screening.u1.kind')).toBe(true);
  });

  it('a NaN day rate makes that cost and the fleet cost NaN, not 0', () => {
    const p = twoDutyProject();
    p.candidates[0]!.cost = { kind: 'hire', dayRate: NaN };
    const ev = evaluateProject(p);
    expect(ev.costs.a1!.total).toBeNaN();
    expect(ev.fleetCost).toBeNaN();
    expect(ev.problems.some((x) => x.path === '$.candidates[0].cost.dayRate')).toBe(true);
  });

  it('a fleet naming a candidate of another duty is a problem', () => {
    const ev = evaluateProject(twoDutyProject(), { u1: 'b1' });
    expect(ev.problems.some((x) => x.path === 'fleet["u1"]')).toBe(true);
  });

  it('an unknown candidate id gives NaN from contributionDb', () => {
    expect(evaluateProject(twoDutyProject()).contributionDb('nope', 'r1')).toBeNaN();
  });
});
