/**
 * Human-readable reports: a plan (for `check` and before `run`) and the short summary after a run. User text in them
 * (names) goes through printable.ts, so a name holding escape sequences cannot drive the terminal.
 */
import type { Plan } from '../engine/plan/plan';
import type { SimulationResult } from '../engine/results/summarize';
import type { Performance } from '../engine/report/summaryJson';
import type { ContinuumComparisonResult } from '../engine/report/comparison';
import { extraTimeText, sampledWallSeconds, verdictHeadline } from '../engine/report/headline';
import { sig, plusMinus, duration, bytes, table } from './format';
import { printableLine } from './printable';
import {
  independentSamples,
  densityRelativeError,
  temperatureRelativeError,
  velocityStandardErrorMPerS,
} from '../engine/stats/expectedNoise';

/**
 * Expected relative errors of one cell's density, temperature and velocity after the plan's sampling, assuming
 * samples decorrelate after one mean collision time (a planning estimate; common practice).
 */
function expectedErrorRows(p: Plan): [string, string][] {
  const between = Math.max(1, p.reference.meanCollisionTimeS / p.timeStepS);
  const m = independentSamples(p.sampleSteps, between);
  const n = p.particlesPerCell;
  const pct = (x: number) => `±${sig(100 * x, 2)} % (1σ)`;
  const rows: [string, string][] = [
    ['density', pct(densityRelativeError(n, m))],
    ['translational temperature', pct(temperatureRelativeError(n, m))],
  ];
  const speed = flowSpeedOf(p);
  if (speed > 0) {
    const u = velocityStandardErrorMPerS(p.gas.model.massKg, p.reference.temperatureK, n, m);
    rows.push([
      'velocity',
      `±${sig(u, 2)} m/s (1σ), ${sig((100 * u) / speed, 2)} % of the fastest wall or inflow speed ${sig(speed, 3)} m/s`,
    ]);
  }
  return rows;
}

function flowSpeedOf(p: Plan): number {
  let u = Math.hypot(...p.caseData.initial.velocityMPerS);
  for (const side of ['left', 'right', 'bottom', 'top'] as const) {
    const b = p.boundaries[side];
    if (b.type === 'wall') u = Math.max(u, Math.hypot(...b.velocityMPerS));
  }
  return u;
}

/** Reference state, grid, time step, particles, schedule and advisor ratios of a plan. */
export function planReport(p: Plan): string {
  const r = p.reference;
  const g = p.grid;
  const a = p.ratios;
  const total = p.transientSteps + p.sampleSteps;
  return [
    `case "${printableLine(p.caseData.name)}": valid`,
    `gas: ${printableLine(p.gas.name)}`,
    'reference state:',
    table([
      ['pressure', `${sig(r.pressurePa)} Pa`],
      ['temperature', `${sig(r.temperatureK)} K`],
      ['number density', `${sig(r.numberDensityPerM3)} 1/m^3`],
      ['viscosity', `${sig(r.viscosityPaS)} Pa s`],
      ['most probable speed', `${sig(r.mostProbableSpeedMPerS)} m/s`],
      ['mean free path', `${sig(r.meanFreePathM)} m  (viscosity-based, (μ/p)·sqrt(πkT/(2m)))`],
      ['length scale', `${sig(r.lengthScaleM)} m`],
      ['Knudsen number', sig(r.knudsen)],
      ['rarefaction δ', sig(r.rarefaction)],
      ['mean collision time', `${sig(r.meanCollisionTimeS)} s`],
    ]),
    'numerics:',
    table([
      ['cells', `${g.cellsX} × ${g.cellsY}, each ${sig(g.cellSizeXM)} m × ${sig(g.cellSizeYM)} m`],
      ['time step', `${sig(p.timeStepS)} s`],
      [
        'particles',
        `${p.initialParticles} (${sig(p.particlesPerCell)} per cell), ${sig(p.moleculesPerParticle)} molecules each`,
      ],
      [
        'steps',
        p.transientMode === 'auto'
          ? `transient ends when steady (estimate ${p.transientSteps}, at most ${5 * p.transientSteps}) + ${p.sampleSteps} sampled`
          : `${p.transientSteps} transient + ${p.sampleSteps} sampled = ${total}`,
      ],
      ['memory', `about ${bytes(p.memoryBytesEstimate)}`],
      ['seed', String(p.seed)],
    ]),
    'expected statistical error per cell after the planned sampling (Hadjiconstantinou et al. 2003):',
    table(expectedErrorRows(p)),
    'advisor:',
    table([
      ['cell size / mean free path', `${sig(a.cellSizeOverMeanFreePath, 3)}  (keep below about 1/3)`],
      ['time step / mean collision time', `${sig(a.timeStepOverCollisionTime, 3)}  (keep below about 1/4)`],
      ['time step / cell transit time', `${sig(a.timeStepOverCellTransitTime, 3)}  (keep below about 1/4)`],
      ['particles per cell', `${sig(a.particlesPerCell, 3)}  (about 20 or more)`],
    ]),
  ].join('\n');
}

/**
 * The verdict's one sentence (engine/report/headline.ts, as summary.json's `verdict.headline`) and the expected time
 * to decide at this run's speed; none when no continuum model is compared.
 */
function verdictLines(result: SimulationResult, performance: Performance, c?: ContinuumComparisonResult): string[] {
  if (!c) return [];
  if (!c.recognised) return [`no continuum model compared: ${c.reason}`];
  const h = verdictHeadline(c);
  const n = result.numerics;
  const time = extraTimeText(h, sampledWallSeconds(performance.wallSeconds, n.sampleSteps, n.steps));
  return [h.text, ...(time ? [time] : [])];
}

/** The verdict first, then wall shear stress and heat flux with 95 % half-widths, and the run's speed. */
export function runSummary(
  result: SimulationResult,
  performance: Performance,
  outDir: string,
  comparison?: ContinuumComparisonResult,
): string {
  const lines = [
    ...verdictLines(result, performance, comparison),
    `finished in ${duration(performance.wallSeconds)}: ${sig(performance.particleSteps, 3)} particle steps, ${sig(performance.particleStepsPerSecond, 3)} per second`,
  ];
  for (const [wall, e] of Object.entries(result.walls)) {
    if (!e) continue;
    lines.push(
      `  wall ${wall}: shear stress ${plusMinus(e.shearStress.mean, e.shearStress.ci95, 'Pa')}, heat flux ${plusMinus(e.heatFlux.mean, e.heatFlux.ci95, 'W/m^2')}`,
    );
  }
  const f = result.flow;
  if (f) {
    const per = result.axisymmetric ? '' : ' per m depth';
    const v = f.values;
    const show = (label: string, e: { mean: number; ci95: number } | undefined, factor: number, unit: string) =>
      e && lines.push(`  ${label}: ${plusMinus(e.mean * factor, e.ci95 * factor, unit)}${per}`);
    lines.push(`  flow through section ${f.section}:`);
    show('  mass flow rate', v.massFlowRate, 1, 'kg/s');
    show('  molar flow', v.molarFlow, 1, 'sccm');
    show('  throughput', v.throughput, 10, 'mbar L/s');
    show('  conductance', v.conductance, 1000, 'L/s');
    if (v.transmissionProbability)
      lines.push(
        `    transmission probability: ${plusMinus(v.transmissionProbability.mean, v.transmissionProbability.ci95, '')}`,
      );
    if (v.reducedFlowRate)
      lines.push(`    reduced flow rate G_P: ${plusMinus(v.reducedFlowRate.mean, v.reducedFlowRate.ci95, '')}`);
  }
  lines.push(`results in ${outDir}`);
  return lines.join('\n');
}
