/**
 * Merges the samples of independent replicas of one case (same case, different random streams or seeds) into one
 * SampleSet whose estimates combine all of them. The inputs are not changed, so each replica's own result stays
 * available (summarizeSamples of that replica's set).
 *
 * - Cell and wall-bin batches: each replica's batches are brought to the longest batch length among the sets (pairs
 *   joined, as the doubling store does), then all complete batches are concatenated; a replica with fewer samples may
 *   then contribute fewer batches. Batches of different replicas are never joined (see stats/batchList.ts).
 * - Integral series: kept per replica; summarizeSamples analyses each and combines them.
 * - Sums not yet in a complete batch, and the counters, are added.
 * Merging is associative and, up to rounding, order-independent: merge(merge(a, b), c) has the same estimates as
 * merge(a, b, c) and merge(c, b, a).
 */
import { caseDifferences } from '../case/caseDifferences';
import { mergeBatchLists } from '../stats/batchList';
import { geometryDifferences } from '../kernel/samplingGeometry';
import type { SampleCounters, SampleSet } from './sampleSet';

/** Case fields in which replicas may differ: the seed (replicas of one seed differ in their stream instead). */
export const REPLICA_FREE_CASE_FIELDS = ['seed'] as const;

function checkSameCase(sets: readonly SampleSet[]): void {
  const first = sets[0];
  sets.forEach((s, i) => {
    if (i === 0) return;
    const where = `cannot merge sample set ${i + 1} with set 1`;
    const differs = caseDifferences(first.plan.caseData, s.plan.caseData, REPLICA_FREE_CASE_FIELDS);
    if (differs.length)
      throw new Error(
        `${where}: they are runs of different cases (only the seed may differ):\n  ${differs.join('\n  ')}`,
      );
    const geometry = geometryDifferences(first.geometry, s.geometry);
    if (geometry.length)
      throw new Error(
        `${where}: the same case was planned differently (another version of Tenuis?): ${geometry.join('; ')}`,
      );
    if (s.plan.batchSteps !== first.plan.batchSteps)
      throw new Error(`${where}: base batches of ${s.plan.batchSteps} and ${first.plan.batchSteps} steps`);
    const keys = (set: SampleSet) => [...set.series.keys()].sort().join(', ');
    if (s.wallNames.join() !== first.wallNames.join() || keys(s) !== keys(first)) {
      throw new Error(`${where}: they sampled different walls or quantities (${keys(s)} vs ${keys(first)})`);
    }
  });
}

function sameValues(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) return false;
  return true;
}

/**
 * Refuses a replica that appears twice (the same random stream run twice, or one file given twice): its samples
 * would count double and the error bars would shrink without cause. Two replicas count as the same when every wall
 * series is identical and not all zero — independent streams never give that. Cases without walls are not checked.
 */
function checkDistinctReplicas(sets: readonly SampleSet[]): void {
  const keys = [...sets[0].series.keys()];
  if (keys.length === 0) return;
  const seen = new Map<string, { set: number; replica: number }[]>();
  sets.forEach((s, i) => {
    const firstSeries = s.series.get(keys[0])!;
    firstSeries.forEach((values, r) => {
      if (values.length === 0) return;
      const tag = `${values.length}:${values[0]}:${values[values.length - 1]}`;
      const candidates = seen.get(tag) ?? [];
      for (const c of candidates) {
        const other = sets[c.set];
        const same = keys.every((k) => sameValues(s.series.get(k)![r], other.series.get(k)![c.replica]));
        const anyNonZero = keys.some((k) => s.series.get(k)![r].some((v) => v !== 0));
        if (same && anyNonZero) {
          throw new Error(
            `cannot merge: sample set ${c.set + 1} (replica ${c.replica + 1}) and set ${i + 1} (replica ${r + 1}) hold the same samples — ` +
              'the same random stream was run twice, or the same file was given twice; give each replica its own stream or seed',
          );
        }
      }
      candidates.push({ set: i, replica: r });
      seen.set(tag, candidates);
    });
  });
}

function addArrays(arrays: readonly Float64Array[]): Float64Array {
  const out = new Float64Array(arrays[0].length);
  for (const a of arrays) for (let k = 0; k < out.length; k++) out[k] += a[k];
  return out;
}

function addCounters(all: readonly SampleCounters[]): SampleCounters {
  const sum = (f: (c: SampleCounters) => number) => all.reduce((s, c) => s + f(c), 0);
  return {
    steps: sum((c) => c.steps),
    sampledSteps: sum((c) => c.sampledSteps),
    particles: sum((c) => c.particles),
    particleSteps: sum((c) => c.particleSteps),
    collisionCount: sum((c) => c.collisionCount),
    separationSum: sum((c) => c.separationSum),
  };
}

/**
 * One SampleSet holding all the given sets' samples (see the file comment). Throws, naming what differs, when the
 * sets are not replicas of one case, and when one replica appears twice.
 */
export function mergeSampleSets(sets: readonly SampleSet[]): SampleSet {
  if (sets.length === 0) throw new Error('cannot merge: no sample sets given');
  checkSameCase(sets);
  checkDistinctReplicas(sets);
  const first = sets[0];
  const series = new Map<string, Float64Array[]>();
  for (const key of first.series.keys())
    series.set(
      key,
      sets.flatMap((s) => s.series.get(key)!.map((v) => v.slice())),
    );
  return {
    plan: first.plan,
    geometry: first.geometry,
    wallNames: [...first.wallNames],
    cellStore: mergeBatchLists(sets.map((s) => s.cellStore)),
    wallStore: mergeBatchLists(sets.map((s) => s.wallStore)),
    series,
    pendingCellSums: addArrays(sets.map((s) => s.pendingCellSums)),
    pendingWallSums: addArrays(sets.map((s) => s.pendingWallSums)),
    pendingSteps: sets.reduce((n, s) => n + s.pendingSteps, 0),
    counters: addCounters(sets.map((s) => s.counters)),
    replicas: sets.reduce((n, s) => n + s.replicas, 0),
    seeds: sets.flatMap((s) => s.seeds),
  };
}
