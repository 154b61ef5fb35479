/**
 * The flow numbers of a result as the results view lists them: the engine's FlowResult (result.flow, present for
 * cases with flow sections) as labelled rows with their units, and what they refer to (section, vessel pressures,
 * temperature). Read through the engine's own result types; a result without flow sections has none, and the card
 * then shows nothing. (Continuum curves and verdicts come with the comparison: comparisonView.ts.)
 */
import type { SimulationResult } from '../../engine/results/summarize';
import type { FlowQuantityName, FlowResult } from '../../engine/results/flowQuantities';
import type { FlowUnitChoice, FlowUnitQuantity } from '../../engine/units/flowUnits';

/** The run API's FLOW_UNIT_CHOICES: the units each flow number with a unit can be shown in. */
export type FlowUnitChoices = Readonly<Record<FlowUnitQuantity, readonly FlowUnitChoice[]>>;

export interface FlowEstimate {
  readonly name: FlowQuantityName;
  readonly label: string;
  readonly mean: number;
  readonly ci95: number;
  readonly unit: string;
}

export interface FlowNumbers {
  /** In the engine's order; numbers the case cannot define are left out, as the engine leaves them out. */
  readonly rows: readonly FlowEstimate[];
  readonly context: string | null;
  /** Per metre of depth (a planar case): every unit is followed by /m. */
  readonly planar: boolean;
}

const FLOW_LABELS: Readonly<Record<FlowQuantityName, string>> = {
  massFlowRate: 'mass flow rate',
  throughput: 'throughput',
  molarFlow: 'molar flow',
  conductance: 'conductance',
  transmissionProbability: 'transmission probability',
  reducedFlowRate: 'reduced flow rate G_P',
  thermalCreepFlowRate: 'thermal-creep coefficient G_T (from the heat flow, by reciprocity)',
};

/** Where the flow numbers refer to: the section, and the vessel pressures and temperature where they are finite. */
function contextOf(f: FlowResult): string {
  const parts = [`through section ${f.section}`];
  if (Number.isFinite(f.upstreamPressurePa)) parts.push(`upstream ${f.upstreamPressurePa.toPrecision(4)} Pa`);
  if (Number.isFinite(f.downstreamPressurePa)) parts.push(`downstream ${f.downstreamPressurePa.toPrecision(4)} Pa`);
  if (Number.isFinite(f.temperatureK)) parts.push(`${f.temperatureK.toPrecision(4)} K`);
  return parts.join(', ');
}

/** units: each flow number's unit (the run API's flowQuantityUnits for this result), if known. */
export function flowNumbersOf(
  result: SimulationResult,
  units: Readonly<Partial<Record<FlowQuantityName, string>>> = {},
): FlowNumbers {
  const f = result.flow;
  if (!f) return { rows: [], context: null, planar: !result.axisymmetric };
  const rows: FlowEstimate[] = [];
  for (const [name, e] of Object.entries(f.values) as [FlowQuantityName, FlowResult['values'][FlowQuantityName]][]) {
    if (e) rows.push({ name, label: FLOW_LABELS[name], mean: e.mean, ci95: e.ci95, unit: units[name] ?? '' });
  }
  return { rows, context: contextOf(f), planar: !result.axisymmetric };
}
