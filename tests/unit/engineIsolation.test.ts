// engine/ must run unchanged in a browser, a Web Worker and Node: no DOM, no Node APIs.
// engine/tsconfig.json (lib ES2022, no @types) enforces this at type-check time; this test
// enforces it again from the source text, so it holds even if that tsconfig is loosened.
import { readdirSync, readFileSync } from 'node:fs';
import { join, relative } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const engineDir = join(repoRoot, 'engine');

function tsFiles(dir: string): string[] {
  const out: string[] = [];
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    if (entry.name === 'node_modules') continue;
    const full = join(dir, entry.name);
    if (entry.isDirectory()) out.push(...tsFiles(full));
    else if (entry.name.endsWith('.ts')) out.push(full);
  }
  return out;
}

/** Blanks out block and line comments (a `//` after ':' is kept, as in URLs). */
function stripComments(source: string): string {
  return source.replace(/\/\*[\s\S]*?\*\//g, ' ').replace(/(^|[^:\\])\/\/.*$/gm, '$1');
}

const forbiddenModules = /^(node:.*|fs|fs\/promises|path|worker_threads|child_process|os|url|module|process|buffer)$/;

// import ... from 'x' | export ... from 'x' | import 'x' | import('x') | require('x')
const moduleSpecifier = /(?:\bfrom\s*|\bimport\s*\(\s*|\bimport\s+|\brequire\s*\(\s*)(['"`])([^'"`]+)\1/g;

const forbiddenGlobals: [RegExp, string][] = [
  [/\bwindow\s*[.[]/, 'window'],
  [/\bdocument\s*[.[]/, 'document'],
  [/\bprocess\s*[.[]/, 'process.'],
  [/\bglobalThis\s*\.\s*(window|document|process)\b/, 'globalThis.window/document/process'],
  [/\b__dirname\b|\b__filename\b/, '__dirname/__filename'],
  [/\bBuffer\s*\./, 'Buffer'],
];

/** Violations in one file, as "engine/x.ts:line: what". */
function findViolations(file: string, source: string): string[] {
  const rel = relative(repoRoot, file).split('\\').join('/');
  const problems: string[] = [];
  const lines = stripComments(source).split('\n');
  lines.forEach((line, index) => {
    for (const match of line.matchAll(moduleSpecifier)) {
      const spec = match[2];
      if (spec !== undefined && forbiddenModules.test(spec)) {
        problems.push(`${rel}:${index + 1}: imports '${spec}' (Node module)`);
      }
    }
    for (const [pattern, name] of forbiddenGlobals) {
      if (pattern.test(line)) problems.push(`${rel}:${index + 1}: uses ${name}`);
    }
  });
  return problems;
}

describe('engine isolation', () => {
  it('findViolations() flags Node imports and DOM/Node globals, and ignores comments', () => {
    const sample = [
      "import { readFileSync } from 'node:fs';",
      "import path from 'path';",
      "const w = await import('worker_threads');",
      'const x = window.innerWidth;',
      'document.title = "x";',
      'const env = process.env.FOO;',
      '// window.alert() in a comment is fine',
      "import { stuff } from './fs';",
      'const windowWidthM = 3; // a name that contains window',
    ].join('\n');
    const found = findViolations(join(engineDir, 'sample.ts'), sample);
    expect(found).toEqual([
      "engine/sample.ts:1: imports 'node:fs' (Node module)",
      "engine/sample.ts:2: imports 'path' (Node module)",
      "engine/sample.ts:3: imports 'worker_threads' (Node module)",
      'engine/sample.ts:4: uses window',
      'engine/sample.ts:5: uses document',
      'engine/sample.ts:6: uses process.',
    ]);
  });

  it('engine/**/*.ts imports no Node modules and uses no window, document or process', () => {
    const problems = tsFiles(engineDir).flatMap((file) => findViolations(file, readFileSync(file, 'utf8')));
    expect(problems, `engine/ must stay free of DOM and Node APIs:\n${problems.join('\n')}`).toEqual([]);
  });
});
