// `npm run test:e2e`: runs the Playwright browser tests (playwright.config.ts) against a
// system Chromium. Builds dist/ first when it is missing or older than the app sources, so the
// script also works on its own; `npm test` has built it already. Extra arguments are passed to
// `playwright test`, e.g. `npm run test:e2e -- --headed`.
import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { findChromium, installHint } from './find-chromium.mjs';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));

let browser;
try {
  browser = findChromium();
} catch (error) {
  console.error(`tenuis e2e: ${error.message}`);
  process.exit(1);
}
if (!browser) {
  console.error(`tenuis e2e: ${installHint}`);
  process.exit(1);
}

/** Newest mtime (ms) of the files under path (a file or a directory), or 0 if absent. */
function newestMtime(path) {
  if (!existsSync(path)) return 0;
  const stat = statSync(path);
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = 0;
  for (const name of readdirSync(path)) newest = Math.max(newest, newestMtime(join(path, name)));
  return newest;
}

const builtIndex = join(repoRoot, 'dist', 'index.html');
const appInputs = ['index.html', 'vite.config.ts', 'app', 'workers', 'engine', 'public', 'package-lock.json'];
const newestInput = Math.max(...appInputs.map((p) => newestMtime(join(repoRoot, p))));
if (!existsSync(builtIndex) || statSync(builtIndex).mtimeMs < newestInput) {
  console.log('tenuis e2e: dist/ is missing or stale, running vite build');
  const { build } = await import('vite');
  await build({ root: repoRoot, configFile: join(repoRoot, 'vite.config.ts'), logLevel: 'warn' });
}

const playwrightCli = createRequire(import.meta.url).resolve('@playwright/test/cli');
const result = spawnSync(
  process.execPath,
  [playwrightCli, 'test', '--config', join(repoRoot, 'playwright.config.ts'), ...process.argv.slice(2)],
  { cwd: repoRoot, stdio: 'inherit', env: { ...process.env, TENUIS_CHROMIUM: browser } },
);
if (result.error) throw result.error;
process.exit(result.status ?? 1);
