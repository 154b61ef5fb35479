import { describe, expect, it } from 'vitest';
import { advance } from '../../engine/run/simulation';
import { summarizeSamples } from '../../engine/results/summarize';
import { averageSamplesOverCells } from '../../engine/results/fieldTables';
import { summarize, averageOverCells, sampleSetOf } from '../../engine/run/simulationSamples';
import { GEOMETRY_SCALARS, geometryOf } from '../../engine/kernel/samplingGeometry';
import { couetteSimulation, differingLeaves } from '../support/sampleSets';

describe('sampleSetOf', () => {
  it('summarize(sim) equals summarizeSamples(sampleSetOf(sim)) field by field, exactly', () => {
    const sim = couetteSimulation(11);
    const a = summarize(sim);
    const b = summarizeSamples(sampleSetOf(sim));
    expect(differingLeaves(a, b)).toEqual([]);
    expect(a.numerics.replicas).toBe(1);
    expect(a.numerics.transientSteps).toBe(sim.plan.transientSteps);
  });

  it('keeps the sums of a part-filled batch: mid-run results equal too, and the mean uses every sampled step', () => {
    const sim = couetteSimulation(12, 1237); // 1237 sampled steps: 7 steps in the open base batch
    const set = sampleSetOf(sim);
    expect(set.pendingSteps).toBe(7);
    expect(set.counters.sampledSteps).toBe(1237);
    expect(differingLeaves(summarize(sim), summarizeSamples(set))).toEqual([]);
    const all = Array.from({ length: sim.state.cells }, (_, c) => c);
    expect(differingLeaves(averageOverCells(sim, all), averageSamplesOverCells(set, all))).toEqual([]);
  });

  it('is a copy: the simulation can go on without changing the set', () => {
    const sim = couetteSimulation(13, 2000);
    const set = sampleSetOf(sim);
    const before = summarizeSamples(set);
    advance(sim, 500);
    expect(differingLeaves(summarizeSamples(set), before)).toEqual([]);
    expect(differingLeaves(summarize(sim), before).length).toBeGreaterThan(0);
  });

  it('geometryOf(plan) gives the numbers and side table createState puts into SimState', () => {
    const sim = couetteSimulation(14, 0);
    const g = geometryOf(sim.plan);
    for (const key of GEOMETRY_SCALARS) expect(g[key], key).toBe(sim.state[key]);
    expect(Array.from(g.sideTable)).toEqual(Array.from(sim.state.sideTable));
  });
});
