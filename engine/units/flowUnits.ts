/**
 * The units a flow number can be shown in, per flow quantity, for the results card's unit selectors and the extra
 * columns of the browser's flow CSV. A table of its own rather than more kinds in engineeringUnits.ts: the engine
 * gives molar flow in sccm (a count of molecules, not a mass), so its units are a scale of the engine's value, and
 * `sccm` must keep its one meaning (a mass flow of a named gas) in the parser's table.
 *
 * Each choice is `engineUnitsPerUnit`: how many of the engine's unit (kg/s, Pa·m³/s, sccm, m³/s) one of it is.
 * Factors come from engineeringUnits.ts (litre, torr, bar, hour: exact by definition) and the sccm reference state
 * of engine/physics/constants.ts (0 °C, 101 325 Pa; common practice — other references, e.g. 20 °C, differ by 7 %).
 * Planar cases give every flow number per metre of depth: the same factors, the unit followed by "/m".
 */
import { AVOGADRO_PER_MOL } from '../physics/constants';
import { M3_PER_LITRE, MOLECULES_PER_S_PER_SCCM, PA_PER_BAR, PA_PER_TORR, SECONDS_PER_HOUR } from './engineeringUnits';

/** The flow numbers that carry a unit (transmission probability and G_P are pure numbers). */
export const FLOW_UNIT_QUANTITIES = ['massFlowRate', 'throughput', 'molarFlow', 'conductance'] as const;
export type FlowUnitQuantity = (typeof FLOW_UNIT_QUANTITIES)[number];

export interface FlowUnitChoice {
  readonly unit: string;
  readonly engineUnitsPerUnit: number;
}

/** 1 mol/s in sccm: Avogadro's number of molecules per second over those of one sccm. */
export const SCCM_PER_MOL_PER_S = AVOGADRO_PER_MOL / MOLECULES_PER_S_PER_SCCM;

/** The engine's unit first (what summary.json and the command line's flow.csv give). */
export const FLOW_UNIT_CHOICES: Readonly<Record<FlowUnitQuantity, readonly FlowUnitChoice[]>> = {
  throughput: [
    { unit: 'Pa·m³/s', engineUnitsPerUnit: 1 },
    { unit: 'mbar·L/s', engineUnitsPerUnit: PA_PER_BAR * 1e-3 * M3_PER_LITRE },
    { unit: 'Torr·L/s', engineUnitsPerUnit: PA_PER_TORR * M3_PER_LITRE },
    { unit: 'Pa·L/s', engineUnitsPerUnit: M3_PER_LITRE },
  ],
  // Pumping speed has the conductance's unit: a speed shown anywhere takes these choices too.
  conductance: [
    { unit: 'm³/s', engineUnitsPerUnit: 1 },
    { unit: 'L/s', engineUnitsPerUnit: M3_PER_LITRE },
    { unit: 'm³/h', engineUnitsPerUnit: 1 / SECONDS_PER_HOUR },
  ],
  molarFlow: [
    { unit: 'sccm', engineUnitsPerUnit: 1 },
    { unit: 'slm', engineUnitsPerUnit: 1000 },
    { unit: 'mol/s', engineUnitsPerUnit: SCCM_PER_MOL_PER_S },
  ],
  massFlowRate: [
    { unit: 'kg/s', engineUnitsPerUnit: 1 },
    { unit: 'mg/s', engineUnitsPerUnit: 1e-6 },
    { unit: 'g/h', engineUnitsPerUnit: 1e-3 / SECONDS_PER_HOUR },
  ],
};

export function isFlowUnitQuantity(name: string): name is FlowUnitQuantity {
  return (FLOW_UNIT_QUANTITIES as readonly string[]).includes(name);
}

/** The choice named `unit` for quantity q, or undefined when q cannot be shown in it. */
export function flowUnitChoice(q: FlowUnitQuantity, unit: string): FlowUnitChoice | undefined {
  return FLOW_UNIT_CHOICES[q].find((c) => c.unit === unit);
}

/** A value in the engine's unit of q (kg/s, Pa·m³/s, sccm, m³/s; per metre when planar) in `unit`. */
export function flowValueIn(q: FlowUnitQuantity, valueInEngineUnit: number, unit: string): number {
  const c = flowUnitChoice(q, unit);
  if (!c) {
    const allowed = FLOW_UNIT_CHOICES[q].map((x) => x.unit).join(', ');
    throw new Error(`${q} cannot be shown in "${unit}"; allowed: ${allowed}`);
  }
  return valueInEngineUnit / c.engineUnitsPerUnit;
}

/** The unit as written beside a value: per metre of depth in a planar case. */
export function flowUnitLabel(unit: string, planar: boolean): string {
  return planar ? `${unit}/m` : unit;
}
