/**
 * plan(): turns a validated case into the numbers the kernels need — reference state, grid, time step, particle
 * weight, sampling schedule — and the numerics advisor's ratios and warnings. Pure and cheap, so a form can call it
 * on every keystroke.
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
import { mostProbableSpeedMPerS } from '../gas/molecularModel';
import { gasModelOf, referenceStateOf, type GasPlan, type ReferenceState } from './referenceState';
import { densestState, fastestFlowSpeed, hottestTemperature } from './caseExtremes';

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
  const dense = densestState(c);
  const denseRef = referenceStateOf({ ...c, initial: { ...c.initial, ...dense } }, gas.model);
  const { lengthXM: lx, lengthYM: ly } = c.domain;
  const b = c.boundaries;
  const axisymmetric = c.domain.geometry === 'axisymmetric';

  // Cells: at most λ/3 (at the densest state held) and at least 20 across the larger side, unless the user chose
  // (common practice, Bird 1994).
  const autoCell = Math.min(denseRef.meanFreePathM / 3, Math.max(lx, ly) / 20);
  const cellsX = c.numerics.cellsX ?? Math.max(1, Math.ceil(lx / autoCell - 1e-9));
  const cellsY = c.numerics.cellsY ?? Math.max(1, Math.ceil(ly / autoCell - 1e-9));
  const dx = lx / cellsX;
  const dy = ly / cellsY;
  const resolvedSizes: number[] = [];
  if (resolved(cellsX, b.left, b.right)) resolvedSizes.push(dx);
  if (resolved(cellsY, b.bottom, b.top)) resolvedSizes.push(dy);
  const largestCell = resolvedSizes.length ? Math.max(...resolvedSizes) : Math.max(dx, dy);
  const blocks: BlockRectangle[] = c.blocks.map((k) => ({ x0: k.xMinM, x1: k.xMaxM, y0: k.yMinM, y1: k.yMaxM }));
  // Refuse a grid far beyond the particle budget before building it cell by cell (millions of cells take seconds).
  const gasShare = gasVolumeOfBoxM3(0, lx, 0, ly, blocks, axisymmetric) / boxVolumeM3(0, lx, 0, ly, axisymmetric);
  const roughParticles = cellsX * cellsY * (c.numerics.particlesPerCell ?? 30) * gasShare;
  if (roughParticles > 2 * c.numerics.maxParticles) {
    return {
      ok: false,
      errors: [
        `numerics.particlesPerCell: ${cellsX} × ${cellsY} cells at about ${c.numerics.particlesPerCell ?? 30} particles each need about ${Math.round(roughParticles)} particles, ` +
          `far more than numerics.maxParticles (${c.numerics.maxParticles}); use fewer or larger cells (numerics.cellsX/cellsY), fewer particles per cell, a higher Knudsen number or a smaller domain`,
      ],
    };
  }
  const cellGeometry = cellGeometryOf(cellsX, cellsY, lx, ly, blocks, axisymmetric);
  const surfaces = surfacesOf(c, dx, dy);
  const smallestCell = resolvedSizes.length ? Math.min(...resolvedSizes) : Math.min(dx, dy);

  const vHot = mostProbableSpeedMPerS(gas.model.massKg, hottestTemperature(c));
  const transitSpeed = vHot + fastestFlowSpeed(c);
  const transitTime = smallestCell / transitSpeed;
  const timeStepS = c.numerics.timeStepS ?? 0.25 * Math.min(denseRef.meanCollisionTimeS, transitTime);

  const cells = cellsX * cellsY;
  const particlesPerCell = c.numerics.particlesPerCell ?? 30;
  // particlesPerCell refers to a whole cell of weight 1 at the initial state; cells cut by blocks hold fewer.
  const initialParticles = Math.round(particlesPerCell * cellGeometry.gasCellEquivalent);
  const moleculesPerParticle = (ref.numberDensityPerM3 * cellGeometry.referenceVolumeM3) / particlesPerCell;
  if (cellGeometry.gasCellEquivalent <= 0) errors.push('blocks: the blocks fill the whole domain; leave room for gas');

  if (initialParticles > c.numerics.maxParticles) {
    errors.push(
      `numerics.particlesPerCell: ${cells} cells × ${particlesPerCell} particles per cell = ${initialParticles} particles, ` +
        `more than numerics.maxParticles (${c.numerics.maxParticles}); use fewer or larger cells, fewer particles per cell, or raise maxParticles if the machine has the memory`,
    );
  }
  if (initialParticles < 2)
    errors.push('numerics.particlesPerCell: the domain must hold at least 2 simulated particles');

  // Transient: ballistic crossings and viscous diffusion across the domain; ~7 e-folds of the slowest shear mode
  // (time constant L²ρ/(π²μ)) — common practice, no source. A user can set it, and the parallel-runs work detects it.
  const length = Math.max(lx, ly);
  // A body force keeps accelerating molecules between collisions: the slowest part of the distribution (grazing
  // molecules) settles over a few collision times, which near free-molecular flow is far longer than the crossings.
  const forcedRelaxTime = c.bodyAccelerationXMPerS2 !== 0 ? 5 * ref.meanCollisionTimeS : 0;
  const relaxTime = Math.max(
    (10 * length) / ref.mostProbableSpeedMPerS,
    (0.7 * length * length * ref.massDensityKgPerM3) / ref.viscosityPaS,
    forcedRelaxTime,
  );
  const transientSteps = c.sampling.transientSteps ?? Math.ceil(relaxTime / timeStepS);
  const requestedSampleSteps = c.sampling.sampleSteps ?? Math.max(2000, 4 * transientSteps);
  // At least 10 steps per base batch: closing a batch touches every cell, and consecutive steps are strongly
  // correlated anyway, so finer batches add cost but no information to the blocking analysis.
  const batchSteps = Math.max(10, Math.ceil(requestedSampleSteps / 8192));
  // Whole batches only, so every sampled step reaches the integral-quantity series.
  const sampleSteps = Math.ceil(requestedSampleSteps / batchSteps) * batchSteps;
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
  const memoryBytesEstimate =
    initialParticles * 1.25 * BYTES_PER_PARTICLE +
    cells * RAW_CELL_SUMS * 8 * (FIELD_BATCH_CAPACITY + 3) +
    wallBinTotal * 5 * 8 * (FIELD_BATCH_CAPACITY + 3);

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
