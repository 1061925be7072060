/**
 * Benchmark of the level map (prints figures; not a timed test).
 *
 * Targets: a 200 × 200 grid with 30 machines in octave bands and 5 barriers computed in
 * ≤ 1 s (in the worker; measured here in Node with the same code, the map's kernel
 * ledger/map/map-kernel.ts, every grid point a fresh path), with a coarse first
 * picture (50 × 50, every fourth point) in ≤ 200 ms; moving a receiver updates the matrix
 * in ≤ 50 ms. Invented site: 30 duties in one phase, one machine each with octave bands,
 * ISO 9613-2:1996 general ground method, 5 barriers of three segments, 400 m × 400 m.
 */
import { performance } from 'node:perf_hooks';
import os from 'node:os';
import { levelGrid } from '../../src/ledger/map/level-grid.ts';
import { evaluateProject } from '../../src/ledger/prediction/evaluate.ts';
import { baselineChoice } from '../../src/ledger/model/fleets.ts';
import { benchProject } from './evaluate.bench.ts';
import type { Project } from '../../src/ledger/model/model.ts';

function mapSite(): Project {
  const p = benchProject(11);
  const duties = p.duties.filter((d) => d.phaseId === 'ph0').slice(0, 30);
  const ids = new Set(duties.map((d) => d.baselineCandidateId));
  return {
    ...p,
    duties,
    candidates: p.candidates.filter((c) => ids.has(c.id)),
    receivers: p.receivers.slice(0, 10),
    barriers: Array.from({ length: 5 }, (_, i) => ({
      id: `b${i}`,
      name: `Hoarding ${i + 1}`,
      heightM: 2.4 + i * 0.3,
      points: [
        { x: -150 + i * 60, y: 110 },
        { x: -120 + i * 60, y: 130 },
        { x: -90 + i * 60, y: 125 },
        { x: -60 + i * 60, y: 140 },
      ],
    })),
  };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
}

/** Wall and CPU time of each run, ms (CPU time: this process's user + system; on a shared machine wall time also counts the waits). */
function time(f: () => void, runs: number): { median: number; best: number; cpuMedian: number; cpuBest: number } {
  const t: number[] = [];
  const c: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    f();
    t.push(performance.now() - t0);
    const used = process.cpuUsage(c0);
    c.push((used.user + used.system) / 1000);
  }
  return { median: median(t), best: Math.min(...t), cpuMedian: median(c), cpuBest: Math.min(...c) };
}

const fig = (r: { median: number; best: number; cpuMedian: number; cpuBest: number }, digits = 0) =>
  `wall median ${r.median.toFixed(digits)} ms, best ${r.best.toFixed(digits)} ms; CPU median ${r.cpuMedian.toFixed(digits)} ms, best ${r.cpuBest.toFixed(digits)} ms`;

export async function run(): Promise<void> {
  const p = mapSite();
  const fleet = baselineChoice(p);
  const full = { phaseId: 'ph0', fleet, heightM: 4, spacingM: 2, x0: -200, y0: -200, nx: 200, ny: 200 };
  const coarse = { ...full, spacingM: 8, nx: 50, ny: 50 };
  console.log(
    `  load average ${os
      .loadavg()
      .map((x) => x.toFixed(2))
      .join(' ')}; ${p.duties.length} machines in octave bands, ${p.barriers!.length} barriers`,
  );
  // Each run on a grid shifted by a fraction of a metre, so no path table is found in the cache.
  let shift = 0;
  const fresh = (r: typeof full) => ({ ...r, x0: r.x0 + (shift += 0.01) });
  const c = time(() => levelGrid(p, fresh(coarse)), 5);
  console.log(`  coarse first picture 50 × 50: ${fig(c)} (target ≤ 200 ms)`);
  const f = time(() => levelGrid(p, fresh(full)), 3);
  console.log(`  full map 200 × 200: ${fig(f)} (target ≤ 1000 ms)`);
  evaluateProject(p);
  let k = 0;
  const m = time(() => {
    k++;
    const moved = { ...p, receivers: p.receivers.map((r, i) => (i === 0 ? { ...r, x: r.x + k } : r)) };
    evaluateProject(moved);
  }, 9);
  console.log(`  moving a receiver updates the matrix: ${fig(m, 1)} (target ≤ 50 ms)`);
}
