import Papa from 'papaparse';
const text = 'Model,LWA\n' + 'x,1\n'.repeat(1_000_000);
for (const cfg of [{ delimiter: ',' }, { delimiter: ',', newline: '\n' }, {}]) {
  let n = 0;
  const t = performance.now();
  Papa.parse<string[]>(text, { ...cfg, step: (s, p) => { n++; if (n > 100001) p.abort(); } } as any);
  console.log(JSON.stringify(cfg), performance.now() - t, n);
}
const t = performance.now();
Papa.parse<string[]>(text.slice(0, 400_000), { delimiter: ',', step: () => {} });
console.log('100k rows no abort', performance.now() - t);
