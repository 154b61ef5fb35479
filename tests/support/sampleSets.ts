/** Small Couette replicas as SampleSets, and a field-by-field comparison of results, for the sample-set tests. */
import { buildPreset } from '../../engine/case/presets';
import { createSimulation, advance, type Simulation } from '../../engine/run/simulation';
import type { SampleSet } from '../../engine/results/sampleSet';
import { planOrThrow } from './planOrThrow';
import { sampleSetOf } from '../../engine/run/simulationSamples';

/** Kn 0.3 planar Couette, 10 cells × 20 particles, 300 + 4000 steps (base batch 10 steps): about 0.1 s per run. */
export const SMALL_COUETTE = {
  knudsen: '0.3',
  cellsY: '10',
  particlesPerCell: '20',
  transientSteps: '300',
  sampleSteps: '4000',
} as const;

/**
 * A replica of SMALL_COUETTE with the given seed, run through its transient and `sampledSteps` sampled steps (all of
 * them by default; fewer, or a number that is not a whole number of batches, leaves sums pending).
 */
export function couetteSimulation(seed: number, sampledSteps?: number): Simulation {
  const plan = planOrThrow(buildPreset('couette', { ...SMALL_COUETTE, seed: String(seed) }));
  const sim = createSimulation(plan);
  advance(sim, plan.transientSteps + (sampledSteps ?? plan.sampleSteps));
  return sim;
}

export function couetteReplica(seed: number, sampledSteps?: number): SampleSet {
  return sampleSetOf(couetteSimulation(seed, sampledSteps));
}

/** Every number in a result (typed arrays element by element), keyed by its path; booleans and strings as text. */
export function leaves(
  value: unknown,
  path = '',
  out = new Map<string, number | string>(),
): Map<string, number | string> {
  if (typeof value === 'number') out.set(path, value);
  else if (typeof value === 'string' || typeof value === 'boolean') out.set(path, String(value));
  else if (value instanceof Float64Array) value.forEach((v, i) => out.set(`${path}[${i}]`, v));
  else if (Array.isArray(value)) value.forEach((v, i) => leaves(v, `${path}[${i}]`, out));
  else if (value && typeof value === 'object')
    for (const [k, v] of Object.entries(value)) leaves(v, path ? `${path}.${k}` : k, out);
  return out;
}

/**
 * Paths at which two results differ: numbers by more than `relative` × max(|a|, |b|) (NaN equals NaN; 0 means
 * exactly equal), text at all, or present in only one of them.
 */
export function differingLeaves(a: unknown, b: unknown, relative = 0): string[] {
  const la = leaves(a);
  const lb = leaves(b);
  const out: string[] = [];
  for (const key of new Set([...la.keys(), ...lb.keys()])) {
    const x = la.get(key);
    const y = lb.get(key);
    if (typeof x === 'number' && typeof y === 'number') {
      if (Object.is(x, y) || (Number.isNaN(x) && Number.isNaN(y))) continue;
      if (relative > 0 && Math.abs(x - y) <= relative * Math.max(Math.abs(x), Math.abs(y))) continue;
    } else if (x === y) continue;
    out.push(`${key}: ${x} vs ${y}`);
  }
  return out;
}
