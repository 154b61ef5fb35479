/**
 * Molecules entering through reservoir sides: the segments (one per cell along the side) through which they enter
 * and how many simulated particles each lets in per time step on average. A kernel table like the side table:
 * built once from the plan by createState, its columns (INFLOW_*) in kernel/layout.ts.
 *
 * The one-way number flux of a Maxwellian gas of density n, most probable speed v_mp = sqrt(2kT/m) and drift u_n
 * along the inward normal through a plane (Bird 1994, eq. 4.22; common kinetic theory):
 *   Γ = n v_mp / (2√π) · [exp(−s²) + √π s (1 + erf s)],  s = u_n / v_mp.
 */
import jStat from 'jstat';
import type { Plan } from '../plan/plan';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { insideBlock } from '../geometry/cellGeometry';
import { surfaceAreaM2 } from '../geometry/surfaces';

/** One-way number flux through a plane (1/(m² s)) of a Maxwellian gas, n in 1/m³, v_mp in m/s, s = u_n/v_mp. */
export function maxwellianInfluxPerM2S(numberDensity: number, mostProbableSpeed: number, s: number): number {
  return (
    ((numberDensity * mostProbableSpeed) / (2 * Math.sqrt(Math.PI))) *
    (Math.exp(-s * s) + Math.sqrt(Math.PI) * s * (1 + jStat.erf(s)))
  );
}

/**
 * The inflow table of a plan: every reservoir side and pressure outlet cut into cell-wide segments, blocked ones
 * left out. Reservoir rows carry their fixed state; pressure-outlet rows start from the initial gas and are updated
 * every step (kernel/pressureOutlet.ts).
 */
export function inflowTableOf(plan: Plan): Float64Array {
  const g = plan.grid;
  const rows: number[] = [];
  const m = plan.gas.model.massKg;
  const init = plan.caseData.initial;
  plan.surfaces.forEach((f, row) => {
    const b = f.spec;
    if (b.type !== 'reservoir' && b.type !== 'pressureOutlet') return;
    const t = b.type === 'reservoir' ? b.temperatureK : init.temperatureK;
    const drift = b.type === 'reservoir' ? b.velocityMPerS : init.velocityMPerS;
    const n = (b.type === 'reservoir' ? b.pressurePa : init.pressurePa) / (K_B * t);
    const vmp = Math.sqrt((2 * K_B * t) / m);
    const s = ((f.normalIsX ? drift[0] : drift[1]) * f.inward) / vmp;
    const flux = maxwellianInfluxPerM2S(n, vmp, s);
    const cellsAlong = f.normalIsX ? g.cellsY : g.cellsX;
    const size = f.normalIsX ? g.cellSizeYM : g.cellSizeXM;
    for (let k = 0; k < cellsAlong; k++) {
      const a = k * size;
      const c = (k + 1) * size;
      // A segment whose neighbouring strip is solid lets nothing in (block faces on an open side are walls).
      const mid = 0.5 * (a + c);
      const inside = f.planeM + f.inward * 1e-9 * size;
      if (f.normalIsX ? insideBlock(g.blocks, inside, mid) : insideBlock(g.blocks, mid, inside)) continue;
      const weight = f.normalIsX ? g.cells.rowWeights[k] : g.cells.rowWeights[f.inward > 0 ? 0 : g.cellsY - 1];
      const area = surfaceAreaM2(f.normalIsX, f.planeM, a, c, g.axisymmetric);
      const column = f.normalIsX ? (f.inward > 0 ? 0 : g.cellsX - 1) : k;
      const cellRow = f.normalIsX ? k : f.inward > 0 ? 0 : g.cellsY - 1;
      const cell = cellRow * g.cellsX + column;
      rows.push(
        row,
        a,
        c,
        (flux * area * plan.timeStepS) / (plan.moleculesPerParticle * weight),
        s,
        weight,
        t,
        drift[0],
        drift[1],
        drift[2],
        cell,
        g.cells.gasVolumesM3[cell],
        area,
      );
    }
  });
  return Float64Array.from(rows);
}
