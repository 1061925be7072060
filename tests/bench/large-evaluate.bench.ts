/**
 * Large projects (prints figures; not a timed test): `evaluateProject` + the ranking of every duty with its ±K
 * firmness and every candidate's checks, at 10,000 to 100,000 candidates × 50 receivers × 8 octave bands (random
 * invented sites of ./large-project.ts, about 20 candidates a duty), each size in its own Node process so its peak
 * memory (maximum resident set) is its own, three times with the median run printed; then `ledger evaluate` on the 100,000-candidate file as a whole process,
 * text and --json.
 *
 * Targets: evaluation + rankings at 100,000 ≤ 2 s and ≤ 1 GB, growing close to linearly; `ledger evaluate` (text)
 * ≤ 10 s whole process. Wall-clock figures scale with the load average printed beside them; CPU time (user + system
 * of the process) is less disturbed by other work on the machine.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import os from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { performance } from 'node:perf_hooks';

const folder = fileURLToPath(new URL('.', import.meta.url));
const root = join(folder, '..', '..');
const SIZES = [10_000, 25_000, 50_000, 100_000];
const load = () =>
  os
    .loadavg()
    .map((x) => x.toFixed(1))
    .join(', ');

interface Figures {
  candidates: number;
  duties: number;
  closePairs: number;
  evaluateMs: number;
  evaluateCpuMs: number;
  rankingsMs: number;
  rankingsCpuMs: number;
  checksMs: number;
  projectMb: number;
  peakMb: number;
}

function child(n: number): Figures | string {
  const r = spawnSync(process.execPath, ['--import', 'tsx', join(folder, 'large-evaluate.child.ts'), String(n)], {
    cwd: root,
    encoding: 'utf8',
    timeout: 180_000,
  });
  if (r.status !== 0) return r.error ? `not finished (${r.error.message})` : `failed: ${r.stderr.slice(0, 200)}`;
  return JSON.parse(r.stdout.trim().split('\n').pop() as string) as Figures;
}

/** Processes run per size: the figures printed are those of the run with the median eval+rank CPU time. */
const RUNS = 3;

/** {@link child} run {@link RUNS} times; the run with the median eval+rank CPU time (a busy machine scatters single runs). */
function medianChild(n: number): Figures | string {
  const runs: Figures[] = [];
  for (let i = 0; i < RUNS; i++) {
    const f = child(n);
    if (typeof f === 'string') return f;
    runs.push(f);
  }
  runs.sort((a, b) => a.evaluateCpuMs + a.rankingsCpuMs - (b.evaluateCpuMs + b.rankingsCpuMs));
  return runs[Math.floor(runs.length / 2)] as Figures;
}

/**
 * Runs the command line on a file as an installed `ledger` runs (the bin file through its first line, with the Node
 * flags it gives); wall-clock ms, CPU ms and peak MB (through GNU time when installed) and the output's size in bytes.
 */
function cli(args: string[]): { ms: number; bytes: number; cpuMs?: number; peakMb?: number } | string {
  const gnuTime = existsSync('/usr/bin/time');
  const command = [join(root, 'src', 'cli', 'bin.mjs'), ...args];
  const t = performance.now();
  const r = gnuTime
    ? spawnSync('/usr/bin/time', ['-f', 'rusage %U %S %M', ...command], {
        cwd: root,
        encoding: 'buffer',
        maxBuffer: 2 ** 31,
        timeout: 400_000,
      })
    : spawnSync(command[0] as string, command.slice(1), {
        cwd: root,
        encoding: 'buffer',
        maxBuffer: 2 ** 31,
        timeout: 400_000,
      });
  const ms = performance.now() - t;
  if (r.status !== 0)
    return r.error ? `not finished (${r.error.message})` : `exit ${r.status}: ${r.stderr.toString().slice(0, 200)}`;
  const usage = /rusage ([\d.]+) ([\d.]+) (\d+)/.exec(r.stderr.toString());
  if (!usage) return { ms, bytes: r.stdout.length };
  return {
    ms,
    bytes: r.stdout.length,
    cpuMs: (Number(usage[1]) + Number(usage[2])) * 1000,
    peakMb: Number(usage[3]) / 1024,
  };
}

const cliFigures = (f: { ms: number; bytes: number; cpuMs?: number; peakMb?: number }) =>
  `${f.ms.toFixed(0).padStart(6)} ms wall${f.cpuMs === undefined ? '' : `, ${f.cpuMs.toFixed(0)} ms CPU`}${f.peakMb === undefined ? '' : `, peak ${f.peakMb.toFixed(0)} MB`}, ${(f.bytes / 2 ** 20).toFixed(1)} MB printed`;

export async function run(): Promise<void> {
  console.log(
    '  evaluateProject (with validation) + every duty ranked at its phase’s worst receiver with its ±K firmness, and every candidate’s checks;',
  );
  console.log(
    '  random invented sites, 50 receivers × 8 octave bands, 5 phases, ~20 candidates a duty, half with a declared K;',
  );
  console.log(`  each size run in ${RUNS} fresh processes, the median run (by eval+rank CPU) printed`);
  console.log(
    `  ${'candidates'.padStart(10)} ${'duties'.padStart(6)} ${'close pairs'.padStart(11)} ${'evaluate'.padStart(9)} ${'(cpu)'.padStart(7)} ${'rankings'.padStart(9)} ${'(cpu)'.padStart(7)} ${'eval+rank'.padStart(9)} ${'checks'.padStart(7)} ${'peak MB'.padStart(8)}  ${'growth vs 10k (eval+rank CPU / size)'}  load`,
  );
  let first: Figures | undefined;
  for (const n of SIZES) {
    const f = medianChild(n);
    if (typeof f === 'string') {
      console.log(`  ${String(n).padStart(10)}  ${f}  load ${load()}`);
      continue;
    }
    first ??= f;
    const total = f.evaluateMs + f.rankingsMs;
    const cpuOf = (x: Figures) => x.evaluateCpuMs + x.rankingsCpuMs;
    const growth = `${(cpuOf(f) / cpuOf(first)).toFixed(1)}× CPU for ${(f.candidates / first.candidates).toFixed(1)}× size`;
    console.log(
      `  ${String(f.candidates).padStart(10)} ${String(f.duties).padStart(6)} ${String(f.closePairs).padStart(11)} ${f.evaluateMs.toFixed(0).padStart(6)} ms ${f.evaluateCpuMs.toFixed(0).padStart(7)} ${f.rankingsMs.toFixed(0).padStart(6)} ms ${f.rankingsCpuMs.toFixed(0).padStart(7)} ${total.toFixed(0).padStart(6)} ms ${f.checksMs.toFixed(0).padStart(4)} ms ${f.peakMb.toFixed(0).padStart(8)}  ${growth.padEnd(38)}  ${load()}`,
    );
  }
  console.log('  target at 100,000: eval+rank ≤ 2,000 ms, peak ≤ 1,024 MB (peak includes the project itself and Node)');

  const dir = mkdtempSync(join(tmpdir(), 'ledger-large-'));
  try {
    const file = join(dir, 'large-100k.json');
    execFileSync(process.execPath, ['--import', 'tsx', join(folder, 'large-write.child.ts'), '100000', file], {
      cwd: root,
    });
    console.log(
      `\n  ledger evaluate on a 100,000-candidate file (${(statSync(file).size / 2 ** 20).toFixed(1)} MB), whole process:`,
    );
    const text = cli(['evaluate', file]);
    console.log(
      typeof text === 'string'
        ? `    text: ${text}`
        : `    text:   ${cliFigures(text)}   target ≤ 10,000 ms   load ${load()}`,
    );
    const json = cli(['evaluate', file, '--json']);
    console.log(
      typeof json === 'string'
        ? `    --json: ${json}`
        : `    --json: ${cliFigures(json)} (the JSON's size)   load ${load()}`,
    );
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
