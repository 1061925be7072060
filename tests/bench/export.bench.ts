/**
 * Workbook export of a large project: the demo's duties, receivers and phases with 5,000
 * candidate machines (the demo's candidates repeated with shifted levels and prices), every
 * level a live formula with its cached result. Target: ≤ 2 s. Prints CPU and wall time and the
 * file size for both writers (streaming, used in Node; in-memory, used in browsers).
 */
import { demoProject } from '../../src/ledger/model/demo.ts';
import { evaluateProject } from '../../src/ledger/prediction/evaluate.ts';
import type { Project } from '../../src/ledger/model/model.ts';
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

/** One timed export: CPU time of the process (every thread: parse, build, GC, zlib) and wall time, ms. */
async function timedExport(
  project: Project,
  evaluation: ReturnType<typeof evaluateProject>,
  writer: 'stream' | 'memory',
) {
  const c0 = process.cpuUsage();
  const t0 = performance.now();
  const bytes = await exportWorkbook(project, { evaluation, writer });
  const wallMs = performance.now() - t0;
  const c = process.cpuUsage(c0);
  return { cpuMs: (c.user + c.system) / 1000, wallMs, size: bytes.byteLength };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] as number;
const s = (ms: number) => (ms / 1000).toFixed(2);

export async function run(): Promise<void> {
  const project = largeProject(5000);
  const evaluation = evaluateProject(project);
  // Warm-up on the demo so the figure is the export itself, not the first load of exceljs.
  for (const writer of ['stream', 'memory'] as const)
    await exportWorkbook(demoProject(), { evaluation: evaluateProject(demoProject()), writer });
  console.log(
    `  5,000 candidates × ${project.receivers.length} receivers × ${project.phases.length} phases, 8 sheets, formulas with cached results; target ≤ 2 s`,
  );
  for (const [writer, runs] of [
    ['stream', 5],
    ['memory', 3],
  ] as const) {
    const results = [];
    for (let i = 0; i < runs; i++) results.push(await timedExport(project, evaluation, writer));
    const cpu = results.map((r) => r.cpuMs);
    const wall = results.map((r) => r.wallMs);
    const label =
      writer === 'stream' ? 'streaming writer (Node: CLI, tests)' : 'in-memory writer (browsers), deflate level 1';
    console.log(`  ${label}:`);
    console.log(
      `    CPU time  best ${s(Math.min(...cpu))} s, median ${s(median(cpu))} s (runs ${cpu.map(s).join(', ')} s)`,
    );
    console.log(
      `    wall time best ${s(Math.min(...wall))} s, median ${s(median(wall))} s (runs ${wall.map(s).join(', ')} s; includes waiting for a busy machine)`,
    );
    console.log(`    file size ${((results[0]?.size ?? 0) / 1024).toFixed(0)} kB`);
  }
}
