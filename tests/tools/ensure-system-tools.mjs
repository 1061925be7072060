#!/usr/bin/env node
/**
 * Runs before `npm test` (the `pretest` script): makes sure the system programs the tests
 * need are on this machine, and installs them when it may.
 *
 * - Debian's Chromium at /usr/bin/chromium: the browser tests drive it through playwright-core
 *   (never a downloaded browser).
 * - LibreOffice (`soffice`, from libreoffice-calc-nogui): recalculates the exported workbook
 *   to prove its formulas give the core's levels.
 * - DejaVu fonts (fonts-dejavu-core): text in screenshots and in LibreOffice has real glyphs.
 *
 * When everything is present it prints nothing and exits at once. When something is missing
 * and this user may install Debian packages (root, or `sudo -n` without a password) it runs
 * `apt-get update` and `apt-get install` once, saying so in one line first. Otherwise it stops
 * with one line giving the exact command to run. Plain Node, no dependencies: it runs before
 * anything else is known to work.
 */
import { accessSync, constants, existsSync } from 'node:fs';
import { delimiter, join } from 'node:path';
import { spawnSync } from 'node:child_process';

/** Each program the tests need: how to find it, and the Debian package that brings it. */
const NEEDS = [
  { what: 'Chromium', package: 'chromium', present: () => isExecutable('/usr/bin/chromium') },
  { what: 'LibreOffice Calc (soffice)', package: 'libreoffice-calc-nogui', present: () => onPath('soffice') },
  { what: 'DejaVu fonts', package: 'fonts-dejavu-core', present: () => existsSync('/usr/share/fonts/truetype/dejavu/DejaVuSans.ttf') },
];

function isExecutable(path) {
  try {
    accessSync(path, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

function onPath(name) {
  return (process.env.PATH ?? '').split(delimiter).some((dir) => dir !== '' && isExecutable(join(dir, name)));
}

function succeeds(command, args) {
  return spawnSync(command, args, { stdio: 'ignore' }).status === 0;
}

const missing = NEEDS.filter((need) => !need.present());
if (missing.length === 0) process.exit(0);

const packages = missing.map((need) => need.package);
const manual = `sudo apt-get update && sudo apt-get install -y --no-install-recommends ${packages.join(' ')}`;
const names = missing.map((need) => need.what).join(', ');

const isDebian = existsSync('/etc/debian_version') && onPath('apt-get');
if (!isDebian) {
  console.error(`Tests need ${names}: install ${packages.join(', ')} with your system's package manager (on Debian: ${manual}), then run npm test again.`);
  process.exit(1);
}

const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
const viaSudo = !isRoot && onPath('sudo') && succeeds('sudo', ['-n', 'true']);
if (!isRoot && !viaSudo) {
  console.error(`Tests need ${names}, and this user cannot install packages without a password. Run: ${manual}`);
  process.exit(1);
}

/**
 * Runs apt-get as root (directly or through sudo -n). Its output is kept back and shown
 * (the last lines) only when it fails, so a good install stays to two lines.
 */
function aptGet(args) {
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const [command, full] = isRoot ? ['apt-get', args] : ['sudo', ['-n', 'env', 'DEBIAN_FRONTEND=noninteractive', 'apt-get', ...args]];
  const result = spawnSync(command, full, { stdio: ['ignore', 'pipe', 'pipe'], env, maxBuffer: 64 * 1024 * 1024 });
  if (result.status === 0) return true;
  const output = `${result.stdout ?? ''}${result.stderr ?? ''}`.trimEnd().split('\n');
  console.error(`apt-get ${args.filter((a) => !a.startsWith('-')).join(' ')} failed (exit ${result.status ?? result.signal}); its last lines:`);
  console.error(output.slice(-20).join('\n'));
  return false;
}

console.log(`Installing what the tests need (once; about 2 minutes): ${packages.join(' ')}`);
const started = Date.now();
const installed =
  aptGet(['-qq', 'update']) &&
  aptGet(['-qq', 'install', '-y', '--no-install-recommends', '-o', 'Dpkg::Use-Pty=0', ...packages]);
const stillMissing = NEEDS.filter((need) => !need.present());
if (!installed || stillMissing.length > 0) {
  const left = (stillMissing.length > 0 ? stillMissing : missing).map((need) => need.package).join(' ');
  console.error(`Could not install ${left}. Run: ${manual}`);
  process.exit(1);
}
console.log(`Installed ${packages.join(' ')} in ${Math.round((Date.now() - started) / 1000)} s.`);
