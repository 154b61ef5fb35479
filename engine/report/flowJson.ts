/**
 * The `flow` section of summary.json: the flow numbers of a case with flow sections (results/flowQuantities.ts) as
 * {mean, ci95}, each section's mass flow rate, and the pressures and temperature they refer to; their units go into
 * the summary's `units`.
 */
import { FLOW_QUANTITIES, flowQuantityUnits, type FlowResult } from '../results/flowQuantities';
import { jsonNumber, wallEstimateJson, type JsonNumber, type WallEstimateJson } from './estimateJson';

export interface FlowJson {
  section: string;
  sections: Record<string, { massFlowRate: WallEstimateJson }>;
  upstreamPressure: JsonNumber;
  downstreamPressure: JsonNumber;
  temperature: JsonNumber;
  [quantity: string]: unknown;
}

/** The section as written; adds the units of its quantities to `units`. */
export function flowJson(flow: FlowResult, units: Record<string, string>, planar: boolean): FlowJson {
  const out: FlowJson = {
    section: flow.section,
    sections: Object.fromEntries(
      Object.entries(flow.sections).map(([name, e]) => [name, { massFlowRate: wallEstimateJson(e) }]),
    ),
    upstreamPressure: jsonNumber(flow.upstreamPressurePa),
    downstreamPressure: jsonNumber(flow.downstreamPressurePa),
    temperature: jsonNumber(flow.temperatureK),
  };
  const flowUnits = flowQuantityUnits(planar);
  for (const q of FLOW_QUANTITIES) {
    const e = flow.values[q];
    if (e) out[q] = { mean: jsonNumber(e.mean), ci95: jsonNumber(e.ci95) };
    units[q] = flowUnits[q];
  }
  units.upstreamPressure = 'Pa';
  units.downstreamPressure = 'Pa';
  return out;
}
