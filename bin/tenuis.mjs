#!/usr/bin/env node
// `npx tenuis ...`: rebuilds dist-cli/ when any source under engine/, cli/ (or workers/,
// bench/) is newer than dist-cli/tenuis.mjs, then runs dist-cli/tenuis.mjs with the same
// process.argv (arguments from process.argv[2] on).
import { existsSync } from 'node:fs';
import { pathToFileURL } from 'node:url';
import { buildCli, cliBundle, cliEntry } from './cli-build.mjs';

if (!existsSync(cliEntry) && !existsSync(cliBundle)) {
  process.stderr.write('tenuis: cli/main.ts does not exist yet, so there is no command line to run.\n');
  process.exit(1);
}

try {
  await buildCli({ onlyIfStale: true });
} catch {
  process.exit(1); // buildCli has already printed the build error
}

if (!existsSync(cliBundle)) {
  process.stderr.write(`tenuis: the build did not produce dist-cli/tenuis.mjs (is cli/main.ts there?)\n`);
  process.exit(1);
}

// Stack traces point into the .ts sources (vite.cli.config.ts writes source maps).
process.setSourceMapsEnabled(true);
await import(pathToFileURL(cliBundle).href);
