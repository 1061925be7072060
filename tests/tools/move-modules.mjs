// Moves source files and rewrites every relative import that points at them.
// Usage: node tests/tools/move-modules.mjs <map.txt>   (lines "old/path new/path", relative to the repo root)
// Each moved file is moved with `git mv`; every .ts, .svelte, .js and .mjs file under src/ and tests/ (and the
// root config files) has its relative specifiers re-pointed, including import(), vi.mock() and new URL(…).
import { execFileSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync, readdirSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';

const root = process.cwd();
const moves = new Map();
for (const line of readFileSync(process.argv[2], 'utf8').split('\n')) {
  const parts = line.trim().split(/\s+/);
  if (parts.length !== 2 || line.trim().startsWith('#')) continue;
  moves.set(resolve(root, parts[0]), resolve(root, parts[1]));
}
function walk(dir, out) {
  for (const name of readdirSync(dir)) {
    if (name === 'node_modules' || name.startsWith('.')) continue;
    const p = join(dir, name);
    if (statSync(p).isDirectory()) walk(p, out);
    else if (/\.(ts|svelte|js|mjs)$/.test(name)) out.push(p);
  }
  return out;
}
const files = [...walk(join(root, 'src'), []), ...walk(join(root, 'tests'), [])];
for (const f of readdirSync(root)) if (/\.(ts|js|mjs)$/.test(f)) files.push(join(root, f));
const SPEC = /(\bfrom\s*|\bimport\s*\(\s*|\bimport\s+|vi\.mock\(\s*|vi\.importActual(?:<[^>]*>)?\(\s*|new URL\(\s*)(['"])(\.{1,2}\/[^'"]+)\2/g;
let changed = 0;
for (const file of files) {
  const newFile = moves.get(file) ?? file;
  const text = readFileSync(file, 'utf8');
  const out = text.replace(SPEC, (all, lead, quote, spec) => {
    const target = resolve(dirname(file), spec);
    const newTarget = moves.get(target) ?? target;
    if (!existsSync(target) && !moves.has(target)) return all;
    let rel = relative(dirname(newFile), newTarget);
    if (!rel.startsWith('.')) rel = './' + rel;
    return `${lead}${quote}${rel}${quote}`;
  });
  if (out !== text) {
    writeFileSync(file, out);
    changed++;
  }
}
for (const [from, to] of moves) {
  execFileSync('mkdir', ['-p', dirname(to)]);
  execFileSync('git', ['mv', from, to]);
}
console.log(`${moves.size} files moved, ${changed} files re-pointed`);
