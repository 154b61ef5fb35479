/**
 * flow.csv: the flow numbers of a run, one row per quantity and unit — SI first, then the engineering units vacuum
 * practice reads them in (throughput in mbar·L/s, conductance in L/s; molar flow is already in sccm) — with the 95 %
 * half-width next to each value, and each section's mass flow rate.
 */
import type { FlowResult } from '../results/flowQuantities';
import { FLOW_QUANTITIES, flowQuantityUnits } from '../results/flowQuantities';
import { csvDocument } from './csv';

/** 1 Pa·m³/s = 10 mbar·L/s (1 mbar = 100 Pa, 1 L = 1e-3 m³); 1 m³/s = 1000 L/s. */
const ENGINEERING = {
  throughput: { factor: 10, unit: 'mbar L/s' },
  conductance: { factor: 1000, unit: 'L/s' },
} as const;

export function flowCsv(flow: FlowResult, planar: boolean): string {
  const units = flowQuantityUnits(planar);
  const perDepth = planar ? '/m' : '';
  const rows: (number | string)[][] = [];
  for (const q of FLOW_QUANTITIES) {
    const e = flow.values[q];
    if (!e) continue;
    rows.push([q, units[q], e.mean, e.ci95]);
    if (q === 'throughput' || q === 'conductance') {
      const { factor, unit } = ENGINEERING[q];
      rows.push([q, planar ? `${unit}/m` : unit, e.mean * factor, e.ci95 * factor]);
    }
  }
  for (const [name, e] of Object.entries(flow.sections))
    rows.push([`sections.${name}.massFlowRate`, `kg/s${perDepth}`, e.mean, e.ci95]);
  return csvDocument(['quantity', 'unit', 'mean', 'ci95'], rows);
}
