/**
 * How the exact cheapest fleet grows with the number of duties (prints figures; not a timed test): 30 to 200 duties
 * × 20 candidates × 50 receivers × 5 phases on the random invented sites of the optimiser benchmark
 * (tests/unit/ledger/optimise/site-project.ts, limits between each receiver's quietest and baseline levels). Median
 * of 3 seeds; each solve has a 60 s time limit, and a fleet not proven optimal within it is counted and said.
 *
 * Target: proven optimum at 100 duties × 20 × 50 × 5 ≤ 2 s median.
 */
import os from 'node:os';
import { performance } from 'node:perf_hooks';
import { optimiseFleet } from '../../src/ledger/optimise/optimise.ts';
import { loadHighsSolver } from '../../src/ledger/optimise/load-highs.ts';
import { siteProject } from '../unit/ledger/optimise/site-project.ts';

const DUTIES = [30, 50, 100, 150, 200];
const SEEDS = [21, 22, 23];
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;
const cpuMs = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};

export async function run(): Promise<void> {
  const solver = await loadHighsSolver();
  const warm = siteProject({ duties: 5, candidates: 4, receivers: 4, phases: 2 }, 1);
  for (let i = 0; i < 3; i++) optimiseFleet(warm.project, warm.evaluation, {}, solver);
  console.log('  exact cheapest fleet, D duties × 20 candidates × 50 receivers × 5 phases, median of 3 random sites');
  console.log(
    `  ${'duties'.padStart(6)} ${'median'.padStart(9)} ${'worst'.padStart(9)} ${'cpu'.padStart(9)} ${'proven'.padStart(7)}  growth vs 30 duties   load`,
  );
  let first: number | undefined;
  for (const duties of DUTIES) {
    const wall: number[] = [];
    const cpu: number[] = [];
    let proven = 0;
    for (const seed of SEEDS) {
      const { project, evaluation } = siteProject({ duties, candidates: 20, receivers: 50, phases: 5 }, seed);
      const w = performance.now();
      const c = cpuMs();
      const result = optimiseFleet(project, evaluation, { tradeOff: false, timeLimitS: 60 }, solver);
      cpu.push(cpuMs() - c);
      wall.push(performance.now() - w);
      if (result.proven) proven++;
    }
    const m = median(wall);
    first ??= m;
    console.log(
      `  ${String(duties).padStart(6)} ${m.toFixed(0).padStart(6)} ms ${Math.max(...wall)
        .toFixed(0)
        .padStart(
          6,
        )} ms ${median(cpu).toFixed(0).padStart(6)} ms ${`${proven}/${SEEDS.length}`.padStart(7)}  ${`${(m / first).toFixed(1)}× for ${(duties / 30).toFixed(1)}× duties`.padEnd(20)} ${os
        .loadavg()
        .map((x) => x.toFixed(1))
        .join(', ')}`,
    );
  }
  console.log('  target at 100 duties: proven optimum ≤ 2,000 ms median');
}
