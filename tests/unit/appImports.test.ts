/**
 * The page's main bundle holds no engine code: app/ files import engine/ and workers/ as types only, except the
 * modules loaded by dynamic import into chunks of their own (app/bridge/loadEngine.ts) and what only they use — the
 * same list as eslint.config.js's APP_BRIDGE, which keeps this rule in the linter too.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const appDir = join(repoRoot, 'app');

/** Lazily loaded entry points (and modules imported only by them): the set-up chunk, then the run chunk. */
const LAZY = new Set([
  'app/bridge/setupApi.ts',
  'app/bridge/deriveCase.ts',
  'app/bridge/planView.ts',
  'app/bridge/runApi.ts',
  'app/bridge/sweepApi.ts',
  'app/bridge/liveViews.ts',
  'app/bridge/longDuctApi.ts',
]);

function files(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? files(join(dir, e.name)) : /\.tsx?$/.test(e.name) ? [join(dir, e.name)] : [],
  );
}

const valueImport = /^\s*(?:import|export)\s+(?!type\b)[^;]*?from\s+['"]([^'"]+)['"]/gm;

describe('app/ imports', () => {
  it('only the lazily loaded modules import engine/ or workers/ code; everything else imports types (theirs too)', () => {
    const problems: string[] = [];
    for (const file of files(appDir)) {
      const rel = relative(repoRoot, file).split('\\').join('/');
      if (LAZY.has(rel)) continue;
      const source = readFileSync(file, 'utf8');
      for (const m of source.matchAll(valueImport)) {
        const target = relative(repoRoot, join(file, '..', m[1]))
          .split('\\')
          .join('/');
        if (m[1].startsWith('.') && /^(engine|workers)\//.test(target)) problems.push(`${rel}: imports ${m[1]}`);
        // A static value import of a lazy module would pull its chunk, and the engine with it, into the main bundle.
        if (m[1].startsWith('.') && LAZY.has(target.replace(/(\.tsx?)?$/, '.ts')))
          problems.push(
            `${rel}: imports the lazily loaded ${m[1]} (import its types, or load it through loadEngine.ts)`,
          );
      }
      for (const m of source.matchAll(/import\(\s*['"]([^'"]+)['"]\s*\)/g)) {
        const target = relative(repoRoot, join(file, '..', m[1]))
          .split('\\')
          .join('/');
        if (/^(engine|workers)\//.test(target))
          problems.push(`${rel}: loads ${m[1]} directly (go through app/bridge/loadEngine.ts)`);
      }
    }
    expect(problems).toEqual([]);
  });
});
