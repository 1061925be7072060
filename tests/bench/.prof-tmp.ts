import { buildFleetProblem } from '/work/main/src/ledger/optimise/problem.ts';
import { lpText } from '/work/main/src/ledger/optimise/lp-format.ts';
import { siteProject } from '/work/main/tests/unit/optimise/site-project.ts';
const highs = await (await import('highs')).default();
const base = { output_flag: false, mip_rel_gap: 0, mip_abs_gap: 1e-9, mip_feasibility_tolerance: 1e-9, primal_feasibility_tolerance: 1e-9 };
const variants: Record<string, Record<string, any>> = {
  base: {},
  noFJ: { mip_heuristic_run_feasibility_jump: false },
  noSym: { mip_detect_symmetry: false },
  noFJnoSym: { mip_heuristic_run_feasibility_jump: false, mip_detect_symmetry: false },
};
const cpu = () => { const u = process.cpuUsage(); return (u.user + u.system) / 1000; };
for (const seed of [13, 14]) {
  const { project, evaluation } = siteProject({ duties: 30, candidates: 12, receivers: 20, phases: 5 }, seed);
  const problem = buildFleetProblem(project, evaluation);
  const texts = [-2, 0, 1, 2, 3].map((m) => lpText(problem, { objective: 'cost', ratioCap: 10 ** (-m / 10) }));
  texts.push(lpText(problem, { objective: 'worst-ratio' }));
  for (const [k, o] of Object.entries(variants)) {
    const times = texts.map((t) => { const a = cpu(); const r = highs.solve(t, { ...base, ...o } as any); return `${(cpu() - a).toFixed(0)}${r.Status === 'Optimal' ? '' : r.Status}`; });
    console.log(seed, k.padEnd(10), times.join(' '));
  }
}
