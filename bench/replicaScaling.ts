/**
 * Replica scaling: total particle-steps per second of R replicas on R worker threads against one replica, for the
 * benchmark case. Wall time includes starting the workers, planning and the JIT warming up in each, so the ratio
 * is what a user gets, not a best case. Report the machine's load next to it (performance guide, item 9).
 */
import os from 'node:os';
import { runReplicaPool } from '../workers/replicaPool';
import { nodeReplicaFactory } from '../workers/nodeReplica';
import { couetteBenchCase } from './couetteBenchCase';

export interface ScalingResult {
  readonly replicas: number;
  readonly particlesPerReplica: number;
  readonly stepsPerReplica: number;
  readonly wallSeconds: number;
  readonly mParticleStepsPerS: number;
  readonly loadAvgBefore: number[];
}

async function timePool(replicas: number, particles: number, steps: number): Promise<ScalingResult> {
  const caseInput = { ...couetteBenchCase(particles), sampling: { transientSteps: 0, sampleSteps: steps } };
  const loadAvgBefore = os.loadavg();
  const t0 = performance.now();
  const outcome = await runReplicaPool({ caseInput, replicas, createReplica: nodeReplicaFactory() }).done;
  const wallSeconds = (performance.now() - t0) / 1000;
  const failed = outcome.replicas.filter((r) => r.status !== 'completed');
  if (failed.length)
    throw new Error(
      `replica scaling: ${failed.map((r) => `replica ${r.stream} ${r.status} ${r.reason ?? ''}`).join('; ')}`,
    );
  const particleSteps = outcome.replicas.reduce((s, r) => s + r.particleSteps, 0);
  return {
    replicas,
    particlesPerReplica: particles,
    stepsPerReplica: steps,
    wallSeconds,
    mParticleStepsPerS: particleSteps / wallSeconds / 1e6,
    loadAvgBefore,
  };
}

/** One replica, then `cores` replicas, same work per replica. */
export async function measureReplicaScaling(
  particles = 1e5,
  steps = 1500,
): Promise<{ runs: ScalingResult[]; speedup: number }> {
  const cores = Math.max(2, os.availableParallelism?.() ?? os.cpus().length);
  const one = await timePool(1, particles, steps);
  const many = await timePool(cores, particles, steps);
  return { runs: [one, many], speedup: many.mParticleStepsPerS / one.mParticleStepsPerS };
}
