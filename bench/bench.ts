/**
 * `npm run bench`: single-thread throughput of the full DSMC step on the benchmark case (hard-sphere argon Couette,
 * about 20 particles per cell) at 10^5 and 10^6 particles.
 *
 * For each size: one simulation, a few settling steps (the first steps adapt (σc_r)max), then `repeats` timed runs of
 * `steps` steps; every figure reported is the median over the runs, because the machine may be shared. Throughput is
 * particle-steps per second of the whole step; the breakdown is nanoseconds per particle-step for each phase as the
 * simulation times it: index includes the periodic reorder; the per-cell sampling runs inside the collision pass,
 * so collide includes it and sample is the batch bookkeeping only. The JIT is warmed on a tiny instance first, since
 * early deoptimisations would otherwise distort the first size (performance guide, item 7). The machine's idle state
 * is reported next to the figures (item 9), everything is written to bench-results.json at the repository root, and
 * the process ends explicitly (item 10).
 *
 * Then the long-duct solver's timings (longDuctBench.ts) and the cross-section mode against the planar engine
 * (crossSectionBench.ts).
 *
 * Options: --sizes 1e5,1e6   --steps 300,40 (one per size)   --repeats 3   --out <file>   --scaling no (skip replicas)
 */
import { writeFileSync } from 'node:fs';
import { measureReplicaScaling } from './replicaScaling';
import { measureLongDuct } from './longDuctBench';
import { measureCrossSection } from './crossSectionBench';
import os from 'node:os';
import { fileURLToPath } from 'node:url';
import { couetteBenchCase } from './couetteBenchCase';
import { plan } from '../engine/plan/plan';
import { createSimulation, advance, type PhaseTimes, type Simulation } from '../engine/run/simulation';

const PHASES = ['move', 'index', 'collide', 'sample'] as const;
const SETTLE_STEPS = 10;

interface SizeResult {
  particles: number;
  cells: number;
  stepsPerRun: number;
  runs: number;
  /** Median over runs, million particle-steps per second of the full step. */
  mParticleStepsPerS: number;
  mParticleStepsPerSRuns: number[];
  /** Median over runs, ns per particle-step. */
  nsPerParticleStep: Record<(typeof PHASES)[number] | 'total', number>;
  /** Hard-sphere check: collisions per particle per step (= ν Δt). */
  collisionsPerParticlePerStep: number;
}

function option(name: string, fallback: string): string {
  const k = process.argv.indexOf(`--${name}`);
  return k >= 0 && k + 1 < process.argv.length ? process.argv[k + 1] : fallback;
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : 0.5 * (s[m - 1] + s[m]);
}

function makeSimulation(particles: number): Simulation {
  const p = plan(couetteBenchCase(particles));
  if (!p.ok) throw new Error(`benchmark case at ${particles} particles: ${p.errors.join('; ')}`);
  // transientSteps is 0 in the benchmark case, so every step samples, as in the sampling part of a production run.
  return createSimulation(p.plan, { clock: () => performance.now(), timePhases: true });
}

function resetCounters(sim: Simulation): void {
  const ph: PhaseTimes = sim.phaseMs;
  for (const k of PHASES) ph[k] = 0;
  sim.state.particleSteps = 0;
  sim.state.collisionCount = 0;
}

function measure(particles: number, steps: number, repeats: number): SizeResult {
  const sim = makeSimulation(particles);
  advance(sim, SETTLE_STEPS);
  const rates: number[] = [];
  const phaseNs: Record<string, number[]> = { move: [], index: [], collide: [], sample: [], total: [] };
  const collisionRates: number[] = [];
  for (let r = 0; r < repeats; r++) {
    resetCounters(sim);
    const t0 = performance.now();
    advance(sim, steps);
    const ms = performance.now() - t0;
    const ps = sim.state.particleSteps;
    rates.push(ps / ms / 1e3);
    for (const k of PHASES) phaseNs[k].push((sim.phaseMs[k] * 1e6) / ps);
    phaseNs.total.push((ms * 1e6) / ps);
    collisionRates.push((2 * sim.state.collisionCount) / ps);
  }
  const ns = Object.fromEntries(
    Object.entries(phaseNs).map(([k, v]) => [k, median(v)]),
  ) as SizeResult['nsPerParticleStep'];
  return {
    particles: sim.state.count,
    cells: sim.state.cells,
    stepsPerRun: steps,
    runs: repeats,
    mParticleStepsPerS: median(rates),
    mParticleStepsPerSRuns: rates,
    nsPerParticleStep: ns,
    collisionsPerParticlePerStep: median(collisionRates),
  };
}

function machine() {
  const cpus = os.cpus();
  return {
    node: process.version,
    v8: process.versions.v8,
    platform: `${os.platform()} ${os.arch()}`,
    cpuModel: cpus[0]?.model ?? 'unknown',
    cpus: cpus.length,
    loadAvg: os.loadavg(),
    totalMemoryGiB: os.totalmem() / 2 ** 30,
  };
}

function printTable(results: SizeResult[]): void {
  const head = ['particles', 'M p-steps/s', 'total ns', 'move', 'index', 'collide', 'sample', 'coll/part/step'];
  const rows = results.map((r) => [
    r.particles.toExponential(2),
    r.mParticleStepsPerS.toFixed(2),
    r.nsPerParticleStep.total.toFixed(2),
    ...PHASES.map((k) => r.nsPerParticleStep[k].toFixed(2)),
    r.collisionsPerParticlePerStep.toFixed(4),
  ]);
  const width = head.map((h, c) => Math.max(h.length, ...rows.map((row) => row[c].length)));
  const line = (cells: string[]) => cells.map((s, c) => s.padStart(width[c])).join('  ');
  console.log(line(head));
  for (const row of rows) console.log(line(row));
  console.log('(ns per particle-step, medians over runs; index includes the periodic reorder; collide includes the');
  console.log(' per-cell sampling, which runs inside the collision pass; sample is the batch bookkeeping)');
}

async function main(): Promise<void> {
  const sizes = option('sizes', '1e5,1e6').split(',').map(Number);
  const stepsList = option('steps', '300,40').split(',').map(Number);
  const repeats = Number(option('repeats', '3'));
  const out = option('out', fileURLToPath(new URL('../bench-results.json', import.meta.url)));
  const idleBefore = machine();
  console.log(
    `node ${idleBefore.node}, ${idleBefore.cpus} × ${idleBefore.cpuModel}, load average ${idleBefore.loadAvg.map((v) => v.toFixed(2)).join(' ')}`,
  );

  // Warm the JIT on the same code paths (timed phases included) before any figure is taken.
  advance(makeSimulation(2000), 400);

  const results: SizeResult[] = [];
  sizes.forEach((n, k) => {
    const steps = stepsList[Math.min(k, stepsList.length - 1)];
    results.push(measure(n, steps, repeats));
  });
  printTable(results);
  const scaling = option('scaling', 'yes') === 'no' ? null : await measureReplicaScaling();
  if (scaling) {
    const [one, many] = scaling.runs;
    console.log(
      `replicas on worker threads: 1 → ${one.mParticleStepsPerS.toFixed(1)} M p-steps/s, ${many.replicas} → ${many.mParticleStepsPerS.toFixed(1)} M p-steps/s in total: ${scaling.speedup.toFixed(2)}× (wall time includes worker start-up)`,
    );
  }
  const longDuct = measureLongDuct();
  console.log(
    `long duct (BGK channel table): isothermal solve ${longDuct.isothermalSolveMs.toFixed(2)} ms, thermal-creep ODE solve ${longDuct.odeSolveMs.toFixed(1)} ms, 50-point conductance curve ${longDuct.conductanceCurve50Ms.toFixed(0)} ms (medians)`,
  );
  const crossSection = measureCrossSection();
  console.log(
    `cross-section mode (square, ${crossSection.particles} particles): ${crossSection.crossSectionMParticleStepsPerS.toFixed(1)} M p-steps/s driven along z, ${crossSection.planarMParticleStepsPerS.toFixed(1)} M p-steps/s the same box undriven`,
  );
  const report = {
    benchmark: 'hard-sphere argon Couette, ~20 particles per cell, one thread',
    date: new Date().toISOString(),
    machineBefore: idleBefore,
    loadAvgAfter: os.loadavg(),
    results,
    replicaScaling: scaling,
    longDuct,
    crossSection,
  };
  writeFileSync(out, JSON.stringify(report, null, 2) + '\n');
  console.log(`written ${out}`);
}

await main();
// A Node process occasionally stayed alive after its work (performance guide, item 10).
process.exit(0);
