/**
 * Workbook export of 100,000 candidates in Node (prints figures; not a timed test): the demo's duties, receivers and
 * phases with 100,000 candidate machines (export.bench.ts's project), the streaming writer, in a process of its own
 * so the peak memory printed (maximum resident set, including the project, its evaluation and Node) is the export's.
 * Target: ≤ 40 s, memory bounded. The rows of the large tables are made, committed and compressed as written (at most
 * HELD_BYTES of a sheet's XML waiting), so what grows with the candidates is the project, its evaluation, each
 * candidate's cell addresses and the compressed file: the growth per candidate is printed beside the peak.
 */
import { spawnSync } from 'node:child_process';
import os from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { HELD_BYTES } from '../../src/io/workbook/index.ts';

const folder = fileURLToPath(new URL('.', import.meta.url));

export async function run(): Promise<void> {
  const peaks: { n: number; peakMb: number; beforeMb: number }[] = [];
  for (const n of [25_000, 100_000]) {
    const r = spawnSync(process.execPath, ['--import', 'tsx', join(folder, 'export-large.child.ts'), String(n)], {
      cwd: join(folder, '..', '..'),
      encoding: 'utf8',
      timeout: 400_000,
    });
    const load = os
      .loadavg()
      .map((x) => x.toFixed(1))
      .join(', ');
    if (r.status !== 0) {
      console.log(
        `  ${n} candidates: ${r.error ? `not finished (${r.error.message})` : r.stderr.slice(0, 300)}  load ${load}`,
      );
      continue;
    }
    const f = JSON.parse(r.stdout.trim().split('\n').pop() as string) as Record<string, number>;
    peaks.push({ n, peakMb: f.peakMb as number, beforeMb: f.beforeMb as number });
    console.log(
      `  ${f.candidates} candidates × ${f.receivers} receivers, streaming writer: ${((f.wallMs as number) / 1000).toFixed(1)} s wall, ${((f.cpuMs as number) / 1000).toFixed(1)} s CPU, ${((f.bytes as number) / 2 ** 20).toFixed(1)} MB file; memory ${(f.beforeMb as number).toFixed(0)} MB before, peak ${(f.peakMb as number).toFixed(0)} MB   target ≤ 40 s (CPU and wall), memory bounded   load ${load}`,
    );
  }
  const [small, large] = peaks;
  if (small && large) {
    const perCandidate = ((large.peakMb - small.peakMb) * 1024) / (large.n - small.n);
    const exportGrowth =
      (large.peakMb - large.beforeMb - (small.peakMb - small.beforeMb)) * (1024 / (large.n - small.n));
    console.log(
      `  memory: peak grows ${perCandidate.toFixed(1)} kB per candidate (the export's own share ${exportGrowth.toFixed(1)} kB: cell addresses, compressed file); a sheet's XML waiting for compression is held to ${HELD_BYTES / 2 ** 20} MB`,
    );
  }
}
