/**
 * Benchmark of the probability of compliance (prints figures; not a timed test).
 *
 * Targets: 10,000 draws for the demo ≤ 1 s; for 30 duties × 12 candidates × 20 receivers ×
 * 5 phases ≤ 5 s. Also the analytic figures (run on every edit in the app) and the
 * confidence optimiser at 90 % on the demo and the largest site.
 */
import { performance } from 'node:perf_hooks';
import { demoProject } from '../../src/ledger/model/demo.ts';
import { evaluateProject } from '../../src/ledger/prediction/evaluate.ts';
import { complianceConfidence } from '../../src/ledger/uncertainty/confidence.ts';
import { confidenceFleet } from '../../src/ledger/optimise/confidence-fleet.ts';
import { loadHighsSolver } from '../../src/ledger/optimise/load-highs.ts';
import { siteProject } from '../unit/ledger/optimise/site-project.ts';
import type { Project } from '../../src/ledger/model/model.ts';
import type { Evaluation } from '../../src/ledger/model/results.ts';

const time = <T>(f: () => T): { value: T; ms: number } => {
  const t = performance.now();
  const value = f();
  return { value, ms: performance.now() - t };
};

export async function run(): Promise<void> {
  const solver = await loadHighsSolver();
  const demo = demoProject();
  const cases: { name: string; project: Project; evaluation: Evaluation }[] = [
    { name: 'demo (12 duties, 4 receivers, 3 phases)', project: demo, evaluation: evaluateProject(demo) },
  ];
  const site = siteProject({ duties: 30, candidates: 12, receivers: 20, phases: 5 }, 11);
  cases.push({
    name: 'site 30 duties × 12 × 20 receivers × 5 phases',
    project: site.project,
    evaluation: site.evaluation,
  });
  // Warm-up.
  complianceConfidence(demo, cases[0]!.evaluation, { draws: 2000 });
  confidenceFleet(demo, cases[0]!.evaluation, { confidence: 0.5, draws: 1000 }, solver);
  console.log('\nProbability of compliance (milliseconds, wall clock, one run after a warm-up)');
  console.log(
    `${'case'.padEnd(48)}${'cells'.padStart(7)}${'analytic'.padStart(10)}${'10k draws'.padStart(11)}${'P(all)'.padStart(9)}${'90 % fleet'.padStart(12)}`,
  );
  for (const c of cases) {
    const analytic = time(() => complianceConfidence(c.project, c.evaluation, { analyticOnly: true }));
    const sim = time(() => complianceConfidence(c.project, c.evaluation, { draws: 10_000, seed: 1 }));
    let fleetMs = NaN;
    try {
      fleetMs = time(() => confidenceFleet(c.project, c.evaluation, { confidence: 0.9 }, solver)).ms;
    } catch {
      /* a site the optimiser refuses: shown as n/a */
    }
    console.log(
      `${c.name.padEnd(48)}${String(sim.value.cells.length).padStart(7)}${analytic.ms.toFixed(0).padStart(10)}${sim.ms.toFixed(0).padStart(11)}${`${(100 * sim.value.joint.probability).toFixed(1)}%`.padStart(9)}${(Number.isNaN(fleetMs) ? 'n/a' : fleetMs.toFixed(0)).padStart(12)}`,
    );
  }
}
