/**
 * flow.csv: the flow numbers of a run, one row per quantity and unit — SI first, then the engineering units vacuum
 * practice reads them in (throughput in mbar·L/s, conductance in L/s; molar flow is already in sccm) — with the 95 %
 * half-width next to each value, and each section's mass flow rate.
 *
 * The page passes the units its results card shows (`chosenUnits`): each SI row then carries them in three extra
 * columns beside SI (the other rows leave them empty). Without the option the file is exactly the command line's.
 */
import type { FlowResult } from '../results/flowQuantities';
import { FLOW_QUANTITIES, flowQuantityUnits } from '../results/flowQuantities';
import { flowUnitLabel, flowValueIn, isFlowUnitQuantity, type FlowUnitQuantity } from '../units/flowUnits';
import { csvDocument } from './csv';

/** 1 Pa·m³/s = 10 mbar·L/s (1 mbar = 100 Pa, 1 L = 1e-3 m³); 1 m³/s = 1000 L/s. */
const ENGINEERING = {
  throughput: { factor: 10, unit: 'mbar L/s' },
  conductance: { factor: 1000, unit: 'L/s' },
} as const;

export interface FlowCsvOptions {
  /** The unit each flow number is shown in (flowUnits.ts choices), written as extra columns beside SI. */
  readonly chosenUnits?: Readonly<Partial<Record<FlowUnitQuantity, string>>>;
}

export function flowCsv(flow: FlowResult, planar: boolean, options: FlowCsvOptions = {}): string {
  const units = flowQuantityUnits(planar);
  const perDepth = planar ? '/m' : '';
  const chosen = options.chosenUnits;
  const rows: (number | string)[][] = [];
  // Without chosen units no row gets the extra columns, so the file stays the command line's byte for byte.
  const extra = (q: string, mean: number, ci95: number): (number | string)[] => {
    if (!chosen) return [];
    const unit = isFlowUnitQuantity(q) ? chosen[q] : undefined;
    if (!unit || !isFlowUnitQuantity(q)) return ['', '', ''];
    return [flowUnitLabel(unit, planar), flowValueIn(q, mean, unit), flowValueIn(q, ci95, unit)];
  };
  const blank = chosen ? ['', '', ''] : [];
  for (const q of FLOW_QUANTITIES) {
    const e = flow.values[q];
    if (!e) continue;
    rows.push([q, units[q], e.mean, e.ci95, ...extra(q, e.mean, e.ci95)]);
    if (q === 'throughput' || q === 'conductance') {
      const { factor, unit } = ENGINEERING[q];
      rows.push([q, planar ? `${unit}/m` : unit, e.mean * factor, e.ci95 * factor, ...blank]);
    }
  }
  for (const [name, e] of Object.entries(flow.sections))
    rows.push([`sections.${name}.massFlowRate`, `kg/s${perDepth}`, e.mean, e.ci95, ...blank]);
  const header = ['quantity', 'unit', 'mean', 'ci95', ...(chosen ? ['chosen unit', 'chosen mean', 'chosen ci95'] : [])];
  return csvDocument(header, rows);
}
