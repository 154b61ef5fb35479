/**
 * Compares a value read back from JSON with the in-memory value that should have been written, as JSON sees them:
 * members whose value is undefined are absent, key order does not matter. Used where a file's header is checked
 * against data the reader already holds (a sample file's case against the caller's plan) without re-validating it.
 */

/** null when a and b are the same JSON, else the path of the first difference ("initial.pressurePa", "(root)"). */
export function sameJson(a: unknown, b: unknown, path = ''): string | null {
  const here = path || '(root)';
  if (a === b) return null;
  if (typeof a !== 'object' || typeof b !== 'object' || a === null || b === null) return here;
  if (Array.isArray(a) !== Array.isArray(b)) return here;
  if (Array.isArray(a) && Array.isArray(b)) {
    if (a.length !== b.length) return here;
    for (let k = 0; k < a.length; k++) {
      const d = sameJson(a[k] ?? null, b[k] ?? null, `${path}[${k}]`);
      if (d !== null) return d;
    }
    return null;
  }
  const ra = a as Record<string, unknown>;
  const rb = b as Record<string, unknown>;
  const keys = new Set([...Object.keys(ra), ...Object.keys(rb)]);
  for (const key of keys) {
    const d = sameJson(ra[key], rb[key], path ? `${path}.${key}` : key);
    if (d !== null) return d;
  }
  return null;
}
