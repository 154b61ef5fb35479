/**
 * JSON.stringify with two-space indentation, except that arrays of numbers (velocities [x, y, z]) stay on one line,
 * so case files read like the documentation. The output parses back to the same value.
 */
export function prettyJson(value: unknown): string {
  return format(value, '');
}

function format(value: unknown, indent: string): string {
  if (value === null || typeof value !== 'object') return JSON.stringify(value) ?? 'null';
  const inner = `${indent}  `;
  if (Array.isArray(value)) {
    if (value.length === 0) return '[]';
    if (value.every((v) => v === null || typeof v === 'number' || typeof v === 'boolean')) {
      return `[${value.map((v) => JSON.stringify(v)).join(', ')}]`;
    }
    return `[\n${value.map((v) => `${inner}${format(v, inner)}`).join(',\n')}\n${indent}]`;
  }
  const toJson = (value as { toJSON?: () => unknown }).toJSON;
  if (typeof toJson === 'function') return format(toJson.call(value), indent);
  const entries = Object.entries(value).filter(([, v]) => v !== undefined && typeof v !== 'function');
  if (entries.length === 0) return '{}';
  return `{\n${entries.map(([k, v]) => `${inner}${JSON.stringify(k)}: ${format(v, inner)}`).join(',\n')}\n${indent}}`;
}
