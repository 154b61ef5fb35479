// First step of `npm test` (before the unit tests, so a missing browser is found in seconds, not after nine minutes):
// make sure a Chromium for the browser tests is there. When none is found and this machine allows it (root, apt-get
// present), it installs Debian's `chromium` package, saying so; otherwise it prints the one command to run and fails.
// A browser build is never downloaded (Playwright's own downloads are not used by this project).
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { findChromium, installHint } from './find-chromium.mjs';

const APT_GET = '/usr/bin/apt-get';
const INSTALL = ['install', '-y', '-qq', '--no-install-recommends', 'chromium'];

function found() {
  try {
    return findChromium();
  } catch (error) {
    console.error(`tenuis: ${error.message}`);
    process.exit(1);
  }
}

function run(args, env) {
  const r = spawnSync(APT_GET, args, { stdio: ['ignore', 'ignore', 'inherit'], env: { ...process.env, ...env } });
  return r.status === 0;
}

let browser = found();
if (!browser) {
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot || !existsSync(APT_GET) || process.env.TENUIS_NO_BROWSER_INSTALL === '1') {
    console.error(`tenuis: ${installHint}`);
    process.exit(1);
  }
  console.log("tenuis: no Chromium found for the browser tests; installing Debian's chromium package (apt-get)…");
  const env = { DEBIAN_FRONTEND: 'noninteractive' };
  if (!run(['update', '-qq'], env) || !run(INSTALL, env)) {
    console.error(`tenuis: apt-get could not install chromium.\n${installHint}`);
    process.exit(1);
  }
  browser = found();
  if (!browser) {
    console.error(`tenuis: chromium was installed but not found.\n${installHint}`);
    process.exit(1);
  }
  console.log(`tenuis: installed ${browser}`);
}
