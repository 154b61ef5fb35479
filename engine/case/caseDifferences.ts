/**
 * Where two cases differ, field by field, as messages a user can act on (e.g. before merging replicas that must be
 * runs of the same case). Compares parsed cases as plain JSON data; key order does not matter.
 */
import type { Case } from './schema';

const MAX_LISTED = 6;
const MAX_VALUE_CHARS = 60;

function shown(v: unknown): string {
  if (v === undefined) return '(absent)';
  const text = JSON.stringify(v);
  return text.length > MAX_VALUE_CHARS ? `${text.slice(0, MAX_VALUE_CHARS - 1)}…` : text;
}

function isRecord(v: unknown): v is Record<string, unknown> {
  return typeof v === 'object' && v !== null && !Array.isArray(v);
}

function collect(a: unknown, b: unknown, path: string, ignore: ReadonlySet<string>, out: string[]): void {
  if (ignore.has(path)) return;
  if (isRecord(a) && isRecord(b)) {
    const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort();
    for (const k of keys) collect(a[k], b[k], path ? `${path}.${k}` : k, ignore, out);
    return;
  }
  if (Array.isArray(a) && Array.isArray(b) && a.length === b.length) {
    a.forEach((x, i) => collect(x, b[i], `${path}[${i}]`, ignore, out));
    return;
  }
  if (!Object.is(a, b)) out.push(`${path || '(case)'}: ${shown(a)} vs ${shown(b)}`);
}

/**
 * "field: valueA vs valueB" for each field (dotted path, e.g. "boundaries.top.temperatureK") in which the cases
 * differ, at most MAX_LISTED of them plus a count of the rest; `ignore` lists top-level or dotted paths to skip.
 * Empty when they agree.
 */
export function caseDifferences(a: Case, b: Case, ignore: readonly string[] = []): string[] {
  const all: string[] = [];
  collect(a, b, '', new Set(ignore), all);
  if (all.length <= MAX_LISTED) return all;
  return [...all.slice(0, MAX_LISTED), `… and ${all.length - MAX_LISTED} more`];
}
