/**
 * A quick end-to-end check of the engine in this browser: a small Couette case (own demo scenario) run as replicas
 * in Web Workers and merged. Loaded lazily so the engine stays out of the page's main bundle.
 */
import { buildPreset } from '../../engine/case/presets';
import { summarizeSamples } from '../../engine/results/summarize';
import { runReplicaPool } from '../../workers/replicaPool';
import { browserReplicaFactory, defaultReplicaCount } from '../../workers/browserReplica';

export interface QuickCheckResult {
  readonly replicas: number;
  readonly completed: number;
  readonly seconds: number;
  readonly shearStressPa: { mean: number; ci95: number };
  readonly particleStepsPerSecond: number;
}

export async function runQuickCheck(onFraction: (f: number) => void): Promise<QuickCheckResult> {
  const replicas = Math.min(4, defaultReplicaCount());
  const caseInput = buildPreset('couette', { knudsen: '0.5', cellsY: '20', particlesPerCell: '50', transientSteps: '500', sampleSteps: '3000' });
  const t0 = performance.now();
  const run = runReplicaPool({
    caseInput,
    replicas,
    createReplica: browserReplicaFactory(),
    onProgress: (p) => {
      const live = p.replicas.filter((r) => r !== undefined);
      if (live.length) onFraction(live.reduce((s, r) => s + r!.stepsDone / r!.totalSteps, 0) / replicas);
    },
  });
  const outcome = await run.done;
  const seconds = (performance.now() - t0) / 1000;
  if (!outcome.merged) throw new Error(outcome.replicas.map((r) => `replica ${r.stream}: ${r.status} ${r.reason ?? ''}`).join('; '));
  const result = summarizeSamples(outcome.merged);
  const particleSteps = outcome.replicas.reduce((s, r) => s + r.particleSteps, 0);
  return {
    replicas,
    completed: outcome.replicas.filter((r) => r.status === 'completed').length,
    seconds,
    shearStressPa: result.walls.bottom!.shearStress,
    particleStepsPerSecond: particleSteps / seconds,
  };
}
