/**
 * Fields the engine does not sample directly but engineers read off a flow map: the speed |u| and the Mach number,
 * formed per row of a FieldTable (a cell, or a row average) from the means of its velocity components and
 * temperature.
 *
 *   |u| = sqrt(u_x² + u_y² + u_z²)
 *   M   = |u| / a,  a = sqrt(γ k T / m)
 *
 * γ and m are not in the result's ReferenceState (it holds pressure, temperature, densities, viscosity, v0, λ, Kn, δ
 * and the length scale), so they come with the case's gas (ResultGeometry.gas: m of the species, γ = (5 + ζ)/(3 + ζ)).
 * T is the overall temperature (translation and rotation), the one the speed of sound of an equilibrium gas uses.
 *
 * Half-widths by first-order error propagation, treating the components (and |u| and T) as independent:
 *   δ|u| = sqrt(Σ (u_i/|u|)² δu_i²);  at |u| = 0, where the derivative is undefined, the bound sqrt(Σ δu_i²)
 *   (|u| is 1-Lipschitz in u).
 *   δM   = sqrt((δ|u| / a)² + (M δT / (2T))²).
 * Neighbouring components of one cell are in fact correlated, and |u| of noisy means is biased upwards where the
 * flow is slow compared with its noise; the bars are an estimate, not a bound.
 */
import type { FieldTable } from '../../engine/results/summarize';
import type { GasConstants } from './resultGeometry';

/** Boltzmann constant, J/K (exact, SI 2019); the engine's own copy is not importable from the main chunk. */
const K_B = 1.380649e-23;

export const SPEED_FIELD = { name: 'speed', unit: 'm/s' } as const;
export const MACH_FIELD = { name: 'machNumber', unit: '1' } as const;

export interface Propagated {
  readonly mean: number;
  readonly ci95: number;
}

export function speedOf(u: readonly number[], ci: readonly number[]): Propagated {
  const m2 = u.reduce((s, x) => s + x * x, 0);
  const mean = Math.sqrt(m2);
  const bound = Math.sqrt(ci.reduce((s, x) => s + x * x, 0));
  if (mean === 0) return { mean, ci95: bound };
  const ci95 = Math.sqrt(u.reduce((s, x, i) => s + ((x / mean) * ci[i]) ** 2, 0));
  return { mean, ci95 };
}

export function machOf(
  speed: Propagated,
  temperatureK: number,
  temperatureCi95: number,
  gas: GasConstants,
): Propagated {
  const a = Math.sqrt((gas.heatCapacityRatio * K_B * temperatureK) / gas.massKg);
  const mean = speed.mean / a;
  const ci95 = Math.sqrt((speed.ci95 / a) ** 2 + ((mean * temperatureCi95) / (2 * temperatureK)) ** 2);
  return { mean, ci95 };
}

/**
 * The table with `speed` (and `machNumber` when the gas is known) appended as columns, unless it has them already.
 * Rows without a velocity (no gas, no samples) stay NaN.
 */
export function withDerivedFields(t: FieldTable, gas: GasConstants | null): FieldTable {
  const k = (n: string) => t.names.indexOf(n);
  const ux = k('velocityX');
  const uy = k('velocityY');
  const uz = k('velocityZ');
  const temp = k('temperature');
  const addSpeed = k(SPEED_FIELD.name) < 0 && ux >= 0 && uy >= 0;
  const addMach = k(MACH_FIELD.name) < 0 && gas !== null && ux >= 0 && uy >= 0 && temp >= 0;
  if (!addSpeed && !addMach) return t;
  const w = t.names.length;
  const extra = (addSpeed ? 1 : 0) + (addMach ? 1 : 0);
  const width = w + extra;
  const mean = new Float64Array(t.rows * width);
  const ci95 = new Float64Array(t.rows * width);
  for (let r = 0; r < t.rows; r++) {
    mean.set(t.mean.subarray(r * w, r * w + w), r * width);
    ci95.set(t.ci95.subarray(r * w, r * w + w), r * width);
    const comps = [ux, uy, ...(uz >= 0 ? [uz] : [])];
    const s = speedOf(
      comps.map((f) => t.mean[r * w + f]),
      comps.map((f) => t.ci95[r * w + f]),
    );
    let o = r * width + w;
    if (addSpeed) {
      mean[o] = s.mean;
      ci95[o] = s.ci95;
      o++;
    }
    if (addMach) {
      const m = machOf(s, t.mean[r * w + temp], t.ci95[r * w + temp], gas!);
      mean[o] = m.mean;
      ci95[o] = m.ci95;
    }
  }
  return {
    ...t,
    names: [...t.names, ...(addSpeed ? [SPEED_FIELD.name] : []), ...(addMach ? [MACH_FIELD.name] : [])],
    units: [...t.units, ...(addSpeed ? [SPEED_FIELD.unit] : []), ...(addMach ? [MACH_FIELD.unit] : [])],
    mean,
    ci95,
  };
}
