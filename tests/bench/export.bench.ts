/**
 * Workbook export of a large project: the demo's duties, receivers and phases with 5,000
 * candidate machines (the demo's candidates repeated with shifted levels and prices), every
 * level a live formula with its cached result. Target: ≤ 2 s. Prints the time and file size.
 */
import { demoProject } from '../../src/ledger/demo.ts';
import { evaluateProject } from '../../src/ledger/evaluate.ts';
import type { Project } from '../../src/ledger/model.ts';
import { exportWorkbook } from '../../src/io/workbook/index.ts';

/** The demo project grown to `count` candidates. */
export function largeProject(count: number): Project {
  const project = demoProject();
  const base = project.candidates;
  const candidates = [];
  for (let i = 0; i < count; i++) {
    const c = base[i % base.length] as Project['candidates'][number];
    const shift = (i % 7) - 3;
    candidates.push({
      ...c,
      id: i < base.length ? c.id : `${c.id}-v${i}`,
      label: i < base.length ? c.label : `${c.label} variant ${i}`,
      ...(typeof c.lwaDb === 'number' ? { lwaDb: c.lwaDb + shift * 0.5 } : {}),
    });
  }
  project.candidates = candidates;
  return project;
}

export async function run(): Promise<void> {
  const project = largeProject(5000);
  const evaluation = evaluateProject(project);
  // Warm-up on the demo so the figure is the export itself, not the first load of exceljs.
  await exportWorkbook(demoProject(), { evaluation: evaluateProject(demoProject()) });
  const times: number[] = [];
  const cpu: number[] = [];
  let size = 0;
  for (let i = 0; i < 3; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    const bytes = await exportWorkbook(project, { evaluation });
    times.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
    size = bytes.byteLength;
  }
  const best = Math.min(...times);
  console.log(`  5,000 candidates × ${project.receivers.length} receivers × ${project.phases.length} phases, formulas with cached results`);
  console.log(`  export: best ${(best / 1000).toFixed(2)} s of 3 (runs ${times.map((t) => (t / 1000).toFixed(2)).join(', ')} s; target ≤ 2 s)`);
  console.log(`  CPU time of the process per export: ${cpu.map((t) => (t / 1000).toFixed(2)).join(', ')} s (wall time above includes waiting for a busy machine)`);
  console.log(`  file size: ${(size / 1024).toFixed(0)} kB`);
}
