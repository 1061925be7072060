/** Runs the real `ledger` command for command-line tests. */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const bin = fileURLToPath(new URL('../../src/cli/bin.mjs', import.meta.url));

export interface LedgerRun {
  code: number | null;
  stdout: string;
  stderr: string;
}

/** Runs `ledger <args>` and returns its exit code and output. */
export function runLedger(args: readonly string[], options: { input?: string; cwd?: string } = {}): LedgerRun {
  const r = spawnSync(process.execPath, [bin, ...args], {
    encoding: 'utf8',
    input: options.input,
    cwd: options.cwd,
    timeout: 60_000,
  });
  return { code: r.status, stdout: r.stdout, stderr: r.stderr };
}
