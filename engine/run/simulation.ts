/**
 * The engine's public surface for one replica: create a simulation from a plan, advance it, read its result.
 *
 * A step is move → boundary pass (boundary interactions and wall sampling) → index → collide → sample, Bird's usual
 * order; the cell sampling runs inside the collision pass, each cell right after its collisions (see collideParticles).
 * During the transient nothing is sampled; afterwards every step is sampled, and every `batchSteps` steps the
 * pending sums are closed into a batch: cell and wall-bin sums go to doubling batch stores, wall totals to the
 * integral-quantity series that the blocking analysis reads.
 */
import type { Plan } from '../plan/plan';
import type { SimState } from '../kernel/state';
import { wallNamesOf } from '../kernel/sideTable';
import { seriesKeysOf, sectionSeriesKey } from '../results/seriesKeys';
import { kickAlongZ, moveFreely } from '../kernel/move';
import { boundaryPass } from '../kernel/boundaryPass';
import { indexParticles, reorderParticles } from '../kernel/indexCells';
import { collideParticles } from '../kernel/collide';
import { updatePressureOutlets } from '../kernel/pressureOutlet';
import { createBatchStore, addToBatches, type DoublingBatchStore } from '../stats/doublingBatches';
import { wallTotalsOfBatch, type WallQuantityName } from '../results/wallQuantities';
import { createSeries, pushSeries, type GrowableSeries } from '../stats/series';
import { createTransientMonitor, monitorValues, pushMonitor, type TransientMonitor } from './transientMonitor';
import { RAW_CELL_SUMS, SUMS_PER_WALL_BIN } from '../kernel/layout';
import { createState } from '../kernel/createState';

/**
 * Steps between physical reorders of particle memory into cell order (performance guide, item 1). Measured on the
 * benchmark case (2 cores, Node 20): 4 was fastest at both 10^5 and 10^6 particles; 2, 6 and 8 were 2–10 % slower
 * (a reorder costs 15–20 ns per particle; the longer memory drifts from cell order, the slower collide and sample).
 */
const REORDER_INTERVAL = 4;

export type Clock = () => number;

/** Milliseconds spent per phase, when timePhases is on. */
export interface PhaseTimes {
  /** Free flight and the boundary pass: boundaries, wall sampling, sub-cell keys and counts. */
  move: number;
  /** Counting sort, and the physical reorder every REORDER_INTERVAL steps. */
  index: number;
  /** Collisions and, on sampling steps, the per-cell moment sums. */
  collide: number;
  /** Batch bookkeeping of the sampled sums. */
  sample: number;
}

export interface Simulation {
  readonly plan: Plan;
  readonly state: SimState;
  readonly cellStore: DoublingBatchStore;
  readonly wallStore: DoublingBatchStore;
  /** Integral quantities, one value per base batch, keyed as results/seriesKeys.ts says. */
  readonly series: Map<string, GrowableSeries>;
  /** Surfaces that are walls (sides, then block faces), in side-table order. */
  readonly wallNames: readonly string[];
  batchStepsDone: number;
  sampledSteps: number;
  /** First sampled step: the plan's fixed transient, or Infinity until the monitor declares steady state. */
  transientEndStep: number;
  /** Watches the transient when the case leaves its length to the run (plan.transientMode 'auto'); else null. */
  monitor: TransientMonitor | null;
  readonly phaseMs: PhaseTimes;
  readonly clock: Clock;
  timePhases: boolean;
  /**
   * Why the run stopped early, or null: set when the particle count passes numerics.maxParticles (a flood the plan
   * did not foresee). The run then ends as finished, keeping what was sampled, with this as a warning.
   */
  stopReason: string | null;
}

export interface CreateOptions {
  /** Random stream of this replica (0 for a single run). */
  stream?: number;
  /** Time source in ms for the phase breakdown (e.g. performance.now); Date.now by default. */
  clock?: Clock;
  timePhases?: boolean;
}

export function createSimulation(plan: Plan, options: CreateOptions = {}): Simulation {
  const state = createState(plan, options.stream ?? 0);
  const wallNames = wallNamesOf(plan);
  const series = new Map<string, GrowableSeries>();
  for (const key of seriesKeysOf(wallNames, state.sectionNames)) series.set(key, createSeries());
  return {
    plan,
    state,
    cellStore: createBatchStore(state.cells * RAW_CELL_SUMS, plan.batchSteps),
    wallStore: createBatchStore(state.wallBinTotal * SUMS_PER_WALL_BIN, plan.batchSteps),
    series,
    wallNames,
    batchStepsDone: 0,
    sampledSteps: 0,
    transientEndStep: plan.transientMode === 'auto' ? Infinity : plan.transientSteps,
    monitor: plan.transientMode === 'auto' ? createTransientMonitor(plan.transientSteps) : null,
    phaseMs: { move: 0, index: 0, collide: 0, sample: 0 },
    clock: options.clock ?? Date.now,
    timePhases: options.timePhases ?? false,
    stopReason: null,
  };
}

/**
 * Advances the simulation by `steps` time steps. Each step is its phases in order, one call each: move (straight
 * flights), boundary pass, index, collide (with the cell sampling fused in), sample (batch bookkeeping). Allocates
 * nothing per step; the phase helpers run once per step, not per particle, so they cost nothing measurable.
 */
export function advance(sim: Simulation, steps: number): void {
  const st = sim.state;
  const dt = st.timeStep;
  for (let s = 0; s < steps; s++) {
    beginStep(sim);
    let t0 = startTiming(sim);
    kickAlongZ(st, dt);
    const listed = moveFreely(st, dt);
    boundaryPass(st, dt, listed);
    kickAlongZ(st, dt);
    t0 = lap(sim, 'move', t0);
    indexStep(st);
    t0 = lap(sim, 'index', t0);
    collideParticles(st, st.sampling);
    t0 = lap(sim, 'collide', t0);
    if (st.sampling) {
      sampleStep(sim);
      lap(sim, 'sample', t0);
    }
    st.step++;
    if (st.count > sim.plan.caseData.numerics.maxParticles) {
      sim.stopReason = `stopped at step ${st.step}: ${st.count} simulated particles, more than numerics.maxParticles (${sim.plan.caseData.numerics.maxParticles}); the gas became far denser than the plan foresaw — the result holds what was sampled until then`;
      return;
    }
  }
}

/** Feeds the transient monitor on its steps, and decides whether this step is sampled. */
function beginStep(sim: Simulation): void {
  const st = sim.state;
  if (sim.monitor && st.step < sim.transientEndStep && st.step % sim.monitor.every === 0) {
    if (pushMonitor(sim.monitor, monitorValues(st))) sim.transientEndStep = st.step;
  }
  st.sampling = st.step >= sim.transientEndStep;
}

/**
 * The index phase: counting sort by sub-cell key, the physical reorder every REORDER_INTERVAL steps, and the
 * pressure outlets' entry state from their cells (which needs this step's index).
 */
function indexStep(st: SimState): void {
  indexParticles(st);
  if (st.step % REORDER_INTERVAL === 0) reorderParticles(st);
  if (st.hasPressureOutlets) updatePressureOutlets(st);
}

/**
 * The sample phase. The cell sums were added in the collision pass (see collideParticles), so what is left is the
 * batch bookkeeping: count the step, and close the batch when it is full.
 */
function sampleStep(sim: Simulation): void {
  sim.sampledSteps++;
  if (++sim.batchStepsDone === sim.plan.batchSteps) closeBatch(sim);
}

/** The clock's reading when phases are timed, else 0 (the clock is not read). */
function startTiming(sim: Simulation): number {
  if (!sim.timePhases) return 0;
  const clock = sim.clock;
  return clock();
}

/** Adds the time since t0 to `phase` when phases are timed; returns the clock's reading (the next phase's t0). */
function lap(sim: Simulation, phase: keyof PhaseTimes, t0: number): number {
  if (!sim.timePhases) return 0;
  const clock = sim.clock;
  const t = clock();
  sim.phaseMs[phase] += t - t0;
  return t;
}

function closeBatch(sim: Simulation): void {
  const st = sim.state;
  const steps = sim.batchStepsDone;
  const totals = wallTotalsOfBatch(sim, st.wallSums, steps);
  for (const [k, v] of totals) pushSeries(sim.series.get(k)!, v);
  // Mass flow rate through each section: net weighted crossings × molecules per particle × m over the batch time.
  const massPerCrossing = (st.moleculesPerParticle * st.massKg) / (steps * st.timeStep);
  for (let s = 0; s < st.sectionCount; s++)
    pushSeries(sim.series.get(sectionSeriesKey(st.sectionNames[s]))!, st.sectionSums[s] * massPerCrossing);
  addToBatches(sim.cellStore, st.cellSums);
  addToBatches(sim.wallStore, st.wallSums);
  st.cellSums.fill(0);
  st.wallSums.fill(0);
  st.sectionSums.fill(0);
  st.cellSumSteps = 0;
  sim.batchStepsDone = 0;
}

export function isSampling(sim: Simulation): boolean {
  return sim.state.step >= sim.transientEndStep;
}

/** True when the transient is over and the plan's sampling steps are done. */
export function isFinished(sim: Simulation): boolean {
  return sim.stopReason !== null || sim.sampledSteps >= sim.plan.sampleSteps;
}

/**
 * Steps still to run: exact once the transient has ended; before that, the planner's transient estimate stands in
 * for the unknown end (for progress and time estimates only).
 */
export function stepsRemaining(sim: Simulation): number {
  const st = sim.state;
  if (sim.stopReason !== null) return 0;
  if (Number.isFinite(sim.transientEndStep)) {
    return Math.max(0, sim.transientEndStep - st.step) + Math.max(0, sim.plan.sampleSteps - sim.sampledSteps);
  }
  return Math.max(1, sim.plan.transientSteps - st.step) + sim.plan.sampleSteps;
}

/**
 * How many steps a driver may advance next without running past the end of sampling: at most `wanted`, at most what
 * remains, and while the transient's end is still open at most one monitor interval (the end may come at any check).
 */
export function nextChunk(sim: Simulation, wanted: number): number {
  let n = Math.min(wanted, stepsRemaining(sim));
  if (sim.monitor && !Number.isFinite(sim.transientEndStep)) n = Math.min(n, sim.monitor.every);
  return Math.max(1, n);
}

/** Runs the simulation to the end of its sampling (the transient ending by the plan or by the monitor). */
export function runToCompletion(sim: Simulation, chunk = 1000): void {
  while (!isFinished(sim)) advance(sim, nextChunk(sim, chunk));
}

export type { WallQuantityName };
