/**
 * Runs sized to decide: the sampling steps that bring a case's headline quantity (the flow rate of a duct, the wall
 * shear of Couette flow, the heat flux of Fourier conduction) to a 95 % half-width of ±1 % of its value, within a
 * wall-clock cap, chosen before the run so that a fixed seed still gives one result.
 *
 * The particles are left as planned: the cost of a particle-step hardly depends on how many particles there are
 * (measured on Couette flow with 10 to 3,000 particles per cell: 1.9–2.2 × 10⁷ particle-steps per second on one core
 * here), so more particles per step buy nothing the same number of extra steps would not, and cost more transient.
 * The sizing applies only where the case leaves sampling.sampleSteps unset and the run sets no budget of its own.
 */
import type { Case } from '../case/schema';
import { plan as planCase, stableSampleSteps, type Plan, type PlanOptions } from '../plan/plan';
import { caseModelsOf } from '../continuum/caseModels';
import type { CaseModelsResult } from '../continuum/caseModelTypes';
import { expectedRelativeHalfWidth, headlineNoiseOf, sampledSecondsFor, type HeadlineNoise } from './headlineNoise';

/** Default precision target of the headline: ±1 % (95 % half-width over the mean). */
export const DEFAULT_TARGET_RELATIVE_HALF_WIDTH = 0.01;
/** Default wall-clock cap of a sized run, seconds. */
export const DEFAULT_CAP_SECONDS = 300;

/**
 * Particle-steps per second of one replica on one core, by geometry: measured with `tenuis run` on this project's
 * 2-core development machine (planar Couette 1.9–2.2 × 10⁷, the sized Couette and Fourier defaults 2.2 and 2.1 × 10⁷;
 * the force-driven channel's sized default 1.6 × 10⁷; axisymmetric tube between vessels 1.0–1.3 × 10⁷, the default
 * tube at Kn 100 9.8 × 10⁶). Several
 * replicas on as many cores each run about 0.8 times as fast (`npm run bench`: two replicas 1.77 times one on an idle
 * machine; the sized Couette default on two replicas ran 1.63 times one, 3.3 × 10⁷ particle-steps/s).
 */
export const PARTICLE_STEPS_PER_SECOND = { planar: 2.0e7, forceDriven: 1.6e7, axisymmetric: 1.0e7 } as const;
const PARALLEL_EFFICIENCY = 0.8;

export interface SizingOptions {
  /** 95 % half-width over |mean| to aim at; default 0.01. */
  readonly targetRelativeHalfWidth?: number;
  /** Wall-clock cap, seconds; default 300. */
  readonly capSeconds?: number;
  /** Replicas that share the sampling, one per core; default 1. */
  readonly replicas?: number;
  /** Why the run keeps its planned sampling although the case leaves it open (e.g. a step budget of its own). */
  readonly keepSamplingBecause?: string;
}

export interface RunSizing {
  readonly sized: true;
  /**
   * False when the case fixes sampling.sampleSteps (or the run sets its own budget): the numbers then describe the
   * planned sampling, and the steps the target would need, without changing the run.
   */
  readonly applied: boolean;
  /** Why the sizing does not change the run, when it does not. */
  readonly notAppliedBecause?: string;
  readonly path: string;
  readonly expectedMean: number;
  readonly expectedFrom: string;
  readonly target: number;
  readonly capSeconds: number;
  readonly replicas: number;
  /** Sampling steps per replica the run will take. */
  readonly sampleSteps: number;
  /** Sampling steps per replica the target needs (may exceed what the cap allows). */
  readonly stepsForTarget: number;
  /** The headline's expected 95 % relative half-width after sampleSteps. */
  readonly expectedRelativeHalfWidth: number;
  /** Expected wall time of the whole run (transient included) at sampleSteps, and for the target. */
  readonly expectedSeconds: number;
  readonly secondsForTarget: number;
  readonly capAllows: boolean;
  readonly particleStepsPerSecond: number;
}

export interface NotSized {
  readonly sized: false;
  readonly reason: string;
}

function check(value: number, what: string, min: number, max = Infinity): void {
  if (!(Number.isFinite(value) && value > min && value <= max))
    throw new Error(
      `run sizing: ${what} = ${value}: must be a number above ${min}${max < Infinity ? ` and at most ${max}` : ''}`,
    );
}

/** The sampling that reaches the target within the cap (see the file header), or why the run is not sized. */
export function sizeRun(plan: Plan, models: CaseModelsResult, options: SizingOptions = {}): RunSizing | NotSized {
  const target = options.targetRelativeHalfWidth ?? DEFAULT_TARGET_RELATIVE_HALF_WIDTH;
  const capSeconds = options.capSeconds ?? DEFAULT_CAP_SECONDS;
  const replicas = options.replicas ?? 1;
  check(target, 'target relative half-width', 0, 1);
  check(capSeconds, 'time cap (s)', 0);
  check(replicas, 'replicas', 0);
  const noise = headlineNoiseOf(plan, models);
  if (!noise.sized) return { sized: false, reason: noise.reason };
  const because =
    plan.caseData.sampling.sampleSteps !== undefined
      ? 'the case fixes sampling.sampleSteps and runs them as given (leave them out to size the run)'
      : options.keepSamplingBecause;
  return sizeFor(plan, noise, target, capSeconds, replicas, because);
}

function sizeFor(
  plan: Plan,
  noise: HeadlineNoise,
  target: number,
  capSeconds: number,
  replicas: number,
  notAppliedBecause: string | undefined,
): RunSizing {
  const applied = notAppliedBecause === undefined;
  const geometry = plan.grid.axisymmetric
    ? 'axisymmetric'
    : plan.bodyAccelerationXMPerS2 !== 0
      ? 'forceDriven'
      : 'planar';
  const rate = PARTICLE_STEPS_PER_SECOND[geometry] * (replicas > 1 ? PARALLEL_EFFICIENCY : 1);
  const particles = Math.max(1, plan.initialParticles);
  const secondsOf = (sampleSteps: number) => ((plan.transientSteps + sampleSteps) * particles) / rate;
  // The replicas' samples are merged: each replica samples its share of the simulated time the target needs.
  const stepsForTarget = Math.ceil(sampledSecondsFor(noise, target) / (plan.timeStepS * replicas));
  const capSteps = Math.floor((capSeconds * rate) / particles) - plan.transientSteps;
  // Never below the planner's own sampling (enough batches for the error analysis); steps that plan to themselves.
  const wanted = Math.max(plan.sampleSteps, Math.min(stepsForTarget, capSteps));
  const sampleSteps = applied ? stableSampleSteps(wanted) : plan.sampleSteps;
  return {
    sized: true,
    applied,
    ...(applied ? {} : { notAppliedBecause }),
    path: noise.path,
    expectedMean: noise.expectedMean,
    expectedFrom: noise.expectedFrom,
    target,
    capSeconds,
    replicas,
    sampleSteps,
    stepsForTarget,
    expectedRelativeHalfWidth: expectedRelativeHalfWidth(noise, sampleSteps * plan.timeStepS * replicas),
    expectedSeconds: secondsOf(sampleSteps),
    secondsForTarget: secondsOf(Math.max(plan.sampleSteps, stepsForTarget)),
    capAllows: stepsForTarget <= capSteps,
    particleStepsPerSecond: rate,
  };
}

/**
 * The plan the run will take: sized for its headline (the case with the sized sampling written in, planned again)
 * where the sizing applies, else the plan as it is; with the sizing. Shared by the command line and the page.
 */
export function sizedPlanOf(
  plan: Plan,
  options: SizingOptions = {},
  planOptions: PlanOptions = {},
): { plan: Plan; sizing: RunSizing | NotSized } {
  const sizing = sizeRun(plan, caseModelsOf(plan), options);
  if (!sizing.sized || !sizing.applied) return { plan, sizing };
  const sized = planCase(sizedCase(plan.caseData, sizing), planOptions);
  return sized.ok
    ? { plan: sized.plan, sizing }
    : { plan, sizing: { sized: false, reason: `the sized case cannot run: ${sized.errors.join('; ')}` } };
}

/** The case with the sized sampling written in, so that the case as run (case.json, checkpoints) says what ran. */
export function sizedCase(c: Case, sizing: RunSizing): Case {
  return { ...c, sampling: { ...c.sampling, sampleSteps: sizing.sampleSteps } };
}

function durationText(s: number): string {
  return s < 120
    ? `${s.toPrecision(2)} s`
    : s < 7200
      ? `${(s / 60).toPrecision(2)} min`
      : `${(s / 3600).toPrecision(2)} h`;
}

/** The sizing in a few lines, for `tenuis check`, the run's start and the check panel. */
export function sizingLines(s: RunSizing | NotSized): string[] {
  if (!s.sized) return [`not sized: ${s.reason}; the planned sampling runs`];
  const pct = (f: number) => `${(100 * f).toPrecision(2)} %`;
  const head = s.applied ? [] : [`not applied: ${s.notAppliedBecause ?? 'the run keeps its planned sampling'}`];
  const lines = [
    ...head,
    `headline ${s.path}, expected about ${s.expectedMean.toPrecision(3)} (${s.expectedFrom})`,
    `target ±${pct(s.target)} (95 %) within a cap of ${durationText(s.capSeconds)}${s.replicas > 1 ? ` on ${s.replicas} replicas` : ''}`,
    `${s.sampleSteps} sampled steps per replica: expected ±${pct(s.expectedRelativeHalfWidth)} in about ${durationText(s.expectedSeconds)}`,
  ];
  lines.push(
    s.applied && s.capAllows
      ? 'the cap allows the target'
      : s.stepsForTarget <= s.sampleSteps
        ? 'the planned steps reach the target'
        : `${s.applied ? 'the cap does not allow the target: it' : 'the target'} needs ${s.stepsForTarget} steps, about ${durationText(s.secondsForTarget)}${s.applied ? '; raise the cap or use more replicas' : ''}`,
  );
  lines.push(
    `(a planning estimate at about ${s.particleStepsPerSecond.toPrecision(2)} particle-steps/s per replica; the run reports the half-width it reached)`,
  );
  return lines;
}
