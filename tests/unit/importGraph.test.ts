// The import graph of the source tree, type imports included: eslint's import-x/no-cycle sees value imports only, so
// a cycle made of `import type` lines would pass it. This test reads every static import and re-export of engine/,
// app/, workers/ and cli/ from the source text, resolves the relative ones to files, and asks for no strongly
// connected component of more than one file, and, one level up, for no two engine folders importing each other.
import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';

const repoRoot = fileURLToPath(new URL('../..', import.meta.url));
const ROOTS = ['engine', 'app', 'workers', 'cli'];

function sourceFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = join(dir, e.name);
    if (e.isDirectory()) return sourceFiles(full);
    return /\.tsx?$/.test(e.name) && !e.name.endsWith('.d.ts') ? [full] : [];
  });
}

/** import … from 'x' | import type … from 'x' | export … from 'x' | import 'x' (comments blanked first). */
const STATIC_IMPORT = /(?:^|;|\n)\s*(?:import|export)\s+(?:type\s+)?(?:[^'";]*?\sfrom\s+)?(['"])([^'"]+)\1/g;

function resolveSpecifier(fromFile: string, spec: string): string | undefined {
  if (!spec.startsWith('.')) return undefined;
  const base = resolve(dirname(fromFile), spec);
  for (const candidate of [base, `${base}.ts`, `${base}.tsx`, join(base, 'index.ts')]) {
    if (existsSync(candidate) && statSync(candidate).isFile()) return candidate;
  }
  return undefined;
}

function importGraph(): Map<string, string[]> {
  const graph = new Map<string, string[]>();
  for (const root of ROOTS) {
    for (const file of sourceFiles(join(repoRoot, root))) {
      const text = readFileSync(file, 'utf8')
        .replace(/\/\*[\s\S]*?\*\//g, ' ')
        .replace(/(^|[^:])\/\/.*$/gm, '$1');
      const targets = new Set<string>();
      for (const m of text.matchAll(STATIC_IMPORT)) {
        const target = resolveSpecifier(file, m[2]);
        if (target && target !== file) targets.add(relative(repoRoot, target));
      }
      graph.set(relative(repoRoot, file), [...targets]);
    }
  }
  return graph;
}

/** Tarjan's strongly connected components; returns the components with more than one node. */
function cycles(graph: Map<string, string[]>): string[][] {
  let index = 0;
  const order = new Map<string, number>();
  const low = new Map<string, number>();
  const onStack = new Set<string>();
  const stack: string[] = [];
  const out: string[][] = [];
  const visit = (v: string): void => {
    order.set(v, index);
    low.set(v, index++);
    stack.push(v);
    onStack.add(v);
    for (const w of graph.get(v) ?? []) {
      if (!order.has(w)) {
        visit(w);
        low.set(v, Math.min(low.get(v)!, low.get(w)!));
      } else if (onStack.has(w)) low.set(v, Math.min(low.get(v)!, order.get(w)!));
    }
    if (low.get(v) === order.get(v)) {
      const component: string[] = [];
      let w: string;
      do {
        w = stack.pop()!;
        onStack.delete(w);
        component.push(w);
      } while (w !== v);
      if (component.length > 1) out.push(component.sort());
    }
  };
  for (const v of graph.keys()) if (!order.has(v)) visit(v);
  return out;
}

describe('import graph (value and type imports)', () => {
  const graph = importGraph();

  it('reads the tree (sanity: the engine entry imports the kernel)', () => {
    const simulation = [...graph.entries()].find(
      ([file]) => file.endsWith('simulation.ts') && file.startsWith('engine'),
    );
    expect(simulation?.[1].some((t) => t.startsWith('engine/kernel/'))).toBe(true);
  });

  it('has no cycle of files in engine/, app/, workers/ or cli/', () => {
    expect(cycles(graph)).toEqual([]);
  });

  it('has no two engine folders that import each other, directly or through others', () => {
    const folderOf = (file: string) => file.split('/').slice(0, 2).join('/');
    const folders = new Map<string, Set<string>>();
    for (const [file, targets] of graph) {
      if (!file.startsWith('engine/')) continue;
      const from = folderOf(file);
      if (!folders.has(from)) folders.set(from, new Set());
      for (const t of targets) if (t.startsWith('engine/') && folderOf(t) !== from) folders.get(from)!.add(folderOf(t));
    }
    const folderGraph = new Map([...folders].map(([k, v]) => [k, [...v]]));
    expect(cycles(folderGraph)).toEqual([]);
  });
});
