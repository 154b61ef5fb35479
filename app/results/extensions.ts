/**
 * Extension points of the result, for features other engineers are adding to the engine's summary. They are not in
 * SimulationResult yet; when `flow`, `continuum` or `verdict` appear on it, the results view renders them:
 * - `flow`: flow numbers (mass flow rate, throughput, conductance, transmission probability …): the engine's
 *   FlowResult (engine/results/flowQuantities.ts, estimates in `values`), or estimates `{ mean, ci95, unit?, label? }`
 *   keyed by name;
 * - `continuum`: continuum predictions to overlay on the profiles, keyed by model name (no-slip, first-order slip …),
 *   each either `{ quantity, values, y?, label? }` or a record of profile-field name → values at the profile rows;
 * - `verdict`: the model verdict in plain words, a string or `{ text | summary, reasons? }`.
 * Shapes are checked when read, so a different shape is ignored rather than breaking the page.
 */
import type { SimulationResult } from '../../engine/results/summarize';

export interface FlowEstimate {
  readonly name: string;
  readonly label: string;
  readonly mean: number;
  readonly ci95: number;
  readonly unit: string;
}

export interface ContinuumCurve {
  readonly model: string;
  readonly quantity: string;
  readonly values: readonly number[];
  /** Positions (m); absent = the profile's own rows. */
  readonly y?: readonly number[];
  /**
   * Where the prediction holds: across the gap for every column (absent, the 1D flows), or along one column or row
   * of the domain at a position (m), e.g. the cavity's centrelines.
   */
  readonly line?: { readonly kind: 'column' | 'row'; readonly atM: number };
}

export interface VerdictView {
  readonly text: string;
  readonly reasons: readonly string[];
}

export interface ResultExtensions {
  readonly flow: readonly FlowEstimate[];
  readonly flowContext: string | null;
  readonly continuum: readonly ContinuumCurve[];
  readonly verdict: VerdictView | null;
}

type Loose = Record<string, unknown>;
const isObject = (v: unknown): v is Loose => typeof v === 'object' && v !== null;
const isNumberList = (v: unknown): v is ArrayLike<number> =>
  (Array.isArray(v) || ArrayBuffer.isView(v)) &&
  Array.from(v as ArrayLike<unknown>).every((x) => typeof x === 'number');

const FLOW_LABELS: Readonly<Record<string, string>> = {
  massFlowRate: 'mass flow rate',
  throughput: 'throughput',
  molarFlow: 'molar flow',
  conductance: 'conductance',
  transmissionProbability: 'transmission probability',
  reducedFlowRate: 'reduced flow rate G_P',
};

/**
 * Flow numbers: the engine's FlowResult (`values` by name, units from `units`), or any record of estimates.
 */
function flowOf(v: unknown, units: Readonly<Record<string, string>>): FlowEstimate[] {
  if (!isObject(v)) return [];
  const source = isObject(v.values) ? v.values : v;
  const out: FlowEstimate[] = [];
  for (const [name, e] of Object.entries(source)) {
    if (isObject(e) && typeof e.mean === 'number' && typeof e.ci95 === 'number') {
      out.push({
        name,
        label: typeof e.label === 'string' ? e.label : (FLOW_LABELS[name] ?? name),
        mean: e.mean,
        ci95: e.ci95,
        unit: typeof e.unit === 'string' ? e.unit : (units[name] ?? ''),
      });
    }
  }
  return out;
}

function continuumOf(v: unknown): ContinuumCurve[] {
  if (!isObject(v)) return [];
  const out: ContinuumCurve[] = [];
  for (const [model, c] of Object.entries(v)) {
    if (!isObject(c)) continue;
    const label = typeof c.label === 'string' ? c.label : model;
    if (typeof c.quantity === 'string' && isNumberList(c.values)) {
      out.push({
        model: label,
        quantity: c.quantity,
        values: Array.from(c.values),
        y: isNumberList(c.y) ? Array.from(c.y) : undefined,
      });
      continue;
    }
    for (const [quantity, values] of Object.entries(c))
      if (isNumberList(values)) out.push({ model: label, quantity, values: Array.from(values) });
  }
  return out;
}

function verdictOf(v: unknown): VerdictView | null {
  if (typeof v === 'string') return { text: v, reasons: [] };
  if (!isObject(v)) return null;
  const text = [v.text, v.summary, v.message].find((t): t is string => typeof t === 'string');
  if (!text) return null;
  const reasons = Array.isArray(v.reasons) ? v.reasons.filter((r): r is string => typeof r === 'string') : [];
  return { text, reasons };
}

/** Where the flow numbers refer to (section, vessel pressures), when the engine says. */
function flowContextOf(v: unknown): string | null {
  if (!isObject(v)) return null;
  const parts: string[] = [];
  if (typeof v.section === 'string') parts.push(`through section ${v.section}`);
  if (typeof v.upstreamPressurePa === 'number' && Number.isFinite(v.upstreamPressurePa))
    parts.push(`upstream ${v.upstreamPressurePa.toPrecision(4)} Pa`);
  if (typeof v.downstreamPressurePa === 'number' && Number.isFinite(v.downstreamPressurePa))
    parts.push(`downstream ${v.downstreamPressurePa.toPrecision(4)} Pa`);
  if (typeof v.temperatureK === 'number' && Number.isFinite(v.temperatureK))
    parts.push(`${v.temperatureK.toPrecision(4)} K`);
  return parts.length ? parts.join(', ') : null;
}

/** flowUnits: unit of each flow number by name (the engine's table for this result), if known. */
export function extensionsOf(
  result: SimulationResult,
  flowUnits: Readonly<Record<string, string>> = {},
): ResultExtensions {
  const r = result as unknown as Loose;
  return {
    flow: flowOf(r.flow, flowUnits),
    flowContext: flowContextOf(r.flow),
    continuum: continuumOf(r.continuum),
    verdict: verdictOf(r.verdict),
  };
}
