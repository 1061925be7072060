/**
 * Benchmark of the evaluation kernel (prints figures; not a timed test).
 *
 * Target: 5,000 candidates × 50 receivers × 8 octave bands in ≤ 10 ms median on a 2-core
 * machine. The path table computes each (duty, receiver) path once per band; the naive
 * kernel below recomputes the ISO 9613-2 path for every candidate, as a spreadsheet row per
 * machine would, and is printed for the ratio.
 * Invented random site: 500 duties × 10 candidates, every candidate with octave bands,
 * ISO 9613-2:1996 general ground method.
 */
import { performance } from 'node:perf_hooks';
import os from 'node:os';
import { evaluateProject, computeLevels } from '../../src/ledger/evaluate.ts';
import { buildPathTable } from '../../src/ledger/path-table.ts';
import { octaveBandPathAttenuation } from '../../src/core/standards/iso9613-2-1996/index.ts';
import { A_WEIGHTING_OCTAVE_DB } from '../../src/core/standards/iec61672-1-2013.ts';
import { dbFromRatio, ratioFromDb } from '../../src/core/decibel.ts';
import { PROJECT_FORMAT, PROJECT_VERSION, type Project } from '../../src/ledger/model.ts';

const DUTIES = 500;
const PER_DUTY = 10;
const RECEIVERS = 50;

/** Deterministic pseudo-random numbers (mulberry32). */
function random(seed: number): () => number {
  let a = seed;
  return () => {
    a = (a + 0x6d2b79f5) | 0;
    let t = Math.imul(a ^ (a >>> 15), 1 | a);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function benchProject(seed = 7): Project {
  const rnd = random(seed);
  const span = (lo: number, hi: number) => lo + (hi - lo) * rnd();
  return {
    format: PROJECT_FORMAT,
    version: PROJECT_VERSION,
    name: 'Benchmark site (invented)',
    currency: 'GBP',
    propagation: { method: 'iso9613-2:1996', temperatureC: 10, humidityPct: 70, pressureKPa: 101.325, groundFactor: 0.5, groundMethod: 'general', sourceHeightM: 1.5, cmetDb: 0 },
    settings: { referenceDistanceM: 10, characterPenaltyDb: 3, levelBasis: 'guaranteed', decimalSeparator: '.' },
    periods: [{ id: 'day', name: 'Day', start: '07:00', end: '19:00' }],
    phases: Array.from({ length: 5 }, (_, i) => ({ id: `ph${i}`, name: `Phase ${i + 1}`, periodId: 'day', start: '08:00', end: '18:00' })),
    receivers: Array.from({ length: RECEIVERS }, (_, i) => ({
      id: `r${i}`, name: `Receiver ${i + 1}`, kind: 'home' as const, x: span(-400, 400), y: span(-400, 400), heightM: 4, facade: rnd() < 0.5, limitsDb: { day: 65 }, screening: {},
    })),
    duties: Array.from({ length: DUTIES }, (_, i) => ({
      id: `u${i}`, name: `Duty ${i + 1}`, phaseId: `ph${i % 5}`, count: 1 + Math.floor(rnd() * 3), onTimePct: 20 + Math.floor(rnd() * 80), durationDays: 1 + Math.floor(rnd() * 60),
      location: { kind: 'point' as const, x: span(-100, 100), y: span(-100, 100) }, baselineCandidateId: `u${i}c0`,
    })),
    candidates: Array.from({ length: DUTIES * PER_DUTY }, (_, k) => {
      const u = Math.floor(k / PER_DUTY);
      const lwa = span(90, 118);
      const tilt = span(-3, 3);
      return {
        id: `u${u}c${k % PER_DUTY}`, dutyId: `u${u}`, label: `Machine ${k + 1}`, category: 'plant', lwaDb: lwa, declaration: 'guaranteed' as const, lwaOrigin: 'declared' as const,
        bandsDb: Array.from({ length: 8 }, (_, b) => lwa - 2 + tilt * (3.5 - b) - (A_WEIGHTING_OCTAVE_DB[b] as number) - 9),
        character: 'none' as const, energy: 'diesel' as const, source: 'invented', cost: { kind: 'hire' as const, dayRate: span(50, 900), weekRate: span(200, 3000) }, runningPerDay: span(0, 100), fixedCharges: span(0, 500),
      };
    }),
  };
}

/** The naive kernel: the ISO path recomputed for every candidate and receiver. */
function naiveLevels(p: Project): Float64Array {
  const out = new Float64Array(p.candidates.length * p.receivers.length);
  const duties = new Map(p.duties.map((d) => [d.id, d]));
  const prop = p.propagation as Extract<Project['propagation'], { method: 'iso9613-2:1996' }>;
  p.candidates.forEach((c, i) => {
    const d = duties.get(c.dutyId)!;
    const loc = d.location as { x: number; y: number };
    p.receivers.forEach((r, j) => {
      const distanceM = Math.hypot(r.x - loc.x, r.y - loc.y, 1.5 - r.heightM);
      const bands = octaveBandPathAttenuation({ distanceM, sourceHeightM: 1.5, receiverHeightM: r.heightM, groundFactor: prop.groundFactor, temperatureC: prop.temperatureC, humidityPct: prop.humidityPct, pressureKPa: prop.pressureKPa });
      let energy = 0;
      for (let b = 0; b < 8; b++) energy += ratioFromDb((c.bandsDb![b] as number) + (A_WEIGHTING_OCTAVE_DB[b] as number) - (bands[b]!.total));
      out[i * p.receivers.length + j] = dbFromRatio(energy);
    });
  });
  return out;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;
function time(f: () => unknown, runs: number): number {
  const t: number[] = [];
  for (let i = 0; i < runs; i++) {
    const s = performance.now();
    f();
    t.push(performance.now() - s);
  }
  return median(t);
}

export async function run(): Promise<void> {
  const p = benchProject();
  console.log(`  ${p.candidates.length} candidates × ${p.receivers.length} receivers × 8 octave bands (${p.duties.length} duties, ISO 9613-2:1996 general method)`);
  for (let i = 0; i < 3; i++) evaluateProject(p); // warm-up
  const table = buildPathTable(p);
  // Warm: the geometry is unchanged since the last call (e.g. a candidate's LWA or cost was edited), so the path table is reused.
  const warm = time(() => evaluateProject(p, undefined, { skipValidation: true }), 15);
  const warmValidated = time(() => evaluateProject(p), 15);
  // Cold: a receiver moved, so every path is computed again.
  let shift = 0;
  const cold = time(() => {
    p.receivers[0]!.x += ++shift * 1e-6;
    evaluateProject(p, undefined, { skipValidation: true });
  }, 5);
  const pathTable = time(() => buildPathTable(p), 5);
  const nc = p.candidates.length;
  const dutyOf = new Int32Array(nc).map((_, i) => Math.floor(i / PER_DUTY));
  const base = new Float64Array(nc).fill(100);
  const spectrum = new Float64Array(nc * 8).fill(1 / 8);
  const withBands = new Uint8Array(nc).fill(1);
  const kernel = time(() => computeLevels(table, dutyOf, base, spectrum, withBands), 25);
  const naive = time(() => naiveLevels(p), 3);
  const row = (label: string, ms: number, note = '') => console.log(`  ${label.padEnd(66)} ${ms.toFixed(1).padStart(8)} ms${note}`);
  row('contribution kernel alone (path table built)', kernel, '   target ≤ 10 ms');
  row('evaluateProject, geometry unchanged (path table reused), no validation', warm);
  row('evaluateProject, geometry unchanged, with validation', warmValidated);
  row(`path table: ${p.duties.length * (p.receivers.length + 1)} paths × 8 bands`, pathTable);
  row('evaluateProject after the geometry changed (path table rebuilt)', cold);
  row('naive kernel: ISO path recomputed for every candidate', naive);
  console.log(`  (load average while measuring: ${os.loadavg().map((x) => x.toFixed(1)).join(', ')} on ${os.cpus().length} cores — figures scale with it)`);
  console.log(`  ratio naive / (path table + kernel): ${(naive / (pathTable + kernel)).toFixed(1)}×; naive / kernel: ${(naive / kernel).toFixed(0)}×`);
}
