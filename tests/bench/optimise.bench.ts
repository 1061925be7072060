/**
 * Benchmark of the fleet optimiser (prints figures; not a timed test).
 *
 * Target: 30 duties × 12 candidates × 20 receivers × 5 phases — proven optimum ≤ 1 s,
 * trade-off curve ≤ 5 s. Random invented sites (tests/unit/optimise/site-project.ts),
 * limits set between each receiver's quietest and baseline levels so the choice is tight.
 * Prints the median over several seeds for each size, so the growth with size shows.
 */
import { performance } from 'node:perf_hooks';
import { optimiseFleet } from '../../src/ledger/optimise/optimise.ts';
import { buildFleetProblem } from '../../src/ledger/optimise/problem.ts';
import { tradeOffCurve } from '../../src/ledger/optimise/trade-off.ts';
import { loadHighsSolver } from '../../src/ledger/optimise/load-highs.ts';
import { siteProject, type SiteSize } from '../unit/optimise/site-project.ts';

const SIZES: SiteSize[] = [
  { duties: 5, candidates: 4, receivers: 4, phases: 2 },
  { duties: 10, candidates: 6, receivers: 8, phases: 3 },
  { duties: 20, candidates: 8, receivers: 12, phases: 4 },
  { duties: 30, candidates: 12, receivers: 20, phases: 5 },
  { duties: 45, candidates: 12, receivers: 30, phases: 6 },
  { duties: 60, candidates: 15, receivers: 40, phases: 8 },
];
const SEEDS = [11, 12, 13, 14, 15];

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
};
const ms = (x: number) => `${x.toFixed(0)} ms`.padStart(9);

export async function run(): Promise<void> {
  const t0 = performance.now();
  const solver = await loadHighsSolver();
  console.log(`\nFleet optimiser (HiGHS ${'wasm'}) — loaded in ${(performance.now() - t0).toFixed(0)} ms`);
  console.log('median of 5 random sites per size; "exact" = cheapest compliant fleet proven optimal, with the hand method');
  console.log(`${'duties×cand×recv×phases'.padEnd(26)}${'binaries'.padStart(9)}${'cells'.padStart(7)}${'exact'.padStart(9)}${'max'.padStart(9)}${'curve'.padStart(9)}${'max'.padStart(9)}${'points'.padStart(8)}  feasible  proven  exact cost vs hand (median saving)`);
  for (const size of SIZES) {
    const exact: number[] = [];
    const curve: number[] = [];
    const points: number[] = [];
    const savings: number[] = [];
    let feasible = 0;
    let proven = 0;
    let binaries = 0;
    let cells = 0;
    for (const seed of SEEDS) {
      const { project, evaluation } = siteProject(size, seed);
      const a = performance.now();
      const result = optimiseFleet(project, evaluation, { tradeOff: false }, solver);
      exact.push(performance.now() - a);
      if (result.feasible) feasible++;
      if (result.proven) proven++;
      if (result.savingOverHand !== undefined) savings.push(result.savingOverHand / result.best.cost);
      const problem = buildFleetProblem(project, evaluation);
      binaries = problem.duties.reduce((n, d) => n + d.options.length, 0);
      cells = problem.cells.length;
      const b = performance.now();
      const c = tradeOffCurve(problem, solver, { timeLimitS: 30 }, result.baseline.worstMarginDb);
      curve.push(performance.now() - b);
      points.push(c.points.length);
      if (!c.proven) proven--;
    }
    const label = `${size.duties}×${size.candidates}×${size.receivers}×${size.phases}`;
    const saving = savings.length > 0 ? `${(median(savings) * 100).toFixed(1)} % cheaper than the hand method` : 'hand method not compliant';
    console.log(
      `${label.padEnd(26)}${String(binaries).padStart(9)}${String(cells).padStart(7)}${ms(median(exact))}${ms(Math.max(...exact))}${ms(median(curve))}${ms(Math.max(...curve))}${String(median(points)).padStart(8)}  ${`${feasible}/${SEEDS.length}`.padStart(8)}  ${`${proven}/${SEEDS.length}`.padStart(6)}  ${saving}`,
    );
  }
  console.log('targets at 30×12×20×5: exact ≤ 1000 ms, curve ≤ 5000 ms (trade-off sweep step 0.5 dB)');
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
