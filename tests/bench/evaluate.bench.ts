/**
 * Benchmark of the evaluation (prints figures; not a timed test).
 *
 * Targets: the contribution kernel over 5,000 candidates × 50 receivers × 8 octave bands in
 * ≤ 10 ms median on a 2-core machine; an edit of one candidate (LWA or cost) to the updated
 * matrix and ranking well under 50 ms. The path table computes each (duty, receiver) path
 * once per band; the naive kernel below recomputes the ISO 9613-2 path for every candidate,
 * as a spreadsheet row per machine would, and is printed for the ratio.
 * Invented random site: 500 duties × 10 candidates, every candidate with octave bands,
 * ISO 9613-2:1996 general ground method.
 *
 * Each figure is the median of several runs, wall-clock and CPU time of this process (CPU
 * time is less disturbed when other work shares the machine), and the fastest run; the
 * load average is printed.
 */
import { performance } from 'node:perf_hooks';
import os from 'node:os';
import { evaluateProject, computeLevels } from '../../src/ledger/prediction/evaluate.ts';
import { buildPathTable } from '../../src/ledger/prediction/path-table.ts';
import { rankDuty } from '../../src/ledger/ranking/rank.ts';
import { validateProject } from '../../src/ledger/validate/validate.ts';
import { octaveBandPathAttenuation } from '../../src/core/standards/iso9613-2-1996/index.ts';
import { A_WEIGHTING_OCTAVE_DB } from '../../src/core/standards/iec61672-1-2013.ts';
import { dbFromRatio, ratioFromDb } from '../../src/core/decibel.ts';
import { PROJECT_FORMAT, PROJECT_VERSION, type Candidate, type Project } from '../../src/ledger/model/model.ts';

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
    phases: Array.from({ length: 5 }, (_, i) => ({
      id: `ph${i}`,
      name: `Phase ${i + 1}`,
      periodId: 'day',
      start: '08:00',
      end: '18:00',
    })),
    receivers: Array.from({ length: RECEIVERS }, (_, i) => ({
      id: `r${i}`,
      name: `Receiver ${i + 1}`,
      kind: 'home' as const,
      x: span(-400, 400),
      y: span(-400, 400),
      heightM: 4,
      facade: rnd() < 0.5,
      limitsDb: { day: 65 },
      screening: {},
    })),
    duties: Array.from({ length: DUTIES }, (_, i) => ({
      id: `u${i}`,
      name: `Duty ${i + 1}`,
      phaseId: `ph${i % 5}`,
      count: 1 + Math.floor(rnd() * 3),
      onTimePct: 20 + Math.floor(rnd() * 80),
      durationDays: 1 + Math.floor(rnd() * 60),
      location: { kind: 'point' as const, x: span(-100, 100), y: span(-100, 100) },
      baselineCandidateId: `u${i}c0`,
    })),
    candidates: Array.from({ length: DUTIES * PER_DUTY }, (_, k) => {
      const u = Math.floor(k / PER_DUTY);
      const lwa = span(90, 118);
      const tilt = span(-3, 3);
      return {
        id: `u${u}c${k % PER_DUTY}`,
        dutyId: `u${u}`,
        label: `Machine ${k + 1}`,
        category: 'plant',
        lwaDb: lwa,
        declaration: 'guaranteed' as const,
        lwaOrigin: 'declared' as const,
        bandsDb: Array.from(
          { length: 8 },
          (_, b) => lwa - 2 + tilt * (3.5 - b) - (A_WEIGHTING_OCTAVE_DB[b] as number) - 9,
        ),
        character: 'none' as const,
        energy: 'diesel' as const,
        source: 'invented',
        cost: { kind: 'hire' as const, dayRate: span(50, 900), weekRate: span(200, 3000) },
        runningPerDay: span(0, 100),
        fixedCharges: span(0, 500),
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
      const bands = octaveBandPathAttenuation({
        distanceM,
        sourceHeightM: 1.5,
        receiverHeightM: r.heightM,
        groundFactor: prop.groundFactor,
        temperatureC: prop.temperatureC,
        humidityPct: prop.humidityPct,
        pressureKPa: prop.pressureKPa,
      });
      let energy = 0;
      for (let b = 0; b < 8; b++)
        energy += ratioFromDb((c.bandsDb![b] as number) + (A_WEIGHTING_OCTAVE_DB[b] as number) - bands[b]!.total);
      out[i * p.receivers.length + j] = dbFromRatio(energy);
    });
  });
  return out;
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;
const cpuMs = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};

/** Median wall-clock and CPU ms (and the fastest wall-clock run) of `runs` calls; `prepare(i)` runs before each call, untimed. */
function time<T>(
  runs: number,
  f: (x: T) => unknown,
  prepare: (i: number) => T = () => undefined as T,
): { wall: number; cpu: number; fastest: number } {
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < runs; i++) {
    const x = prepare(i);
    const w = performance.now();
    const c = cpuMs();
    f(x);
    cpu.push(cpuMs() - c);
    wall.push(performance.now() - w);
  }
  return { wall: median(wall), cpu: median(cpu), fastest: Math.min(...wall) };
}

/** The app's immutable update: a new project whose candidate k is a new object with one field changed. */
function editOne(p: Project, k: number, change: (c: Candidate) => Partial<Candidate>): Project {
  return { ...p, candidates: p.candidates.map((c, i) => (i === k ? { ...c, ...change(c) } : c)) };
}

export async function run(): Promise<void> {
  let p = benchProject();
  const nc = p.candidates.length;
  console.log(
    `  ${nc} candidates × ${p.receivers.length} receivers × 8 octave bands (${p.duties.length} duties, ISO 9613-2:1996 general method)`,
  );
  for (let i = 0; i < 3; i++) evaluateProject(p); // warm-up: path table built, memos filled
  const table = buildPathTable(p);

  // The kernel alone, on the built path table.
  const dutyOf = new Int32Array(nc).map((_, i) => Math.floor(i / PER_DUTY));
  const base = new Float64Array(nc).fill(100);
  const spectrum = new Float64Array(nc * 8).fill(1 / 8);
  const withBands = new Uint8Array(nc).fill(1);
  const kernel = time(41, () => computeLevels(table, dutyOf, base, spectrum, withBands));

  // One cell edited (LWA, then a day rate, alternately), as the app does it: a new project with that candidate replaced.
  const edited = (i: number) => {
    const k = (i * 397) % nc;
    p = editOne(p, k, (c) =>
      i % 2 === 0 ? { lwaDb: (c.lwaDb as number) + 0.5 } : { cost: { kind: 'hire', dayRate: 100 + i } },
    );
    return { project: p, dutyId: p.candidates[k]!.dutyId };
  };
  time(15, ({ project }) => evaluateProject(project, undefined, { skipValidation: true }), edited); // warm-up of the edit path
  const edit = time(41, ({ project }) => evaluateProject(project, undefined, { skipValidation: true }), edited);
  const editRank = time(
    41,
    ({ project, dutyId }) =>
      rankDuty(project, evaluateProject(project, undefined, { skipValidation: true }), dutyId, 'worst'),
    edited,
  );
  const editValidated = time(21, ({ project }) => evaluateProject(project), edited);
  const validation = time(21, () => validateProject(p));

  // Geometry edits: one duty moved (its row of paths recomputed), one receiver moved (its column).
  const moveDuty = time(
    11,
    (q: Project) => evaluateProject(q, undefined, { skipValidation: true }),
    (i) => {
      p = {
        ...p,
        duties: p.duties.map((d, u) =>
          u === (i * 37) % DUTIES ? { ...d, location: { kind: 'point', x: i, y: -i } } : d,
        ),
      };
      return p;
    },
  );
  const moveReceiver = time(
    11,
    (q: Project) => evaluateProject(q, undefined, { skipValidation: true }),
    (i) => {
      p = { ...p, receivers: p.receivers.map((r, k) => (k === i % RECEIVERS ? { ...r, x: r.x + 1 } : r)) };
      return p;
    },
  );
  const pathTable = time(7, () => buildPathTable(p));
  const naive = time(3, () => naiveLevels(p));

  const row = (label: string, t: { wall: number; cpu: number; fastest: number }, note = '') =>
    console.log(
      `  ${label.padEnd(70)} ${t.wall.toFixed(1).padStart(8)} ms ${t.cpu.toFixed(1).padStart(8)} ms ${t.fastest.toFixed(1).padStart(8)} ms${note}`,
    );
  console.log(`  ${''.padEnd(70)} ${'median'.padStart(11)} ${'median cpu'.padStart(11)} ${'fastest'.padStart(11)}`);
  row('contribution kernel alone (path table built)', kernel, '   target ≤ 10 ms');
  row('evaluateProject after a one-candidate edit (new project object)', edit);
  row('  … and rankDuty of the edited duty at the worst receiver', editRank, '   target ≤ 50 ms');
  row('  … with validation', editValidated);
  row('validateProject alone', validation);
  row('evaluateProject after one duty moved (its row of paths recomputed)', moveDuty);
  row('evaluateProject after one receiver moved (its column recomputed)', moveReceiver);
  row(`path table from scratch: ${p.duties.length * (p.receivers.length + 1)} paths × 8 bands`, pathTable);
  row('naive kernel: ISO path recomputed for every candidate', naive);
  console.log(
    `  ratio naive / kernel: ${(naive.wall / kernel.wall).toFixed(0)}× wall, ${(naive.cpu / kernel.cpu).toFixed(0)}× cpu; naive / (path table + kernel): ${(naive.wall / (pathTable.wall + kernel.wall)).toFixed(1)}×`,
  );
  console.log(
    `  load average while measuring: ${os
      .loadavg()
      .map((x) => x.toFixed(1))
      .join(', ')} on ${os.cpus().length} cores — wall-clock figures scale with it`,
  );
}
