/**
 * One size of the large-project benchmark, in its own process so its peak memory is its own:
 * `node --import tsx tests/bench/large-evaluate.child.ts <candidates>` prints one JSON line of
 * figures (ms and MB). Run by large-evaluate.bench.ts.
 */
import { performance } from 'node:perf_hooks';
import { largeProject } from './large-project.ts';
import { evaluateProject } from '../../src/ledger/prediction/evaluate.ts';
import { candidateChecks } from '../../src/ledger/checks/candidate-checks.ts';
import { rankEveryDuty } from '../../src/ledger/ranking/rank-every-duty.ts';
import { rankingUncertainty } from '../../src/ledger/ranking/ranking-uncertainty.ts';

const n = Number(process.argv[2] ?? 10000);
const mb = () => process.memoryUsage().rss / 2 ** 20;
const t0 = performance.now();
const project = largeProject({ candidates: n });
const t1 = performance.now();
const projectMb = mb();
const cpu = () => {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
};
const c1 = cpu();
const ev = evaluateProject(project);
const t2 = performance.now();
const c2 = cpu();
let closePairs = 0;
const byId = new Map(project.candidates.map((c) => [c.id, c] as const));
for (const r of rankEveryDuty(project, ev)) closePairs += rankingUncertainty(r.rows, byId).closePairs.length;
const t3 = performance.now();
const c3 = cpu();
candidateChecks(project, ev);
const t4 = performance.now();
console.log(
  JSON.stringify({
    candidates: project.candidates.length,
    duties: project.duties.length,
    closePairs,
    generateMs: t1 - t0,
    evaluateMs: t2 - t1,
    evaluateCpuMs: c2 - c1,
    rankingsMs: t3 - t2,
    rankingsCpuMs: c3 - c2,
    checksMs: t4 - t3,
    projectMb,
    peakMb: process.resourceUsage().maxRSS / 1024,
  }),
);
