/**
 * plan(): turns a validated case into the numbers the kernels need — reference state, grid, time step, particle
 * weight, sampling schedule — and the numerics advisor's ratios and warnings. Pure and cheap, so a form can call it
 * on every keystroke.
 */
import type { Case, SideName, BoundarySpec } from './schema';
import { SIDE_NAMES, parseCase } from './schema';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import {
  type MolecularModel,
  modelFromSpecies,
  viscosityPaS,
  mostProbableSpeedMPerS,
  viscosityMeanFreePathM,
  equilibriumCollisionRatePerParticle,
} from '../gas/molecularModel';

/** Reference state reported with every result. meanFreePathM is the viscosity-based λ = (μ/p)·sqrt(πkT/(2m)). */
export interface ReferenceState {
  readonly pressurePa: number;
  readonly temperatureK: number;
  readonly numberDensityPerM3: number;
  readonly massDensityKgPerM3: number;
  readonly viscosityPaS: number;
  readonly mostProbableSpeedMPerS: number;
  readonly meanFreePathM: number;
  /** Kn = λ / lengthScaleM. */
  readonly knudsen: number;
  /** δ = p L / (μ v0) = sqrt(π) / (2 Kn). */
  readonly rarefaction: number;
  readonly lengthScaleM: number;
  readonly meanCollisionTimeS: number;
}

export interface GridPlan {
  readonly cellsX: number;
  readonly cellsY: number;
  readonly lengthXM: number;
  readonly lengthYM: number;
  readonly cellSizeXM: number;
  readonly cellSizeYM: number;
  /** Planar cells have unit depth (1 m), so volumes are m³ per metre of depth. */
  readonly cellVolumeM3: number;
  readonly subcellsPerCellSide: number;
}

export interface GasPlan {
  readonly name: string;
  readonly model: MolecularModel;
  readonly rotationalCollisionNumber: number;
}

export interface AdvisorRatios {
  /** Largest resolved cell dimension over λ; keep below about 1/3 (Bird 1994, common practice). */
  readonly cellSizeOverMeanFreePath: number;
  /** Keep below about 1/4 (common practice). */
  readonly timeStepOverCollisionTime: number;
  /** Time step over the time a molecule at v0 + flow speed needs to cross the smallest cell; keep below about 1/4. */
  readonly timeStepOverCellTransitTime: number;
  readonly particlesPerCell: number;
}

export interface Plan {
  readonly caseData: Case;
  readonly gas: GasPlan;
  readonly reference: ReferenceState;
  readonly grid: GridPlan;
  readonly boundaries: Readonly<Record<SideName, BoundarySpec>>;
  readonly timeStepS: number;
  readonly particlesPerCell: number;
  readonly moleculesPerParticle: number;
  readonly initialParticles: number;
  /**
   * 'fixed' when the case sets sampling.transientSteps; 'auto' when the run decides (engine/run/transientMonitor.ts),
   * and transientSteps is then the planner's estimate, which scales the monitor (sampled every estimate/40 steps,
   * ended at 5 estimates at the latest).
   */
  readonly transientMode: 'auto' | 'fixed';
  readonly transientSteps: number;
  readonly sampleSteps: number;
  /** Steps per base batch of the integral-quantity series (the finest level of the blocking analysis). */
  readonly batchSteps: number;
  readonly wallBins: Readonly<Record<SideName, number>>;
  readonly ratios: AdvisorRatios;
  readonly memoryBytesEstimate: number;
  readonly warnings: readonly string[];
  readonly seed: number;
}

export type PlanResult = { ok: true; plan: Plan } | { ok: false; errors: string[] };

/** Bytes per simulated particle: 6 Float64 + 2 Int32 arrays, double-buffered for reordering, plus index arrays. */
const BYTES_PER_PARTICLE = 2 * (6 * 8 + 4) + 3 * 4;
const RAW_CELL_SUMS = 15;
const FIELD_BATCH_CAPACITY = 32;

export function gasModelOf(c: Case): GasPlan {
  const g = c.gas;
  if (g.custom) {
    const hs = g.model === 'HS';
    return {
      name: g.custom.name,
      rotationalCollisionNumber: g.rotationalCollisionNumber,
      model: {
        kind: g.model,
        name: g.custom.name,
        massKg: g.custom.massKg,
        referenceDiameterM: g.custom.referenceDiameterM,
        referenceTemperatureK: g.custom.referenceTemperatureK,
        viscosityIndex: hs ? 0.5 : g.custom.viscosityIndex,
        scatteringExponent: g.model === 'VSS' ? g.custom.scatteringExponent : 1,
        rotationalDof: g.custom.rotationalDof,
      },
    };
  }
  const model = modelFromSpecies(g.species!, g.model);
  return { name: model.name, model, rotationalCollisionNumber: g.rotationalCollisionNumber };
}

export function referenceStateOf(c: Case, model: MolecularModel): ReferenceState {
  const p = c.initial.pressurePa;
  const t = c.initial.temperatureK;
  const n = p / (K_B * t);
  const mu = viscosityPaS(model, t);
  const v0 = mostProbableSpeedMPerS(model.massKg, t);
  const lambda = viscosityMeanFreePathM(mu, p, t, model.massKg);
  const length = c.domain.characteristicLengthM ?? c.domain.lengthYM;
  return {
    pressurePa: p,
    temperatureK: t,
    numberDensityPerM3: n,
    massDensityKgPerM3: n * model.massKg,
    viscosityPaS: mu,
    mostProbableSpeedMPerS: v0,
    meanFreePathM: lambda,
    knudsen: lambda / length,
    rarefaction: (p * length) / (mu * v0),
    lengthScaleM: length,
    meanCollisionTimeS: 1 / equilibriumCollisionRatePerParticle(model, n, t),
  };
}

function fastestFlowSpeed(c: Case): number {
  let u = Math.hypot(...c.initial.velocityMPerS);
  for (const side of SIDE_NAMES) {
    const b = c.boundaries[side];
    if (b.type === 'wall') u = Math.max(u, Math.hypot(...b.velocityMPerS));
  }
  return u;
}

function hottestTemperature(c: Case): number {
  let t = c.initial.temperatureK;
  for (const side of SIDE_NAMES) {
    const b = c.boundaries[side];
    if (b.type === 'wall') t = Math.max(t, b.temperatureK);
  }
  return t;
}

/** A direction is resolved unless it has one cell between periodic ends (then it is homogeneous, e.g. 1D Couette). */
function resolved(cells: number, a: BoundarySpec, b: BoundarySpec): boolean {
  return cells > 1 || a.type !== 'periodic' || b.type !== 'periodic';
}

export function plan(c: Case): PlanResult {
  const errors: string[] = [];
  const warnings: string[] = [];
  let gas: GasPlan;
  try {
    gas = gasModelOf(c);
  } catch (e) {
    return { ok: false, errors: [`gas: ${(e as Error).message}`] };
  }
  const ref = referenceStateOf(c, gas.model);
  const { lengthXM: lx, lengthYM: ly } = c.domain;
  const b = c.boundaries;

  // Cells: at most λ/3 and at least 20 across the larger side, unless the user chose (common practice, Bird 1994).
  const autoCell = Math.min(ref.meanFreePathM / 3, Math.max(lx, ly) / 20);
  const cellsX = c.numerics.cellsX ?? Math.max(1, Math.ceil(lx / autoCell - 1e-9));
  const cellsY = c.numerics.cellsY ?? Math.max(1, Math.ceil(ly / autoCell - 1e-9));
  const dx = lx / cellsX;
  const dy = ly / cellsY;
  const resolvedSizes: number[] = [];
  if (resolved(cellsX, b.left, b.right)) resolvedSizes.push(dx);
  if (resolved(cellsY, b.bottom, b.top)) resolvedSizes.push(dy);
  const largestCell = resolvedSizes.length ? Math.max(...resolvedSizes) : Math.max(dx, dy);
  const smallestCell = resolvedSizes.length ? Math.min(...resolvedSizes) : Math.min(dx, dy);

  const vHot = mostProbableSpeedMPerS(gas.model.massKg, hottestTemperature(c));
  const transitSpeed = vHot + fastestFlowSpeed(c);
  const transitTime = smallestCell / transitSpeed;
  const timeStepS = c.numerics.timeStepS ?? 0.25 * Math.min(ref.meanCollisionTimeS, transitTime);

  const cells = cellsX * cellsY;
  const particlesPerCell = c.numerics.particlesPerCell ?? 30;
  const initialParticles = Math.round(particlesPerCell * cells);
  const domainVolume = lx * ly;
  const moleculesPerParticle = (ref.numberDensityPerM3 * domainVolume) / Math.max(1, initialParticles);

  if (initialParticles > c.numerics.maxParticles) {
    errors.push(
      `numerics.particlesPerCell: ${cells} cells × ${particlesPerCell} particles per cell = ${initialParticles} particles, ` +
        `more than numerics.maxParticles (${c.numerics.maxParticles}); use fewer or larger cells, fewer particles per cell, or raise maxParticles if the machine has the memory`,
    );
  }
  if (initialParticles < 2) errors.push('numerics.particlesPerCell: the domain must hold at least 2 simulated particles');

  // Transient: ballistic crossings and viscous diffusion across the domain; ~7 e-folds of the slowest shear mode
  // (time constant L²ρ/(π²μ)) — common practice, no source. A user can set it, and the parallel-runs work detects it.
  const length = Math.max(lx, ly);
  const relaxTime = Math.max(10 * length / ref.mostProbableSpeedMPerS, (0.7 * length * length * ref.massDensityKgPerM3) / ref.viscosityPaS);
  const transientSteps = c.sampling.transientSteps ?? Math.ceil(relaxTime / timeStepS);
  const requestedSampleSteps = c.sampling.sampleSteps ?? Math.max(2000, 4 * transientSteps);
  // At least 10 steps per base batch: closing a batch touches every cell, and consecutive steps are strongly
  // correlated anyway, so finer batches add cost but no information to the blocking analysis.
  const batchSteps = Math.max(10, Math.ceil(requestedSampleSteps / 8192));
  // Whole batches only, so every sampled step reaches the integral-quantity series.
  const sampleSteps = Math.ceil(requestedSampleSteps / batchSteps) * batchSteps;
  const wallBins = {
    left: c.sampling.wallBins ?? cellsY,
    right: c.sampling.wallBins ?? cellsY,
    bottom: c.sampling.wallBins ?? cellsX,
    top: c.sampling.wallBins ?? cellsX,
  };

  const ratios: AdvisorRatios = {
    cellSizeOverMeanFreePath: largestCell / ref.meanFreePathM,
    timeStepOverCollisionTime: timeStepS / ref.meanCollisionTimeS,
    timeStepOverCellTransitTime: timeStepS / transitTime,
    particlesPerCell,
  };
  if (ratios.cellSizeOverMeanFreePath > 1 / 3 + 1e-9)
    warnings.push(`cell size is ${ratios.cellSizeOverMeanFreePath.toFixed(2)} mean free paths; keep it below about 1/3 (set numerics.cellsX/cellsY higher)`);
  if (ratios.timeStepOverCollisionTime > 0.25 + 1e-9)
    warnings.push(`time step is ${ratios.timeStepOverCollisionTime.toFixed(2)} mean collision times; keep it below about 1/4 (lower numerics.timeStepS)`);
  if (ratios.timeStepOverCellTransitTime > 0.25 + 1e-9)
    warnings.push(`time step is ${ratios.timeStepOverCellTransitTime.toFixed(2)} cell transit times; keep it below about 1/4 (lower numerics.timeStepS)`);
  if (particlesPerCell < 20) warnings.push(`${particlesPerCell} particles per cell; at least about 20 are advised (numerics.particlesPerCell)`);

  const wallBinTotal = SIDE_NAMES.reduce((s, side) => s + wallBins[side], 0);
  const memoryBytesEstimate =
    initialParticles * 1.25 * BYTES_PER_PARTICLE + cells * RAW_CELL_SUMS * 8 * (FIELD_BATCH_CAPACITY + 3) + wallBinTotal * 5 * 8 * (FIELD_BATCH_CAPACITY + 3);

  if (errors.length) return { ok: false, errors };
  return {
    ok: true,
    plan: {
      caseData: c,
      gas,
      reference: ref,
      grid: { cellsX, cellsY, lengthXM: lx, lengthYM: ly, cellSizeXM: dx, cellSizeYM: dy, cellVolumeM3: dx * dy, subcellsPerCellSide: c.numerics.subcellsPerCellSide },
      boundaries: b,
      timeStepS,
      particlesPerCell,
      moleculesPerParticle,
      initialParticles,
      transientMode: c.sampling.transientSteps === undefined ? 'auto' : 'fixed',
      transientSteps,
      sampleSteps,
      batchSteps,
      wallBins,
      ratios,
      memoryBytesEstimate,
      warnings,
      seed: c.seed,
    },
  };
}

/** Validates untrusted case JSON and plans it in one go: the errors of whichever stage refused it. */
export function planFromInput(input: unknown): PlanResult {
  const parsed = parseCase(input);
  return parsed.ok ? plan(parsed.value) : { ok: false, errors: parsed.errors };
}
