// Vitest global setup: build the Node entry points (vite.cli.config.ts -> dist-cli/) before
// any test file runs, so tests can spawn `node dist-cli/tenuis.mjs` or bin/tenuis.mjs.
import { existsSync } from 'node:fs';
import { buildCli, cliEntry } from '../../bin/cli-build.mjs';

export default async function setup(): Promise<void> {
  if (!existsSync(cliEntry)) {
    // Engine unit tests do not need the command line; say why it was not built.
    console.warn('[tests/setup] cli/main.ts not found: dist-cli/ was not built.');
    return;
  }
  await buildCli();
}
