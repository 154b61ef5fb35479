/**
 * plan(): turns a validated case into the numbers the kernels need — reference state, grid, time step, particle
 * weight, sampling schedule — and the numerics advisor's ratios and warnings. Pure and cheap, so a form can call it
 * on every keystroke. Every number it derives is guarded (planGuards.ts): a case whose numbers no simulation can use
 * is refused here with the field to change, never left to crash or hang the kernels.
 */
import type { Case, BoundarySpec } from '../case/schema';
import type { SideName } from '../case/caseConstants';
import { parseCase } from '../case/schema';
import {
  cellGeometryOf,
  gasVolumeOfBoxM3,
  boxVolumeM3,
  type BlockRectangle,
  type CellGeometry,
} from '../geometry/cellGeometry';
import { surfacesOf, type SurfacePlan } from '../geometry/surfaces';
import { BOLTZMANN_J_PER_K as K_B } from '../physics/constants';
import { mostProbableSpeedMPerS } from '../gas/molecularModel';
import { gasModelOf, referenceStateOf, type GasPlan, type ReferenceState } from './referenceState';
import { densestState, fastestFlowSpeed, hottestTemperature, highestNumberDensityPerM3 } from './caseExtremes';
import { MAX_CELLS, MAX_STEP_RATIO, MIN_STEP_RATIO, gigabytes, nonFiniteErrors } from './planGuards';

export { gasModelOf, referenceStateOf, type GasPlan, type ReferenceState };

export interface GridPlan {
  readonly cellsX: number;
  readonly cellsY: number;
  readonly lengthXM: number;
  readonly lengthYM: number;
  readonly cellSizeXM: number;
  readonly cellSizeYM: number;
  /**
   * Volume of a whole cell of particle weight 1 (m³): planar cells have unit depth (m³ per metre of depth);
   * axisymmetric, the ring of the row next to the axis. Per-cell gas volumes and weights are in `cells`.
   */
  readonly cellVolumeM3: number;
  readonly subcellsPerCellSide: number;
  readonly axisymmetric: boolean;
  readonly cells: CellGeometry;
  readonly blocks: readonly BlockRectangle[];
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
  /** Sides then block faces, in side-table row order (geometry/surfaces.ts). */
  readonly surfaces: readonly SurfacePlan[];
  /** Uniform body acceleration along x, m/s². */
  readonly bodyAccelerationXMPerS2: number;
  /** Along z, out of the plane: a duct's cross-section driven along the duct (0 unless the case sets it). */
  readonly bodyAccelerationZMPerS2: number;
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

/** A direction is resolved unless it has one cell between periodic ends (then it is homogeneous, e.g. 1D Couette). */
function resolved(cells: number, a: BoundarySpec, b: BoundarySpec): boolean {
  return cells > 1 || a.type !== 'periodic' || b.type !== 'periodic';
}

/** What the planner may use beyond the case: the memory the machine has (bytes), when the caller knows it. */
export interface PlanOptions {
  readonly memoryBudgetBytes?: number;
}

/** Bytes per cell of the sampling arrays: raw cell sums, double-buffered field batches (see memoryBytesEstimate). */
const BYTES_PER_CELL = RAW_CELL_SUMS * 8 * (FIELD_BATCH_CAPACITY + 3);

/**
 * The base batch length and the sampled steps, whole batches only, for a requested number of sampling steps. At
 * least 10 steps per base batch: closing a batch touches every cell, and consecutive steps are strongly correlated
 * anyway, so finer batches add cost but no information to the blocking analysis. Whole batches, so every sampled
 * step reaches the integral-quantity series.
 */
export function batchesOf(requestedSampleSteps: number): { batchSteps: number; sampleSteps: number } {
  const batchSteps = Math.max(10, Math.ceil(requestedSampleSteps / 8192));
  return { batchSteps, sampleSteps: Math.ceil(requestedSampleSteps / batchSteps) * batchSteps };
}

/** Sampling steps that plan to themselves (a fixed point of batchesOf), at least `requested`. */
export function stableSampleSteps(requested: number): number {
  let steps = Math.ceil(requested);
  for (let next = batchesOf(steps).sampleSteps; next !== steps; next = batchesOf(steps).sampleSteps) steps = next;
  return steps;
}

export function plan(c: Case, options: PlanOptions = {}): PlanResult {
  const errors: string[] = [];
  const warnings: string[] = [];
  let gas: GasPlan;
  try {
    gas = gasModelOf(c);
  } catch (e) {
    return { ok: false, errors: [`gas: ${(e as Error).message}`] };
  }
  const ref = referenceStateOf(c, gas.model);
  const dense = densestState(c);
  const denseRef = referenceStateOf({ ...c, initial: { ...c.initial, ...dense } }, gas.model);
  const { lengthXM: lx, lengthYM: ly } = c.domain;
  const b = c.boundaries;
  const axisymmetric = c.domain.geometry === 'axisymmetric';
  const stateErrors = nonFiniteErrors([
    { value: ref.numberDensityPerM3, what: 'number density', field: 'initial.pressurePa' },
    { value: ref.viscosityPaS, what: 'viscosity', field: 'initial.temperatureK' },
    { value: ref.mostProbableSpeedMPerS, what: 'most probable speed', field: 'initial.temperatureK' },
    { value: ref.meanFreePathM, what: 'mean free path', field: 'initial.pressurePa' },
    { value: ref.meanCollisionTimeS, what: 'mean collision time', field: 'initial.pressurePa' },
    { value: denseRef.meanFreePathM, what: 'mean free path at the densest state', field: 'boundaries' },
    { value: denseRef.meanCollisionTimeS, what: 'mean collision time at the densest state', field: 'boundaries' },
    { value: boxVolumeM3(0, lx, 0, ly, axisymmetric), what: 'box volume', field: 'domain.lengthYM' },
  ]);
  if (stateErrors.length) return { ok: false, errors: stateErrors };

  // Cells: at most λ/3 (at the densest state held) and at least 20 across the larger side, unless the user chose
  // (common practice, Bird 1994).
  const autoCell = Math.min(denseRef.meanFreePathM / 3, Math.max(lx, ly) / 20);
  const cellsX = c.numerics.cellsX ?? Math.max(1, Math.ceil(lx / autoCell - 1e-9));
  const cellsY = c.numerics.cellsY ?? Math.max(1, Math.ceil(ly / autoCell - 1e-9));
  // Where the planner sized the cells, the cause of a grid too large is the domain against the mean free path (the
  // Knudsen number or a length the user typed), so the message names that field, not the particles per cell.
  const autoSized = c.numerics.cellsX === undefined || c.numerics.cellsY === undefined;
  const domainCause =
    `${lx >= ly ? 'domain.lengthXM' : 'domain.lengthYM'}: a domain of ${lx.toPrecision(3)} m × ${ly.toPrecision(3)} m ` +
    `in cells of λ/3 (mean free path ${denseRef.meanFreePathM.toPrecision(3)} m, Knudsen number ${ref.knudsen.toPrecision(3)}) needs ${cellsX} × ${cellsY} cells`;
  // A grid the user set is the user's choice: then the cells themselves, or the particles per cell, are the cause.
  const cellsCause = autoSized ? domainCause : `numerics.cellsX/cellsY: ${cellsX} × ${cellsY} cells`;
  const gridCause = autoSized ? domainCause : `numerics.particlesPerCell: ${cellsX} × ${cellsY} cells`;
  const gridFix =
    'shorten the domain, lower the pressure (raise the Knudsen number), use fewer particles per cell, or raise numerics.maxParticles if the machine has the memory';
  // Refuse a grid too large to build before building it cell by cell (millions of cells take seconds).
  if (!(cellsX * cellsY <= MAX_CELLS)) {
    const why =
      c.numerics.cellsX !== undefined && c.numerics.cellsY !== undefined
        ? 'set numerics.cellsX/cellsY lower'
        : `the mean free path (${denseRef.meanFreePathM.toPrecision(3)} m${dense === c.initial ? '' : ' at the densest reservoir'}) sets cells of λ/3: lower the pressure (raise the Knudsen number), shorten the domain, or set numerics.cellsX/cellsY`;
    return {
      ok: false,
      errors: [`${cellsCause}, more than the limit of ${MAX_CELLS} cells; ${why}`],
    };
  }
  const dx = lx / cellsX;
  const dy = ly / cellsY;
  const resolvedSizes: number[] = [];
  if (resolved(cellsX, b.left, b.right)) resolvedSizes.push(dx);
  if (resolved(cellsY, b.bottom, b.top)) resolvedSizes.push(dy);
  const largestCell = resolvedSizes.length ? Math.max(...resolvedSizes) : Math.max(dx, dy);
  const blocks: BlockRectangle[] = c.blocks.map((k) => ({ x0: k.xMinM, x1: k.xMaxM, y0: k.yMinM, y1: k.yMaxM }));
  // Refuse a grid far beyond the particle budget or the memory before building it.
  const gasShare = gasVolumeOfBoxM3(0, lx, 0, ly, blocks, axisymmetric) / boxVolumeM3(0, lx, 0, ly, axisymmetric);
  const roughParticles = cellsX * cellsY * (c.numerics.particlesPerCell ?? 30) * gasShare;
  if (roughParticles > 2 * c.numerics.maxParticles) {
    return {
      ok: false,
      errors: [
        `${gridCause}; at about ${c.numerics.particlesPerCell ?? 30} particles per cell that is about ${Math.round(roughParticles)} particles, ` +
          `far more than numerics.maxParticles (${c.numerics.maxParticles}): ${gridFix}`,
      ],
    };
  }
  const budget = options.memoryBudgetBytes;
  const cellBytes = cellsX * cellsY * BYTES_PER_CELL;
  if (budget !== undefined && cellBytes > budget)
    return {
      ok: false,
      errors: [
        `numerics.cellsX/cellsY: ${cellsX} × ${cellsY} cells need about ${gigabytes(cellBytes)} for their samples alone, more than this machine's memory (${gigabytes(budget)}); use fewer or larger cells`,
      ],
    };
  const cellGeometry = cellGeometryOf(cellsX, cellsY, lx, ly, blocks, axisymmetric);
  const surfaces = surfacesOf(c, dx, dy);
  const smallestCell = resolvedSizes.length ? Math.min(...resolvedSizes) : Math.min(dx, dy);

  const vHot = mostProbableSpeedMPerS(gas.model.massKg, hottestTemperature(c));
  const transitSpeed = vHot + fastestFlowSpeed(c);
  const transitTime = smallestCell / transitSpeed;
  const advisorStepS = Math.min(denseRef.meanCollisionTimeS, transitTime);
  const timeStepS = c.numerics.timeStepS ?? 0.25 * advisorStepS;
  if (c.numerics.timeStepS !== undefined && timeStepS > MAX_STEP_RATIO * advisorStepS)
    errors.push(
      `numerics.timeStepS: ${timeStepS} s is more than ${MAX_STEP_RATIO} × the shorter of the mean collision time and the cell transit time (${advisorStepS.toPrecision(3)} s); the advisor wants at most 1/4 of it, ${(0.25 * advisorStepS).toPrecision(3)} s`,
    );
  if (c.numerics.timeStepS !== undefined && timeStepS < MIN_STEP_RATIO * advisorStepS)
    errors.push(
      `numerics.timeStepS: ${timeStepS} s is below ${MIN_STEP_RATIO} × the shorter of the mean collision time and the cell transit time (${advisorStepS.toPrecision(3)} s): molecules would hardly move; leave timeStepS out for the advisor's ${(0.25 * advisorStepS).toPrecision(3)} s`,
    );

  const cells = cellsX * cellsY;
  const requestedParticlesPerCell = c.numerics.particlesPerCell ?? 30;
  // The densest state the gas can reach (a reservoir or outlet may be far denser than the initial fill): with the
  // initial weight the domain could fill to this many particles. When that passes numerics.maxParticles the weight
  // is raised so it fits, and the initial fill gets fewer particles per cell.
  const highest = highestNumberDensityPerM3(c, K_B);
  const reachableAtInitialWeight =
    requestedParticlesPerCell *
    cellGeometry.gasCellEquivalent *
    Math.max(1, highest.numberDensityPerM3 / ref.numberDensityPerM3);
  // Only the growth beyond the fill is absorbed so: a fill that alone passes maxParticles is refused below, as before.
  const fillsWithinBudget = requestedParticlesPerCell * cellGeometry.gasCellEquivalent <= c.numerics.maxParticles;
  const weightScale = fillsWithinBudget ? Math.max(1, reachableAtInitialWeight / c.numerics.maxParticles) : 1;
  const particlesPerCell = weightScale > 1 ? requestedParticlesPerCell / weightScale : requestedParticlesPerCell;
  if (weightScale > 1)
    warnings.push(
      `${highest.where} holds gas ${(highest.numberDensityPerM3 / ref.numberDensityPerM3).toPrecision(3)} times denser than the initial fill: particles are weighted so that the densest state fits numerics.maxParticles, and the initial fill gets ${particlesPerCell.toPrecision(3)} particles per cell instead of ${requestedParticlesPerCell}`,
    );
  const reachableParticles = Math.min(c.numerics.maxParticles, reachableAtInitialWeight);
  // particlesPerCell refers to a whole cell of weight 1 at the initial state; cells cut by blocks hold fewer.
  const initialParticles = Math.round(particlesPerCell * cellGeometry.gasCellEquivalent);
  const moleculesPerParticle = (ref.numberDensityPerM3 * cellGeometry.referenceVolumeM3) / particlesPerCell;
  if (cellGeometry.gasCellEquivalent <= 0) errors.push('blocks: the blocks fill the whole domain; leave room for gas');

  if (initialParticles > c.numerics.maxParticles) {
    errors.push(
      `${gridCause}; × ${particlesPerCell} particles per cell that is ${initialParticles} particles, ` +
        `more than numerics.maxParticles (${c.numerics.maxParticles}): ${gridFix}`,
    );
  }
  if (initialParticles < 2)
    errors.push(
      weightScale > 1
        ? `initial.pressurePa: the initial fill is ${(highest.numberDensityPerM3 / ref.numberDensityPerM3).toPrecision(3)} times less dense than ${highest.where}; with particles weighted so that the densest state fits numerics.maxParticles (${c.numerics.maxParticles}), it would hold ${initialParticles} particles (at least 2 are needed): start the gas nearer the reservoirs' state`
        : 'numerics.particlesPerCell: the domain must hold at least 2 simulated particles',
    );
  errors.push(
    ...nonFiniteErrors([
      { value: cellGeometry.referenceVolumeM3, what: 'cell volume', field: 'domain.lengthYM' },
      { value: moleculesPerParticle, what: 'number of molecules per simulated particle', field: 'domain.lengthXM' },
      { value: timeStepS, what: 'time step', field: 'numerics.timeStepS' },
    ]),
  );

  // Transient: ballistic crossings and viscous diffusion across the domain; ~7 e-folds of the slowest shear mode
  // (time constant L²ρ/(π²μ)) — common practice, no source. A user can set it, and the parallel-runs work detects it.
  const length = Math.max(lx, ly);
  // A body force keeps accelerating molecules between collisions: the slowest part of the distribution (grazing
  // molecules) settles over a few collision times, which near free-molecular flow is far longer than the crossings.
  const forcedRelaxTime =
    c.bodyAccelerationXMPerS2 !== 0 || (c.bodyAccelerationZMPerS2 ?? 0) !== 0 ? 5 * ref.meanCollisionTimeS : 0;
  const relaxTime = Math.max(
    (10 * length) / ref.mostProbableSpeedMPerS,
    (0.7 * length * length * ref.massDensityKgPerM3) / ref.viscosityPaS,
    forcedRelaxTime,
  );
  const transientSteps = c.sampling.transientSteps ?? Math.ceil(relaxTime / timeStepS);
  const requestedSampleSteps = c.sampling.sampleSteps ?? Math.max(2000, 4 * transientSteps);
  const { batchSteps, sampleSteps } = batchesOf(requestedSampleSteps);
  const wallBins = { left: surfaces[0].bins, right: surfaces[1].bins, bottom: surfaces[2].bins, top: surfaces[3].bins };

  const ratios: AdvisorRatios = {
    cellSizeOverMeanFreePath: largestCell / ref.meanFreePathM,
    timeStepOverCollisionTime: timeStepS / ref.meanCollisionTimeS,
    timeStepOverCellTransitTime: timeStepS / transitTime,
    particlesPerCell,
  };
  const denseCellRatio = largestCell / denseRef.meanFreePathM;
  const denseStepRatio = timeStepS / denseRef.meanCollisionTimeS;
  if (Math.max(ratios.cellSizeOverMeanFreePath, denseCellRatio) > 1 / 3 + 1e-9)
    warnings.push(
      `cell size is ${Math.max(ratios.cellSizeOverMeanFreePath, denseCellRatio).toFixed(2)} mean free paths${denseCellRatio > ratios.cellSizeOverMeanFreePath ? ' (at the densest reservoir)' : ''}; keep it below about 1/3 (set numerics.cellsX/cellsY higher)`,
    );
  if (Math.max(ratios.timeStepOverCollisionTime, denseStepRatio) > 0.25 + 1e-9)
    warnings.push(
      `time step is ${Math.max(ratios.timeStepOverCollisionTime, denseStepRatio).toFixed(2)} mean collision times${denseStepRatio > ratios.timeStepOverCollisionTime ? ' (at the densest reservoir)' : ''}; keep it below about 1/4 (lower numerics.timeStepS)`,
    );
  if (ratios.timeStepOverCellTransitTime > 0.25 + 1e-9)
    warnings.push(
      `time step is ${ratios.timeStepOverCellTransitTime.toFixed(2)} cell transit times; keep it below about 1/4 (lower numerics.timeStepS)`,
    );
  if (particlesPerCell < 20)
    warnings.push(`${particlesPerCell} particles per cell; at least about 20 are advised (numerics.particlesPerCell)`);

  const wallBinTotal = surfaces.reduce((s, f) => s + f.bins, 0);
  // Sized from the largest state the case can reach (every reservoir and outlet filling the domain), not the fill.
  const memoryBytesEstimate =
    Math.max(initialParticles, reachableParticles) * 1.25 * BYTES_PER_PARTICLE +
    cells * RAW_CELL_SUMS * 8 * (FIELD_BATCH_CAPACITY + 3) +
    wallBinTotal * 5 * 8 * (FIELD_BATCH_CAPACITY + 3);

  if (budget !== undefined && memoryBytesEstimate > budget)
    errors.push(
      `numerics.maxParticles: the case needs about ${gigabytes(memoryBytesEstimate)} (${Math.round(Math.max(initialParticles, reachableParticles))} particles at its densest state, ${cells} cells), more than this machine's memory (${gigabytes(budget)}); lower numerics.maxParticles or particlesPerCell, or use fewer cells`,
    );
  errors.push(
    ...nonFiniteErrors([
      { value: transientSteps + 1, what: 'number of transient steps', field: 'numerics.timeStepS' },
      { value: sampleSteps, what: 'number of sampling steps', field: 'numerics.timeStepS' },
      { value: memoryBytesEstimate, what: 'memory estimate', field: 'numerics' },
    ]),
  );
  if (errors.length) return { ok: false, errors };
  return {
    ok: true,
    plan: {
      caseData: c,
      gas,
      reference: ref,
      grid: {
        cellsX,
        cellsY,
        lengthXM: lx,
        lengthYM: ly,
        cellSizeXM: dx,
        cellSizeYM: dy,
        cellVolumeM3: cellGeometry.referenceVolumeM3,
        subcellsPerCellSide: c.numerics.subcellsPerCellSide,
        axisymmetric,
        cells: cellGeometry,
        blocks,
      },
      boundaries: b,
      surfaces,
      bodyAccelerationXMPerS2: c.bodyAccelerationXMPerS2,
      bodyAccelerationZMPerS2: c.bodyAccelerationZMPerS2 ?? 0,
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
export function planFromInput(input: unknown, options: PlanOptions = {}): PlanResult {
  const parsed = parseCase(input);
  return parsed.ok ? plan(parsed.value, options) : { ok: false, errors: parsed.errors };
}
