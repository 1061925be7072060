import { buildPreview, prepareImport, readTable } from '../src/io/import/index.ts';
const HEADER = ['Model', 'Category', 'LWA dB(A)', 'K dB', 'Net power kW', 'Rate per day', 'Rate per week', 'Fuel', 'Fuel cost £/day', 'Source'];
const rowOf = (i: number) => [`Machine ${i}`, `kind ${i % 17}`, 90 + (i % 25) + 0.5, 2, 10 + (i % 200), 50 + (i % 300), 200 + (i % 900), i % 3 ? 'diesel' : 'electric', 20 + (i % 40), `demo list row ${i}`];
const csv = [HEADER.join(','), ...Array.from({ length: 10000 }, (_, i) => rowOf(i + 1).join(','))].join('\n');
const table = await readTable(new TextEncoder().encode(csv), 'b.csv');
for (let k = 0; k < 3; k++) {
  const t0 = performance.now();
  const setup = prepareImport(table);
  const t1 = performance.now();
  buildPreview(table, { ...setup, dutyId: 'd1' });
  console.log('prepare', (t1 - t0).toFixed(0), 'build', (performance.now() - t1).toFixed(0));
}
