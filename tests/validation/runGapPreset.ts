/** Runs a planar gap preset (couette or fourier) to completion with a fixed seed and returns what the tests read. */
import { buildPreset } from '../../engine/case/presets';
import type { Plan } from '../../engine/plan/plan';
import type { Simulation } from '../../engine/run/simulation';
import { runToEnd } from '../support/planOrThrow';
import type { SimulationResult, FieldTable } from '../../engine/results/summarize';
import { summarize, averageOverCells } from '../../engine/run/simulationSamples';

export interface GapRun {
  plan: Plan;
  sim: Simulation;
  result: SimulationResult;
  /** Fields averaged over every cell of the gap, with batch-means half-widths. */
  gapAverage: FieldTable;
}

/** Rarefaction parameter δ = pH/(μ v0) → Knudsen number Kn = λ/H = sqrt(π)/(2δ) (REFERENCES notation). */
export const knudsenOf = (delta: number) => Math.sqrt(Math.PI) / (2 * delta);

export function runGapPreset(name: 'couette' | 'fourier', overrides: Record<string, string>): GapRun {
  const sim = runToEnd(buildPreset(name, overrides));
  const all = Array.from({ length: sim.state.cells }, (_, c) => c);
  return { plan: sim.plan, sim, result: summarize(sim), gapAverage: averageOverCells(sim, all) };
}

export function field(table: FieldTable, name: string, row = 0): { mean: number; ci95: number } {
  const k = table.names.indexOf(name);
  if (k < 0) throw new Error(`no field ${name}`);
  const f = table.names.length;
  return { mean: table.mean[row * f + k], ci95: table.ci95[row * f + k] };
}
