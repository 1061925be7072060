/**
 * Benchmark: the grid's row model after one cell edit, with 5,000 invented
 * rows in 6 groups. Three cases: unsorted (display list patched), sorted by
 * LWA while editing the name (patched), sorted by LWA while editing LWA
 * (table-core's row model rebuilt). Prints the median and 90th-percentile
 * time of `update` + `view` per edit.
 */
import { GridModel } from '../../src/app/grid/table-model.ts';
import type { GridColumn } from '../../src/app/grid/types.ts';

interface BenchRow {
  id: string;
  duty: string;
  name: string;
  lwa: number;
}

const ROWS = 5000;
const EDITS = 60;

function makeRows(): BenchRow[] {
  return Array.from({ length: ROWS }, (_, i) => ({
    id: `b${i}`,
    duty: `d${i % 6}`,
    name: `Unit ${i}`,
    lwa: 90 + ((i * 37) % 300) / 10,
  }));
}

const columns: GridColumn<BenchRow>[] = [
  { id: 'name', header: 'Machine', kind: 'text', editable: true, value: (r) => r.name, display: (r) => r.name },
  { id: 'lwa', header: 'LWA', kind: 'number', editable: true, value: (r) => r.lwa, display: (r) => r.lwa.toFixed(1) },
];

function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.floor(p * sorted.length))] ?? NaN;
}

type Case = { title: string; sorted: boolean; edit: (row: BenchRow) => BenchRow };
const CASES: Case[] = [
  { title: 'unsorted, editing LWA', sorted: false, edit: (row) => ({ ...row, lwa: row.lwa + 0.1 }) },
  { title: 'sorted by LWA, editing the name', sorted: true, edit: (row) => ({ ...row, name: `${row.name}*` }) },
  { title: 'sorted by LWA, editing LWA', sorted: true, edit: (row) => ({ ...row, lwa: row.lwa + 0.1 }) },
];

function measure({ sorted, edit }: Case): number[] {
  let rows = makeRows();
  const group = { key: (r: BenchRow) => r.duty, label: (k: string) => k };
  const model = new GridModel<BenchRow>(
    rows,
    columns,
    (r) => r.id,
    () => group,
  );
  if (sorted) model.setSort('lwa', 'desc');
  model.view();
  const times: number[] = [];
  for (let k = 0; k < EDITS; k++) {
    const target = (k * 97) % ROWS;
    rows = rows.map((row, i) => (i === target ? edit(row) : row));
    const start = performance.now();
    model.update(rows, columns);
    model.view();
    times.push(performance.now() - start);
  }
  return times;
}

export async function run(): Promise<void> {
  for (const benchCase of CASES) {
    const times = measure(benchCase);
    console.log(
      `grid row model, ${ROWS} rows in 6 groups, ${benchCase.title}: ` +
        `median ${percentile(times, 0.5).toFixed(1)} ms, p90 ${percentile(times, 0.9).toFixed(1)} ms per edit`,
    );
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
