#!/usr/bin/env -S node --max-semi-space-size=64
// Entry point of the `ledger` command: loads the TypeScript sources through tsx.
// The first line gives Node's new objects semi-spaces of 64 MB (16 MB by default): a project of 100,000 machines makes
// many short-lived objects while it is read and evaluated, and fewer collections take some 5–10 % off the CPU time
// of `ledger evaluate` (for some 80 MB more at the peak). `npm run ledger` passes the same flag.
import { register } from 'tsx/esm/api';

// A reader that closes early (`ledger evaluate p.json | head -1`) is not an error: stop quietly.
for (const stream of [process.stdout, process.stderr]) {
  stream.on('error', (e) => {
    if (e && e.code === 'EPIPE') process.exit(process.exitCode ?? 0);
    throw e;
  });
}

register();
const { main } = await import('./main.ts');
process.exitCode = await main(process.argv.slice(2));
