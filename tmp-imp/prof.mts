import { readTable } from '../src/io/import/index.ts';
const text = 'Model,LWA\n' + 'x,1\n'.repeat(1_000_000);
const bytes = new TextEncoder().encode(text);
let t = performance.now();
try { await readTable(bytes, 'm.csv'); } catch (e) { console.log((e as Error).message); }
console.log('million', performance.now() - t);
const text2 = 'Model,LWA\n' + 'x,1\n'.repeat(99_000);
t = performance.now();
const r = await readTable(new TextEncoder().encode(text2), 'm.csv');
console.log('99k', performance.now() - t, r.rows.length);
