#!/usr/bin/env node
// Entry point of the `ledger` command: loads the TypeScript sources through tsx.
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
