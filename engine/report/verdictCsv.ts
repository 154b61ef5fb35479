/**
 * verdict.csv: the verdict of a run in a table, one row per compared quantity and model (report/verdict.ts), for a
 * spreadsheet or a script that wants the statuses without reading summary.json. Units: quantity values in the row's
 * `unit` column (as flow.csv), relative figures in [1]. The headline sentence is summary.json's (`verdict.headline`).
 */
import type { ContinuumComparison } from './comparison';
import { csvDocument } from './csv';

const HEADER = [
  'quantity',
  'unit',
  'model',
  'status',
  'quantity status',
  'best model',
  'model value [unit]',
  'DSMC mean [unit]',
  'scale [unit]',
  'deviation [1]',
  'deviation lower [1]',
  'deviation upper [1]',
  'DSMC half-width [1]',
  'tolerance [1]',
  'half-width to decide [1]',
  'reason',
];

export function verdictCsv(c: ContinuumComparison): string {
  const rows: (number | string)[][] = [];
  for (const v of Object.values(c.verdict)) {
    for (const d of v.models) {
      const value = v.kind === 'integral' ? (c.continuum[d.model]?.[v.quantity] ?? NaN) : NaN;
      rows.push([
        v.quantity,
        v.unit,
        d.model,
        d.status,
        v.status,
        v.bestModel ?? '',
        value,
        v.kind === 'integral' ? value - d.deviation * v.scale : NaN,
        v.scale,
        d.deviation,
        d.lowerAbs,
        d.upperAbs,
        v.relativeHalfWidth,
        v.tolerance,
        d.halfWidthToDecide,
        d.reason ?? '',
      ]);
    }
  }
  return csvDocument(HEADER, rows);
}
