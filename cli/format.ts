/** Number and duration formatting for human-readable terminal output (not for files: exports keep full precision). */

/** x with `digits` significant digits, trailing zeros dropped; "n/a" when not finite. */
export function sig(x: number, digits = 4): string {
  if (!Number.isFinite(x)) return 'n/a';
  const abs = Math.abs(x);
  if (abs !== 0 && (abs >= 1e6 || abs < 1e-3)) {
    const [m, e] = x.toExponential(digits - 1).split('e');
    return `${String(Number(m))}e${e.replace('+', '')}`;
  }
  return String(Number(x.toPrecision(digits)));
}

/** "mean ± ci95 unit", the half-width with 2 significant digits and the mean to the same decimal place. */
export function plusMinus(mean: number, ci95: number, unit: string): string {
  if (!Number.isFinite(mean)) return `n/a ${unit}`;
  if (!Number.isFinite(ci95) || ci95 <= 0) return `${sig(mean)} ${unit} (no error bar)`;
  const place = Math.floor(Math.log10(ci95)) - 1;
  const decimals = Math.max(0, -place);
  if (Math.abs(mean) >= 1e6 || Math.abs(mean) < 1e-3) return `${sig(mean)} ± ${sig(ci95, 2)} ${unit}`;
  const round = (v: number) => (decimals > 0 ? v.toFixed(decimals) : String(Math.round(v / 10 ** place) * 10 ** place));
  return `${round(mean)} ± ${round(ci95)} ${unit}`;
}

/** Seconds as "0.4s", "12s", "3m 05s" or "1h 02m". */
export function duration(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds < 0) return '?';
  if (seconds < 9.95) return `${seconds.toFixed(1)}s`;
  const s = Math.round(seconds);
  if (s < 60) return `${s}s`;
  if (s < 3600) return `${Math.floor(s / 60)}m ${String(s % 60).padStart(2, '0')}s`;
  return `${Math.floor(s / 3600)}h ${String(Math.floor((s % 3600) / 60)).padStart(2, '0')}m`;
}

/** Bytes as "12.3 MB" (decimal prefixes). */
export function bytes(n: number): string {
  if (n < 1e3) return `${n} B`;
  if (n < 1e6) return `${sig(n / 1e3, 3)} kB`;
  if (n < 1e9) return `${sig(n / 1e6, 3)} MB`;
  return `${sig(n / 1e9, 3)} GB`;
}

/** Aligned "label  value" lines. */
export function table(rows: readonly (readonly [string, string])[], indent = '  '): string {
  const width = Math.max(0, ...rows.map(([label]) => label.length));
  return rows.map(([label, value]) => `${indent}${label.padEnd(width)}  ${value}`).join('\n');
}
