/**
 * Automatic end of the transient: whole-domain sums watched every few steps until none of them drifts beyond its
 * noise (engine/stats/steadyState.ts). The sums are cheap, O(N) every `every` steps, and see what the engine's
 * outputs see: particle count (inflow/outflow balance), total energy (heating, wall heat exchange), x-momentum
 * (driven flows), and the domain integrals of the shear moment Σ m v_x v_y and of the energy flux Σ (½ m v² + e) v_y,
 * which carry the wall shear stress and heat flux of planar flows.
 */
import type { SimState } from '../kernel/state';
import { createSteadyStateDetector, type SteadyStateDetector } from '../stats/steadyState';

export interface TransientMonitor {
  readonly detector: SteadyStateDetector;
  /** Steps between samples. */
  readonly every: number;
  /** Every sample pushed so far, so a checkpoint can rebuild the detector exactly. */
  readonly history: number[][];
}

export const MONITOR_NAMES = ['particles', 'energy', 'momentumX', 'shearMoment', 'energyFluxY'] as const;

/** Samples: every estimate/40 steps; window of 20 samples (half the estimate); at most 200 samples (5 estimates). */
export function createTransientMonitor(estimatedTransientSteps: number): TransientMonitor {
  const every = Math.max(1, Math.ceil(estimatedTransientSteps / 40));
  return {
    every,
    history: [],
    detector: createSteadyStateDetector({ windowSamples: 20, batches: 10, minSamples: 20, maxSamples: 200 }),
  };
}

/** The monitored sums of the current particles (J, kg·m/s, kg·m²/s², W·m). */
export function monitorValues(st: SimState): number[] {
  const m = st.massKg;
  const n = st.count;
  const vx = st.vx;
  const vy = st.vy;
  const vz = st.vz;
  const e = st.erot;
  let energy = 0;
  let px = 0;
  let shear = 0;
  let flux = 0;
  for (let i = 0; i < n; i++) {
    const u = vx[i];
    const v = vy[i];
    const w = vz[i];
    const particleEnergy = 0.5 * m * (u * u + v * v + w * w) + e[i];
    energy += particleEnergy;
    px += u;
    shear += u * v;
    flux += particleEnergy * v;
  }
  return [n, energy, m * px, m * shear, flux];
}

/** Pushes one sample; true once the detector has declared the transient over. */
export function pushMonitor(monitor: TransientMonitor, values: number[]): boolean {
  monitor.history.push(values);
  const record: Record<string, number> = {};
  MONITOR_NAMES.forEach((name, k) => (record[name] = values[k]));
  monitor.detector.push(record);
  return monitor.detector.state().steady;
}

/** A monitor rebuilt from a saved history (checkpoints): same decisions as the original. */
export function replayTransientMonitor(
  estimatedTransientSteps: number,
  history: readonly number[][],
): TransientMonitor {
  const monitor = createTransientMonitor(estimatedTransientSteps);
  for (const values of history) pushMonitor(monitor, values);
  return monitor;
}
