// Builds the Node entry points (vite.cli.config.ts -> dist-cli/) and decides when a rebuild is
// needed. Used by bin/tenuis.mjs (rebuild only when stale) and by the vitest global setup
// (always rebuild). Paths are relative to this file, so it works from any working directory.
import { existsSync, mkdirSync, readdirSync, rmSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const repoRoot = fileURLToPath(new URL('..', import.meta.url));
export const cliBundle = join(repoRoot, 'dist-cli', 'tenuis.mjs');
export const cliEntry = join(repoRoot, 'cli', 'main.ts');
const cliConfig = join(repoRoot, 'vite.cli.config.ts');

// Sources whose change makes dist-cli stale. engine/ and cli/ hold what the command line runs;
// workers/ may hold worker_thread entries (*.node.ts) that the build picks up too.
const watchedDirs = ['engine', 'cli', 'workers', 'bench'];
const lockDir = join(repoRoot, 'node_modules', '.cache', 'tenuis-cli-build.lock');
const lockWaitMs = 120_000; // a cold build takes seconds; past this a lock is taken as stale

/** Newest modification time (ms) of any .ts file under dir, or 0. */
function newestTsMtime(dir) {
  let newest = 0;
  let names;
  try {
    names = readdirSync(dir, { withFileTypes: true });
  } catch {
    return 0;
  }
  for (const entry of names) {
    if (entry.name === 'node_modules' || entry.name.startsWith('.')) continue;
    const full = join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestTsMtime(full));
    else if (/\.tsx?$/.test(entry.name)) newest = Math.max(newest, statSync(full).mtimeMs);
  }
  return newest;
}

/** True when dist-cli/tenuis.mjs is missing or older than any watched source or the config. */
export function cliBuildIsStale() {
  if (!existsSync(cliBundle)) return true;
  const built = statSync(cliBundle).mtimeMs;
  let newest = statSync(cliConfig).mtimeMs;
  for (const dir of watchedDirs) newest = Math.max(newest, newestTsMtime(join(repoRoot, dir)));
  return newest > built;
}

const sleep = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

/** Serialises builds between processes (several `npx tenuis` at once) with an atomic mkdir. */
async function withBuildLock(fn) {
  mkdirSync(join(lockDir, '..'), { recursive: true });
  const start = Date.now();
  for (;;) {
    try {
      mkdirSync(lockDir);
      break;
    } catch (error) {
      if (error.code !== 'EEXIST') throw error;
      let age;
      try {
        age = Date.now() - statSync(lockDir).mtimeMs;
      } catch {
        continue; // released between mkdir and stat
      }
      if (age > lockWaitMs || Date.now() - start > lockWaitMs) {
        rmSync(lockDir, { recursive: true, force: true });
        continue;
      }
      await sleep(100);
    }
  }
  try {
    return await fn();
  } finally {
    rmSync(lockDir, { recursive: true, force: true });
  }
}

/**
 * Builds dist-cli/ with vite.cli.config.ts. Quiet: prints nothing on success; on failure
 * prints the build error to stderr and throws.
 * @param {{ onlyIfStale?: boolean }} [options] onlyIfStale: skip when dist-cli is up to date
 *   (checked again after taking the lock, since another process may just have built it).
 * @returns {Promise<boolean>} whether a build ran
 */
export async function buildCli(options = {}) {
  if (options.onlyIfStale && !cliBuildIsStale()) return false;
  return withBuildLock(async () => {
    if (options.onlyIfStale && !cliBuildIsStale()) return false;
    const { build } = await import('vite');
    try {
      await build({ configFile: cliConfig, root: repoRoot, logLevel: 'silent', mode: 'production' });
    } catch (error) {
      process.stderr.write(`tenuis: building the command line (vite.cli.config.ts) failed:\n`);
      // The message carries the file, line and code frame; the stack would only show vite's insides.
      process.stderr.write(`${error?.message || error}\n`);
      throw error;
    }
    return true;
  });
}
