/** Number and unit formatting for display (the engine's own formatting is for files and the command line). */

/** x with n significant digits, no trailing zeros; '—' when not finite. */
export function sig(x: number, n = 4): string {
  if (!Number.isFinite(x)) return '—';
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (a >= 1e-3 && a < 1e6) return String(Number(x.toPrecision(n)));
  return x.toExponential(n - 1).replace(/\.?0+e/, 'e');
}

/** "mean ± ci95" with the half-width to 2 significant digits and the mean to the same decimal place. */
export function estimateText(mean: number, ci95: number): string {
  if (!Number.isFinite(mean)) return '—';
  if (!Number.isFinite(ci95) || ci95 <= 0) return `${sig(mean, 4)} ± —`;
  const place = Math.floor(Math.log10(ci95)) - 1;
  const decimals = Math.max(0, -place);
  if (Math.abs(mean) >= 1e-3 && Math.abs(mean) < 1e6 && ci95 >= 1e-6 && decimals <= 8) {
    return `${mean.toFixed(decimals)} ± ${ci95.toFixed(decimals)}`;
  }
  return `${sig(mean, 4)} ± ${sig(ci95, 2)}`;
}

export function durationText(seconds: number): string {
  if (!Number.isFinite(seconds) || seconds < 0) return '—';
  if (seconds < 10) return `${seconds.toFixed(1)} s`;
  if (seconds < 90) return `${Math.round(seconds)} s`;
  if (seconds < 5400) return `${Math.floor(seconds / 60)} min ${Math.round(seconds % 60)} s`;
  return `${(seconds / 3600).toFixed(1)} h`;
}

export function bytesText(bytes: number): string {
  if (bytes < 1e6) return `${(bytes / 1e3).toFixed(0)} kB`;
  if (bytes < 1e9) return `${(bytes / 1e6).toFixed(1)} MB`;
  return `${(bytes / 1e9).toFixed(2)} GB`;
}

export function countText(n: number): string {
  return Number.isFinite(n) ? Math.round(n).toLocaleString('en-US') : '—';
}

/** A length unit that suits a size (m): nm, µm, mm or m, with its factor (value in the unit = metres / factor). */
export function lengthUnitFor(sizeM: number): { unit: string; factor: number } {
  if (sizeM < 1e-6) return { unit: 'nm', factor: 1e-9 };
  if (sizeM < 1e-3) return { unit: 'µm', factor: 1e-6 };
  if (sizeM < 1) return { unit: 'mm', factor: 1e-3 };
  return { unit: 'm', factor: 1 };
}

/** A file-name-safe version of a case name. */
export function slug(name: string): string {
  return (
    name
      .trim()
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-|-$/g, '') || 'case'
  );
}
