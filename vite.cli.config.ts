import { existsSync, readdirSync } from 'node:fs';
import { builtinModules } from 'node:module';
import { basename, dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vite';

// Node entry points (Node 20 cannot run .ts directly, least of all in a worker_thread), built
// in SSR mode into dist-cli/:
//   cli/main.ts             -> dist-cli/tenuis.mjs   (run by bin/tenuis.mjs, i.e. `npx tenuis`)
//   bench/bench.ts          -> dist-cli/bench.mjs    (`npm run bench`)
//   workers/<name>.node.ts  -> dist-cli/<name>.node.mjs, for each such file: worker_thread
//     entries, loaded with new Worker(new URL('./<name>.node.mjs', import.meta.url)).
// Everything is bundled into dist-cli except Node built-ins, so the output needs no
// node_modules at run time.
const root = dirname(fileURLToPath(import.meta.url));

function entryPoints(): Record<string, string> {
  const entries: Record<string, string> = {};
  const fixed: Record<string, string> = { tenuis: 'cli/main.ts', bench: 'bench/bench.ts' };
  for (const [name, file] of Object.entries(fixed)) {
    // Entries not written yet are skipped so the others still build; bin/tenuis.mjs reports a
    // missing cli/main.ts itself.
    if (existsSync(join(root, file))) entries[name] = join(root, file);
  }
  const workersDir = join(root, 'workers');
  if (existsSync(workersDir)) {
    for (const file of readdirSync(workersDir)) {
      if (file.endsWith('.node.ts')) entries[basename(file, '.ts')] = join(workersDir, file);
    }
  }
  return entries;
}

export const cliEntryPoints = entryPoints();

const nodeBuiltins = new Set([...builtinModules, ...builtinModules.map((m) => `node:${m}`)]);

export default defineConfig({
  root,
  // Nothing from public/ belongs in the Node build.
  publicDir: false,
  logLevel: 'warn',
  ssr: {
    target: 'node',
    // Bundle all dependencies (zod, jstat, comlink, ...): dist-cli is self-contained.
    noExternal: true,
    external: [...nodeBuiltins],
  },
  build: {
    ssr: true,
    outDir: 'dist-cli',
    emptyOutDir: true,
    target: 'node20',
    minify: false,
    sourcemap: true,
    reportCompressedSize: false,
    rolldownOptions: {
      input: cliEntryPoints,
      external: (id) => nodeBuiltins.has(id),
      output: {
        format: 'es',
        entryFileNames: '[name].mjs',
        chunkFileNames: 'chunks/[name]-[hash].mjs',
      },
    },
  },
});
