/**
 * Benchmark of the fleet optimiser (prints figures; not a timed test).
 *
 * Target: 30 duties × 12 candidates × 20 receivers × 5 phases — proven optimum ≤ 1 s,
 * trade-off curve in 0.5 dB steps ≤ 1 s, the exact frontier ≤ 20 s. Random invented sites (tests/unit/optimise/site-project.ts),
 * limits set between each receiver's quietest and baseline levels so the choice is tight.
 * Prints the median over several seeds for each size, so the growth with size shows.
 */
import { performance } from 'node:perf_hooks';
import { optimiseFleet } from '../../src/ledger/optimise/optimise.ts';
import { buildFleetProblem } from '../../src/ledger/optimise/problem.ts';
import { tradeOffCurve } from '../../src/ledger/optimise/trade-off.ts';
import { exactFrontier } from '../../src/ledger/optimise/frontier.ts';
import os from 'node:os';
import { loadHighsSolver } from '../../src/ledger/optimise/load-highs.ts';
import { siteProject, type SiteSize } from '../unit/ledger/optimise/site-project.ts';

/** Sizes, and whether the trade-off curve is swept for them (it is slow past the target size). */
const SIZES: (SiteSize & { curve: boolean })[] = [
  { duties: 5, candidates: 4, receivers: 4, phases: 2, curve: true },
  { duties: 10, candidates: 6, receivers: 8, phases: 3, curve: true },
  { duties: 20, candidates: 8, receivers: 12, phases: 4, curve: true },
  { duties: 30, candidates: 12, receivers: 20, phases: 5, curve: true },
  { duties: 45, candidates: 12, receivers: 30, phases: 6, curve: false },
];
const SEEDS = [11, 12, 13, 14, 15];

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
};
const ms = (x: number | undefined) => (x === undefined ? '—' : `${x.toFixed(0)}`).padStart(8);
/** CPU time of this process, ms: less disturbed than wall time when other work shares the machine. */
const cpuMs = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};

/** Times `f` in wall-clock and CPU milliseconds. */
function timed<T>(f: () => T): { value: T; wall: number; cpu: number } {
  const w = performance.now();
  const c = cpuMs();
  const value = f();
  return { value, wall: performance.now() - w, cpu: cpuMs() - c };
}

export async function run(): Promise<void> {
  const load = await (async () => {
    const w = performance.now();
    const solver = await loadHighsSolver();
    return { solver, wall: performance.now() - w };
  })();
  const solver = load.solver;
  // Warm-up: the first solves run while the engine is still compiling the WebAssembly.
  const warm = siteProject(SIZES[0] as SiteSize, 1);
  for (let i = 0; i < 3; i++) optimiseFleet(warm.project, warm.evaluation, {}, solver);

  console.log(`\nFleet optimiser (HiGHS, WebAssembly; loaded in ${load.wall.toFixed(0)} ms)`);
  console.log(
    `median (and worst) of ${SEEDS.length} random sites per size, milliseconds; wall clock, and CPU time of this process`,
  );
  console.log(
    '"exact": cheapest compliant fleet, proven optimal, plus the hand method; "curve": trade-off sweep, 0.5 dB steps',
  );
  const head = [
    'size D×C×R×P',
    'binaries',
    'cells',
    'exact',
    '(worst)',
    'cpu',
    'curve',
    '(worst)',
    'cpu',
    'points',
    'proven',
    'saving vs hand',
  ];
  console.log(
    `${head[0]?.padEnd(18)}${head
      .slice(1, 11)
      .map((h) => h.padStart(8))
      .join('')}  ${head[11]}`,
  );
  for (const size of SIZES) {
    const exact: { wall: number; cpu: number }[] = [];
    const curve: { wall: number; cpu: number }[] = [];
    const points: number[] = [];
    const savings: number[] = [];
    let proven = 0;
    let binaries = 0;
    let cells = 0;
    for (const seed of SEEDS) {
      const { project, evaluation } = siteProject(size, seed);
      const e = timed(() => optimiseFleet(project, evaluation, { tradeOff: false }, solver));
      exact.push(e);
      const result = e.value;
      let ok = result.proven;
      if (result.savingOverHand !== undefined) savings.push(result.savingOverHand / result.best.cost);
      const problem = buildFleetProblem(project, evaluation);
      binaries = problem.duties.reduce((n, d) => n + d.options.length, 0);
      cells = problem.cells.length;
      if (size.curve) {
        const c = timed(() => tradeOffCurve(problem, solver, { timeLimitS: 30 }, result.baseline.worstMarginDb));
        curve.push(c);
        points.push(c.value.points.length);
        ok &&= c.value.proven;
      }
      if (ok) proven++;
    }
    const label = `${size.duties}×${size.candidates}×${size.receivers}×${size.phases}`;
    const saving =
      savings.length > 0 ? `${(median(savings) * 100).toFixed(1)} % (median)` : 'hand method not compliant';
    const col = (xs: { wall: number; cpu: number }[]) =>
      xs.length === 0
        ? [undefined, undefined, undefined]
        : [median(xs.map((x) => x.wall)), Math.max(...xs.map((x) => x.wall)), median(xs.map((x) => x.cpu))];
    console.log(
      `${label.padEnd(18)}${String(binaries).padStart(8)}${String(cells).padStart(8)}${col(exact).map(ms).join('')}${col(curve).map(ms).join('')}` +
        `${(points.length ? String(median(points)) : '—').padStart(8)}${`${proven}/${SEEDS.length}`.padStart(8)}  ${saving}`,
    );
  }
  console.log('targets at 30×12×20×5: exact ≤ 1000 ms, 0.5 dB curve ≤ 1000 ms');

  // The exact frontier (every fleet no other beats on both cost and worst margin) at the target size.
  const size = { duties: 30, candidates: 12, receivers: 20, phases: 5 };
  const runs: { wall: number; cpu: number; points: number; solves: number; proven: boolean; first: number }[] = [];
  for (const seed of SEEDS.slice(0, 3)) {
    const { project, evaluation } = siteProject(size, seed);
    const problem = buildFleetProblem(project, evaluation);
    const w0 = performance.now();
    let first = NaN;
    const f = timed(() =>
      exactFrontier(
        problem,
        solver,
        { timeLimitS: 30 },
        { onPoint: (_p, i) => i === 0 && (first = performance.now() - w0) },
      ),
    );
    runs.push({
      wall: f.wall,
      cpu: f.cpu,
      points: f.value.points.length,
      solves: f.value.solves,
      proven: f.value.proven,
      first,
    });
  }
  console.log(
    `exact frontier 30×12×20×5, median of ${runs.length} sites: ${median(runs.map((r) => r.wall)).toFixed(0)} ms wall ` +
      `(worst ${Math.max(...runs.map((r) => r.wall)).toFixed(0)}), ${median(runs.map((r) => r.cpu)).toFixed(0)} ms CPU; ` +
      `${median(runs.map((r) => r.points))} points from ${median(runs.map((r) => r.solves))} solves; first point after ` +
      `${median(runs.map((r) => r.first)).toFixed(0)} ms; proven ${runs.filter((r) => r.proven).length}/${runs.length} ` +
      `— target ≤ 20,000 ms (load ${os
        .loadavg()
        .map((x) => x.toFixed(1))
        .join(', ')})`,
  );
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
