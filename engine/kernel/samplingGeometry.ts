/**
 * SamplingGeometry: the numbers that turn sampled sums into fields and wall quantities — grid, time step, particle
 * weight, molecular mass and the side table — without particles. SimState has the same names, so a live state is a
 * SamplingGeometry as it stands, and a plan gives one without running anything (geometryOf).
 *
 * It lives in the kernel, the lowest layer that knows the side table, so that SimState can extend it and results/
 * and io/ above can read it without the kernel depending on them.
 */
import type { Plan } from '../plan/plan';
import { buildSideTable } from './sideTable';
import { SIDE_STRIDE, SIDE_BIN_COUNT } from './layout';

export interface SamplingGeometry {
  readonly cells: number;
  readonly cellsX: number;
  readonly cellsY: number;
  /** Domain size, m. */
  readonly lengthX: number;
  readonly lengthY: number;
  /** Volume of a whole cell of particle weight 1, m³ (per metre of depth when planar). */
  readonly cellVolume: number;
  /** x is the axis and y the radius; surfaces and cells are rings and cylinders. */
  readonly axisymmetric: boolean;
  /** s. */
  readonly timeStep: number;
  /** Mass of one molecule, kg. */
  readonly massKg: number;
  /** Real molecules per simulated particle (per metre of depth). */
  readonly moleculesPerParticle: number;
  readonly rotationalDof: number;
  /** SIDE_STRIDE numbers per surface (sides, then block faces); columns are the SIDE_* constants of kernel/layout.ts. */
  readonly sideTable: Float64Array;
  /** Name of each side-table row. */
  readonly surfaceNames: readonly string[];
  /** Names of the flow sections, in case order. */
  readonly sectionNames: readonly string[];
  /** Gas volume of each cell (m³, per metre of depth when planar) and its particle weight (derived from the plan). */
  readonly cellVolumes: Float64Array;
  readonly cellWeights: Float64Array;
}

/** Members that are not scalars: compared and copied on their own. */
type GeometryArrays = 'sideTable' | 'surfaceNames' | 'sectionNames' | 'cellVolumes' | 'cellWeights';

/** The scalar members of SamplingGeometry, typed over every key so a new member fails to compile until listed here. */
const GEOMETRY_SCALAR_TABLE: { readonly [K in Exclude<keyof SamplingGeometry, GeometryArrays>]: true } = {
  cells: true,
  cellsX: true,
  cellsY: true,
  lengthX: true,
  lengthY: true,
  cellVolume: true,
  timeStep: true,
  massKg: true,
  moleculesPerParticle: true,
  rotationalDof: true,
  axisymmetric: true,
};
export const GEOMETRY_SCALARS = Object.keys(GEOMETRY_SCALAR_TABLE) as (keyof typeof GEOMETRY_SCALAR_TABLE)[];

/** The sampling geometry a simulation of this plan has (the same numbers createState puts into SimState). */
export function geometryOf(plan: Plan): SamplingGeometry {
  const g = plan.grid;
  const m = plan.gas.model;
  return {
    cells: g.cellsX * g.cellsY,
    cellsX: g.cellsX,
    cellsY: g.cellsY,
    lengthX: g.lengthXM,
    lengthY: g.lengthYM,
    cellVolume: g.cellVolumeM3,
    timeStep: plan.timeStepS,
    massKg: m.massKg,
    moleculesPerParticle: plan.moleculesPerParticle,
    rotationalDof: m.rotationalDof,
    axisymmetric: g.axisymmetric,
    sideTable: buildSideTable(plan).sideTable,
    surfaceNames: plan.surfaces.map((f) => f.name),
    sectionNames: plan.caseData.flowSections.map((s) => s.name),
    cellVolumes: g.cells.gasVolumesM3,
    cellWeights: g.cells.weights,
  };
}

/** A detached copy (the side table copied), e.g. of a live SimState. */
export function copyGeometry(g: SamplingGeometry): SamplingGeometry {
  return {
    cells: g.cells,
    cellsX: g.cellsX,
    cellsY: g.cellsY,
    lengthX: g.lengthX,
    lengthY: g.lengthY,
    cellVolume: g.cellVolume,
    timeStep: g.timeStep,
    massKg: g.massKg,
    moleculesPerParticle: g.moleculesPerParticle,
    rotationalDof: g.rotationalDof,
    axisymmetric: g.axisymmetric,
    sideTable: Float64Array.from(g.sideTable),
    surfaceNames: [...g.surfaceNames],
    sectionNames: [...g.sectionNames],
    cellVolumes: Float64Array.from(g.cellVolumes),
    cellWeights: Float64Array.from(g.cellWeights),
  };
}

/** Number of wall bins over all sides, from the side table. */
export function wallBinTotalOf(g: SamplingGeometry): number {
  let total = 0;
  for (let row = 0; row < g.sideTable.length; row += SIDE_STRIDE) total += g.sideTable[row + SIDE_BIN_COUNT];
  return total;
}

/**
 * Names and values of the scalar fields that differ between two geometries (and "sideTable" if that does). The
 * per-cell arrays and names follow from the case, which callers compare on their own.
 */
export function geometryDifferences(
  a: Pick<SamplingGeometry, (typeof GEOMETRY_SCALARS)[number] | 'sideTable'>,
  b: Pick<SamplingGeometry, (typeof GEOMETRY_SCALARS)[number] | 'sideTable'>,
): string[] {
  const out: string[] = [];
  for (const key of GEOMETRY_SCALARS)
    if ((a[key] ?? false) !== (b[key] ?? false)) out.push(`${key}: ${a[key]} vs ${b[key]}`);
  if (a.sideTable.length !== b.sideTable.length || a.sideTable.some((v, k) => v !== b.sideTable[k]))
    out.push('sideTable (boundary conditions or wall bins)');
  return out;
}
