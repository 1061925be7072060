/**
 * Random large projects for the scaling benchmarks: `candidates` machines spread over duties of
 * 5 to 35 candidates each (20 on average), `receivers` receivers, every candidate with octave
 * bands, ISO 9613-2:1996 general ground method, 5 phases. About half the candidates are measured
 * values with a declared K (1.5–4 dB, ISO 4871:1996) so the close-call passes have work to do; one
 * in ten gives an operator LpA. Everything is invented; the numbers only have to be plausible.
 */
import { A_WEIGHTING_OCTAVE_DB } from '../../src/core/standards/iec61672-1-2013.ts';
import {
  PROJECT_FORMAT,
  PROJECT_VERSION,
  type Candidate,
  type Duty,
  type Project,
} from '../../src/ledger/model/model.ts';

/** Deterministic pseudo-random numbers (mulberry32). */
export function random(seed: number): () => number {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export interface LargeProjectSize {
  candidates: number;
  receivers?: number;
  phases?: number;
  seed?: number;
}

export function largeProject({ candidates: total, receivers = 50, phases = 5, seed = 11 }: LargeProjectSize): Project {
  const rnd = random(seed);
  const span = (lo: number, hi: number) => lo + (hi - lo) * rnd();
  const duties: Duty[] = [];
  const candidates: Candidate[] = [];
  while (candidates.length < total) {
    const u = duties.length;
    const n = Math.min(total - candidates.length, 5 + Math.floor(rnd() * 31));
    duties.push({
      id: `u${u}`,
      name: `Duty ${u + 1}`,
      phaseId: `ph${u % phases}`,
      count: 1 + Math.floor(rnd() * 3),
      onTimePct: 20 + Math.floor(rnd() * 80),
      durationDays: 1 + Math.floor(rnd() * 60),
      location: { kind: 'point', x: span(-300, 300), y: span(-300, 300) },
      baselineCandidateId: `u${u}c0`,
    });
    const centre = span(92, 112);
    for (let k = 0; k < n; k++) {
      const lwa = centre + span(-6, 6);
      const tilt = span(-3, 3);
      const measured = rnd() < 0.5;
      const operator = rnd() < 0.1;
      candidates.push({
        id: `u${u}c${k}`,
        dutyId: `u${u}`,
        label: `Machine ${candidates.length + 1}`,
        category: 'plant',
        lwaDb: lwa,
        declaration: measured ? 'measured' : 'guaranteed',
        ...(measured ? { uncertaintyDb: span(1.5, 4) } : {}),
        lwaOrigin: 'declared',
        bandsDb: Array.from(
          { length: 8 },
          (_, b) => lwa - 2 + tilt * (3.5 - b) - (A_WEIGHTING_OCTAVE_DB[b] as number) - 9,
        ),
        ...(operator ? { operatorLpaDb: span(75, 95), operatorHoursPerDay: span(1, 8) } : {}),
        character: rnd() < 0.05 ? 'tonal' : 'none',
        energy: 'diesel',
        source: 'invented',
        cost: { kind: 'hire', dayRate: span(50, 900), weekRate: span(200, 3000) },
        runningPerDay: span(0, 100),
        fixedCharges: span(0, 500),
      });
    }
  }
  return {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    name: `Large benchmark site, ${total} candidates (invented)`,
    currency: 'GBP',
    propagation: {
      method: 'iso9613-2:1996',
      temperatureC: 10,
      humidityPct: 70,
      pressureKPa: 101.325,
      groundFactor: 0.5,
      groundMethod: 'general',
      sourceHeightM: 1.5,
      c0Db: 0,
    },
    settings: { referenceDistanceM: 10, characterPenaltyDb: 3, levelBasis: 'guaranteed', decimalSeparator: '.' },
    periods: [{ id: 'day', name: 'Day', start: '07:00', end: '19:00' }],
    phases: Array.from({ length: phases }, (_, i) => ({
      id: `ph${i}`,
      name: `Phase ${i + 1}`,
      periodId: 'day',
      start: '08:00',
      end: '18:00',
    })),
    receivers: Array.from({ length: receivers }, (_, i) => ({
      id: `r${i}`,
      name: `Receiver ${i + 1}`,
      kind: 'home' as const,
      x: span(-600, 600),
      y: span(-600, 600),
      heightM: 4,
      facade: rnd() < 0.5,
      limitsDb: { day: 65 },
      screening: {},
    })),
    duties,
    candidates,
  };
}
