import Papa from 'papaparse';
const text = 'Model,LWA\n' + 'x,1\n'.repeat(1_000_000);
for (const cfg of [{ preview: 100002 }, { chunkSize: 1 << 20 }, { chunkSize: 1 << 18 }]) {
  let n = 0;
  const t = performance.now();
  Papa.parse<string[]>(text, { delimiter: '', delimitersToGuess: [',', ';', '\t', '|'], ...cfg, step: (s, p) => { n++; if (n > 100001) p.abort(); } } as any);
  console.log(JSON.stringify(cfg), performance.now() - t, n);
}
const small = 'Model,LWA\n' + 'x,1\n'.repeat(99_000);
for (const cfg of [{}, { chunkSize: 1 << 20 }]) {
  let n = 0;
  const t = performance.now();
  Papa.parse<string[]>(small, { delimiter: '', delimitersToGuess: [',', ';', '\t', '|'], ...cfg, step: (s, p) => { n++; } } as any);
  console.log('small', JSON.stringify(cfg), performance.now() - t, n);
}
