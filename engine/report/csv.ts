/**
 * The CSV dialect every table Tenuis writes shares (profiles, fields, surfaces, flow, cut profiles, sweeps,
 * centerlines), in one module of its own so that the table writers depend on it and not on one another.
 *
 * RFC 4180 except for the line end, which is LF ("\n") rather than CRLF — every spreadsheet and CSV library reads
 * both, and LF keeps files diff-friendly in git. A field is quoted when it holds a comma, a double quote, CR or LF
 * (quotes doubled inside). Numbers are written as JavaScript's shortest round-trip decimal (String(x): parsing the
 * text gives back the same double), never quoted or escaped; a value that is not finite (NaN: no information, e.g. an
 * empty cell or fewer than two batches for a ci95) is an empty field. Text fields that a spreadsheet would evaluate
 * as a formula (starting with = + - @, tab or CR) get a leading apostrophe (OWASP, "CSV Injection"; common practice).
 * Headers carry the SI unit in brackets: `temperature [K]`, `temperature ci95 [K]`.
 */

export const CSV_LINE_END = '\n';

const FORMULA_START = /^[=+\-@\t\r]/;
const NEEDS_QUOTES = /[",\r\n]/;

/** One CSV field: numbers as shortest round-trip text (empty if not finite); text escaped and quoted as needed. */
export function csvField(value: number | string): string {
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : '';
  const text = FORMULA_START.test(value) ? `'${value}` : value;
  return NEEDS_QUOTES.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

/** One row: its fields joined by commas, without the line end. */
export function csvRow(values: readonly (number | string)[]): string {
  return values.map(csvField).join(',');
}

/** A whole CSV document: header row, data rows, LF after every row. */
export function csvDocument(header: readonly string[], rows: readonly (readonly (number | string)[])[]): string {
  const lines = [header, ...rows].map(csvRow);
  return lines.join(CSV_LINE_END) + CSV_LINE_END;
}

/** A column header with its unit: `temperature [K]`. */
export function unitHeader(name: string, unit: string): string {
  return `${name} [${unit}]`;
}

/** The header pair of a quantity and its 95 % half-width: `temperature [K]`, `temperature ci95 [K]`. */
export function estimateHeaders(name: string, unit: string): [string, string] {
  return [unitHeader(name, unit), unitHeader(`${name} ci95`, unit)];
}
