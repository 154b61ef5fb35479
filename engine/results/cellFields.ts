/**
 * Macroscopic fields from the 15 raw moment sums of a cell (or of a group of cells): the usual DSMC sampling
 * formulas (Bird 1994, §1.4 and ch. 12), with the peculiar velocity C = v − u formed from the same sums.
 */
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import {
  SUM_N,
  SUM_VX,
  SUM_VY,
  SUM_VZ,
  SUM_VXX,
  SUM_VYY,
  SUM_VZZ,
  SUM_VXY,
  SUM_VXZ,
  SUM_VYZ,
  SUM_V2VX,
  SUM_V2VY,
  SUM_EROT,
  SUM_EROT_VX,
  SUM_EROT_VY,
} from '../kernel/layout';

/** Field names with their SI unit; the order is the column order of every export. */
export const CELL_FIELDS = [
  { name: 'numberDensity', unit: '1/m^3' },
  { name: 'massDensity', unit: 'kg/m^3' },
  { name: 'velocityX', unit: 'm/s' },
  { name: 'velocityY', unit: 'm/s' },
  { name: 'velocityZ', unit: 'm/s' },
  { name: 'temperature', unit: 'K' },
  { name: 'translationalTemperature', unit: 'K' },
  { name: 'temperatureX', unit: 'K' },
  { name: 'temperatureY', unit: 'K' },
  { name: 'temperatureZ', unit: 'K' },
  { name: 'rotationalTemperature', unit: 'K' },
  { name: 'pressure', unit: 'Pa' },
  { name: 'shearStressXY', unit: 'Pa' },
  { name: 'heatFluxX', unit: 'W/m^2' },
  { name: 'heatFluxY', unit: 'W/m^2' },
] as const;
export type CellFieldName = (typeof CELL_FIELDS)[number]['name'];
export const CELL_FIELD_COUNT = CELL_FIELDS.length;

export interface CellFieldConstants {
  readonly massKg: number;
  readonly moleculesPerParticle: number;
  readonly rotationalDof: number;
}

/**
 * Writes CELL_FIELD_COUNT values into out[outOffset…] from raw sums raw[o…] accumulated over `steps` steps in a
 * volume `volumeM3`. A cell that saw no particle gives NaN (no information), never 0.
 * shearStressXY is the viscous stress τ_xy = −P_xy = −ρ⟨C_x C_y⟩; heat flux q = n ⟨(½ m C² + e_rot) C⟩.
 */
export function deriveCellFields(
  raw: Float64Array,
  o: number,
  steps: number,
  volumeM3: number,
  k: CellFieldConstants,
  out: Float64Array,
  outOffset: number,
): void {
  const n = raw[o + SUM_N];
  if (n === 0 || steps === 0) {
    for (let f = 0; f < CELL_FIELD_COUNT; f++) out[outOffset + f] = NaN;
    out[outOffset] = 0;
    out[outOffset + 1] = 0;
    return;
  }
  const m = k.massKg;
  const nd = (n / steps) * (k.moleculesPerParticle / volumeM3);
  const inv = 1 / n;
  const ux = raw[o + SUM_VX] * inv;
  const uy = raw[o + SUM_VY] * inv;
  const uz = raw[o + SUM_VZ] * inv;
  const vxx = raw[o + SUM_VXX] * inv;
  const vyy = raw[o + SUM_VYY] * inv;
  const vzz = raw[o + SUM_VZZ] * inv;
  const vxy = raw[o + SUM_VXY] * inv;
  const vxz = raw[o + SUM_VXZ] * inv;
  const vyz = raw[o + SUM_VYZ] * inv;
  const cxx = vxx - ux * ux;
  const cyy = vyy - uy * uy;
  const czz = vzz - uz * uz;
  const tx = (m * cxx) / K_B;
  const ty = (m * cyy) / K_B;
  const tz = (m * czz) / K_B;
  const ttr = (tx + ty + tz) / 3;
  const zeta = k.rotationalDof;
  const meanErot = raw[o + SUM_EROT] * inv;
  const trot = zeta > 0 ? (2 * meanErot) / (zeta * K_B) : NaN;
  const t = zeta > 0 ? (3 * ttr + zeta * trot) / (3 + zeta) : ttr;
  const u2 = ux * ux + uy * uy + uz * uz;
  const v2 = vxx + vyy + vzz;
  // ⟨|C|² C_x⟩ expanded in raw moments (⟨v⟩ = u).
  const c2cx = raw[o + SUM_V2VX] * inv - ux * v2 - 2 * (ux * vxx + uy * vxy + uz * vxz) + 2 * ux * u2;
  const c2cy = raw[o + SUM_V2VY] * inv - uy * v2 - 2 * (ux * vxy + uy * vyy + uz * vyz) + 2 * uy * u2;
  const ecx = raw[o + SUM_EROT_VX] * inv - ux * meanErot;
  const ecy = raw[o + SUM_EROT_VY] * inv - uy * meanErot;
  const rho = nd * m;
  out[outOffset] = nd;
  out[outOffset + 1] = rho;
  out[outOffset + 2] = ux;
  out[outOffset + 3] = uy;
  out[outOffset + 4] = uz;
  out[outOffset + 5] = t;
  out[outOffset + 6] = ttr;
  out[outOffset + 7] = tx;
  out[outOffset + 8] = ty;
  out[outOffset + 9] = tz;
  out[outOffset + 10] = trot;
  out[outOffset + 11] = nd * K_B * ttr;
  out[outOffset + 12] = -rho * (vxy - ux * uy);
  out[outOffset + 13] = nd * (0.5 * m * c2cx + ecx);
  out[outOffset + 14] = nd * (0.5 * m * c2cy + ecy);
}
