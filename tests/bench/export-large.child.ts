/**
 * The workbook export of 100,000 candidates in its own process, so its peak memory is its own:
 * `node --import tsx tests/bench/export-large.child.ts <candidates>` prints one JSON line (ms, MB). Run by
 * export-large.bench.ts.
 */
import { performance } from 'node:perf_hooks';
import { largeProject } from './export.bench.ts';
import { evaluateProject } from '../../src/ledger/prediction/evaluate.ts';
import { exportWorkbook } from '../../src/io/workbook/index.ts';

const n = Number(process.argv[2] ?? 100000);
const project = largeProject(n);
const evaluation = evaluateProject(project);
const beforeMb = process.memoryUsage().rss / 2 ** 20;
const c0 = process.cpuUsage();
const t0 = performance.now();
const bytes = await exportWorkbook(project, { evaluation, writer: 'stream' });
const wallMs = performance.now() - t0;
const c = process.cpuUsage(c0);
console.log(
  JSON.stringify({
    candidates: project.candidates.length,
    receivers: project.receivers.length,
    wallMs,
    cpuMs: (c.user + c.system) / 1000,
    bytes: bytes.byteLength,
    beforeMb,
    peakMb: process.resourceUsage().maxRSS / 1024,
  }),
);
