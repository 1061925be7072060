/**
 * `npm run bench`: runs every benchmark script in this folder (files named *.bench.ts that
 * export `run()`), one after the other, and prints their figures. Not a test: nothing fails.
 * `npm run bench -- evaluate` runs only the benchmarks whose file name contains "evaluate".
 */
import { readdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { join } from 'node:path';
import os from 'node:os';

const folder = fileURLToPath(new URL('.', import.meta.url));
const only = process.argv.slice(2);
const files = readdirSync(folder)
  .filter((f) => f.endsWith('.bench.ts'))
  .filter((f) => only.length === 0 || only.some((o) => f.includes(o)))
  .sort();

console.log(
  `Plant Noise Ledger benchmarks — Node ${process.version}, ${os.cpus().length} cores (${os.cpus()[0]?.model ?? 'unknown CPU'})`,
);
for (const file of files) {
  console.log(`\n== ${file.replace('.bench.ts', '')}`);
  const mod = (await import(pathToFileURL(join(folder, file)).href)) as { run?: () => Promise<void> };
  if (typeof mod.run !== 'function') {
    console.log('  (no run() exported)');
    continue;
  }
  try {
    await mod.run();
  } catch (e) {
    console.log(`  failed: ${e instanceof Error ? e.message : String(e)}`);
  }
}
