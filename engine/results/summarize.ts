/**
 * Reduces sampled sums (a SampleSet: one replica, or several merged) to estimates with 95 % confidence half-widths:
 * - integral quantities (whole-wall stresses and fluxes): blocking analysis of each replica's per-batch series,
 *   replicas combined with Welch–Satterthwaite degrees of freedom (stats/replicaBlocking.ts);
 * - cell fields, row-averaged profiles and wall bins: batch-level values over the complete batches of every replica
 *   (batch-level ratios for ratio quantities), t interval with batches − 1 degrees of freedom (fieldTables.ts).
 * Means use every sampled step, including those not yet in a complete batch.
 *
 * SimulationResult is declared here with the function that makes it; the types it is built of are re-exported, so a
 * reader of results imports them from one place. The summary of a live simulation is in run/simulationSamples.ts.
 */
import type { Plan } from '../plan/plan';
import type { SampleSet } from './sampleSet';
import {
  crossSectionFlowOf,
  flowResultOf,
  isCrossSectionFlow,
  isForceDrivenDuct,
  thermalCreepFromHeatFlux,
  thermalCreepNonlinearity,
  type FlowResult,
} from './flowQuantities';
import { CELL_FIELDS } from './cellFields';
import { sectionSeriesKey } from './seriesKeys';
import { replicaIntegralEstimate } from './integralEstimate';
import type { IntegralEstimate } from '../stats/estimate';
import { WALL_QUANTITIES, type WallQuantityName } from './wallQuantities';
import { groupedFields, wallBinTable, type FieldTable } from './fieldTables';
import type { ReferenceState } from '../plan/referenceState';

export type { IntegralEstimate, FieldTable };

export interface SimulationResult {
  reference: ReferenceState;
  /** x the axis and y the radius: flow numbers are totals, not per metre of depth. */
  axisymmetric: boolean;
  /** Counts (particles, steps, sampleSteps …) are summed over replicas; seed is NaN if replicas had different seeds. */
  numerics: {
    cellsX: number;
    cellsY: number;
    cells: number;
    particles: number;
    moleculesPerParticle: number;
    timeStep: number;
    steps: number;
    transientSteps: number;
    sampleSteps: number;
    batchSteps: number;
    seed: number;
    /** Independent replicas whose samples the estimates combine (1 for a single run). */
    replicas: number;
    cellSizeOverMeanFreePath: number;
    timeStepOverCollisionTime: number;
    timeStepOverCellTransitTime: number;
    particlesPerCell: number;
    collisionSeparationOverMeanFreePath: number;
    collisionsPerParticlePerStep: number;
  };
  walls: Partial<Record<string, Record<WallQuantityName, IntegralEstimate>>>;
  /** Cell centres (m), cell index = ix + cellsX·iy. */
  cellX: Float64Array;
  cellY: Float64Array;
  cells: FieldTable;
  /** Averages over each row of cells (constant y): the profile across a gap. */
  profileY: Float64Array;
  profile: FieldTable;
  wallBins: Partial<Record<string, { position: Float64Array; table: FieldTable }>>;
  /** Flow numbers of cases with flow sections (results/flowQuantities.ts). */
  flow?: FlowResult;
  warnings: string[];
}

/** Estimates with 95 % half-widths from a set of samples (one replica or several merged). */
export function summarizeSamples(set: SampleSet): SimulationResult {
  const st = set.geometry;
  const counters = set.counters;
  const plan: Plan = set.plan;
  const warnings = [...plan.warnings];
  const walls: SimulationResult['walls'] = {};
  let longestCorrelationSteps = 0;
  let leftOutReplicas = 0;
  for (const name of set.wallNames) {
    const entry = {} as Record<WallQuantityName, IntegralEstimate>;
    for (const q of WALL_QUANTITIES) {
      const { estimate: e, leftOut } = replicaIntegralEstimate(set.series.get(`${name}.${q}`) ?? [], plan.batchSteps);
      leftOutReplicas = Math.max(leftOutReplicas, leftOut);
      entry[q] = e;
      if (Number.isFinite(e.correlationTimeSteps))
        longestCorrelationSteps = Math.max(longestCorrelationSteps, e.correlationTimeSteps);
      if (q === 'shearStress' || q === 'heatFlux') {
        if (!e.plateauFound && counters.sampledSteps > 0)
          warnings.push(
            `walls.${name}.${q}: no plateau in the blocking analysis; its error bar may be too small — sample longer`,
          );
      }
    }
    walls[name] = entry;
  }
  if (leftOutReplicas > 0) {
    warnings.push(
      `${leftOutReplicas} of ${set.replicas} replicas sampled fewer than 2 base batches and are left out of the wall quantities (their cell samples are kept)`,
    );
  }

  const cellX = new Float64Array(st.cells);
  const cellY = new Float64Array(st.cells);
  const dx = st.lengthX / st.cellsX;
  const dy = st.lengthY / st.cellsY;
  const identity = new Int32Array(st.cells);
  const rowOf = new Int32Array(st.cells);
  for (let c = 0; c < st.cells; c++) {
    cellX[c] = ((c % st.cellsX) + 0.5) * dx;
    cellY[c] = (Math.floor(c / st.cellsX) + 0.5) * dy;
    identity[c] = c;
    rowOf[c] = Math.floor(c / st.cellsX);
  }
  const rowVolumes = new Float64Array(st.cellsY);
  for (let c = 0; c < st.cells; c++) rowVolumes[rowOf[c]] += st.cellVolumes[c];
  const cells = groupedFields(set, identity, st.cells, st.cellVolumes);
  const profile = groupedFields(set, rowOf, st.cellsY, rowVolumes);
  const profileY = Float64Array.from({ length: st.cellsY }, (_, r) => (r + 0.5) * dy);

  const wallBins: SimulationResult['wallBins'] = {};
  for (const name of set.wallNames) wallBins[name] = wallBinTable(set, name);

  const sections: Record<string, IntegralEstimate> = {};
  for (const name of st.sectionNames) {
    const { estimate } = replicaIntegralEstimate(set.series.get(sectionSeriesKey(name)) ?? [], plan.batchSteps);
    sections[name] = estimate;
    if (!estimate.plateauFound && counters.sampledSteps > 0)
      warnings.push(
        `flow.sections.${name}.massFlowRate: no plateau in the blocking analysis; its error bar may be too small — sample longer`,
      );
  }
  let flow = flowResultOf(plan, sections);
  if (isCrossSectionFlow(plan)) {
    // The flow along the duct, from every particle's axial velocity (flowQuantities.ts).
    let area = 0;
    for (let c = 0; c < st.cells; c++) area += st.cellVolumes[c];
    const whole = groupedFields(set, new Int32Array(st.cells), 1, Float64Array.of(area));
    const at = (name: string) => {
      const f = CELL_FIELDS.findIndex((x) => x.name === name);
      return { mean: whole.mean[f], ci95: whole.ci95[f] };
    };
    flow = crossSectionFlowOf(plan, at('massDensity'), at('velocityZ'), area);
  } else if (flow && isForceDrivenDuct(plan)) {
    // The whole cross-section as one group: its mean axial heat flux gives G_T by reciprocity (flowQuantities.ts).
    let volume = 0;
    for (let c = 0; c < st.cells; c++) volume += st.cellVolumes[c];
    const whole = groupedFields(set, new Int32Array(st.cells), 1, Float64Array.of(volume));
    const f = CELL_FIELDS.findIndex((x) => x.name === 'heatFluxX');
    flow.values.thermalCreepFlowRate = thermalCreepFromHeatFlux(plan, { mean: whole.mean[f], ci95: whole.ci95[f] });
    const eps = thermalCreepNonlinearity(plan);
    if (eps > 0.01)
      warnings.push(
        `flow.thermalCreepFlowRate: the body acceleration is too strong for the heat flow to be linear here (nonlinearity ${eps.toPrecision(2)}, about the relative bias of G_T); lower it by a factor of ${Math.ceil(Math.sqrt(eps / 0.01))} for G_T to about 1 % (which needs that factor squared more samples), or take G_T from elsewhere`,
      );
  }

  if (cells.batches > 0 && longestCorrelationSteps > 0 && cells.batchLengthSteps < 10 * longestCorrelationSteps) {
    warnings.push(
      `field batches are ${cells.batchLengthSteps} steps long but wall quantities stay correlated for about ${longestCorrelationSteps.toFixed(0)} steps; profile error bars may be too small — sample at least ${Math.ceil((10 * longestCorrelationSteps * 16) / 1000) * 1000} steps`,
    );
  }
  if (cells.batches < 2 && counters.sampledSteps > 0)
    warnings.push('fewer than 2 complete batches: profile error bars are not available — sample longer');

  const lambda = plan.reference.meanFreePathM;
  const separation = counters.collisionCount > 0 ? counters.separationSum / counters.collisionCount : NaN;
  const mcsRatio = separation / lambda;
  if (mcsRatio > 0.2)
    warnings.push(
      `mean collision separation is ${mcsRatio.toFixed(2)} mean free paths; keep it below about 0.2 (more particles per cell or smaller cells)`,
    );

  return {
    reference: plan.reference,
    axisymmetric: st.axisymmetric,
    numerics: {
      cellsX: st.cellsX,
      cellsY: st.cellsY,
      cells: st.cells,
      particles: counters.particles,
      moleculesPerParticle: st.moleculesPerParticle,
      timeStep: st.timeStep,
      steps: counters.steps,
      // Steps before sampling began, summed over replicas (for one run: min(steps, plan.transientSteps)).
      transientSteps: counters.steps - counters.sampledSteps,
      sampleSteps: counters.sampledSteps,
      batchSteps: plan.batchSteps,
      seed: set.seeds.every((s) => s === set.seeds[0]) ? set.seeds[0] : NaN,
      replicas: set.replicas,
      ...plan.ratios,
      collisionSeparationOverMeanFreePath: mcsRatio,
      collisionsPerParticlePerStep:
        counters.particleSteps > 0 ? (2 * counters.collisionCount) / counters.particleSteps : 0,
    },
    walls,
    cellX,
    cellY,
    cells,
    profileY,
    profile,
    wallBins,
    ...(flow ? { flow } : {}),
    warnings,
  };
}
