/**
 * A plain, finished list of complete batches of equal length, detached from a running store, from one replica or
 * merged from several: what field estimates read once sampling is over (results/sampleSet.ts).
 *
 * Unlike the doubling store (doublingBatches.ts) it never grows and may hold any number of batches; its pending part
 * may hold more than one batch length (the remainders of several replicas, which are never joined into a batch: a
 * batch must be one stretch of one replica's time). It is not to be fed to addToBatches.
 *
 * Replicas keep their own run of batches, recorded in `segments`, so that coarsening (joining neighbouring pairs, as
 * the doubling store does when it fills) never joins batches of two replicas. That makes merging associative:
 * merging (a, b) and then c gives the same batches as merging a, b and c at once.
 */
import type { BatchSums } from './doublingBatches';

export interface BatchList extends BatchSums {
  /** Exactly batches × width numbers. */
  readonly values: Float64Array;
  /** Complete batches of each replica, in the order of `values`; they add up to `batches`. */
  readonly segments: readonly number[];
}

/** A detached copy of batch sums (e.g. a live doubling store): one segment. */
export function batchListOf(sums: BatchSums): BatchList {
  return {
    width: sums.width,
    unitSteps: sums.unitSteps,
    batchLength: sums.batchLength,
    batches: sums.batches,
    values: sums.values.slice(0, sums.batches * sums.width),
    pending: Float64Array.from(sums.pending),
    pendingLength: sums.pendingLength,
    segments: [sums.batches],
  };
}

/** Joins neighbouring pairs of batches within each segment; a segment's odd last batch moves to the pending sums. */
function halve(list: BatchList): BatchList {
  const w = list.width;
  const pending = Float64Array.from(list.pending);
  let pendingLength = list.pendingLength;
  const segments = list.segments.map((n) => n >> 1);
  const values = new Float64Array(segments.reduce((s, n) => s + n, 0) * w);
  const v = list.values;
  let from = 0;
  let to = 0;
  for (const n of list.segments) {
    for (let b = 0; b + 1 < n; b += 2) {
      const a = (from + b) * w;
      const c = a + w;
      for (let k = 0; k < w; k++) values[to + k] = v[a + k] + v[c + k];
      to += w;
    }
    if (n % 2 === 1) {
      const a = (from + n - 1) * w;
      for (let k = 0; k < w; k++) pending[k] += v[a + k];
      pendingLength += list.batchLength;
    }
    from += n;
  }
  const batches = to / w;
  return {
    width: w,
    unitSteps: list.unitSteps,
    batchLength: list.batchLength * 2,
    batches,
    values,
    pending,
    pendingLength,
    segments,
  };
}

/**
 * The list with batches `batchLength` base units long, which must be the list's batch length times a power of two:
 * pairs joined as often as needed, exactly as the doubling store joins them. Returns the list itself if it already
 * has that length.
 */
export function coarsenBatchList(list: BatchList, batchLength: number): BatchList {
  const ratio = batchLength / list.batchLength;
  if (!(Number.isInteger(ratio) && ratio >= 1 && (ratio & (ratio - 1)) === 0)) {
    throw new Error(
      `batch lists: cannot coarsen batches of ${list.batchLength} units to ${batchLength} units (need the same length times a power of two)`,
    );
  }
  let out = list;
  while (out.batchLength < batchLength) out = halve(out);
  return out;
}

/**
 * Merges lists of the same width and base unit: each coarsened to the longest batch length among them, then their
 * complete batches concatenated (segments kept) and their pending sums added. A list with fewer samples may end up
 * with fewer batches. Throws for no lists or for lists that do not match.
 */
export function mergeBatchLists(lists: readonly BatchList[]): BatchList {
  if (lists.length === 0) throw new Error('batch lists: nothing to merge');
  const first = lists[0];
  for (const l of lists) {
    if (l.width !== first.width || l.unitSteps !== first.unitSteps) {
      throw new Error(
        `batch lists: cannot merge batches of ${l.width} numbers × ${l.unitSteps} steps with ${first.width} numbers × ${first.unitSteps} steps`,
      );
    }
  }
  const batchLength = Math.max(...lists.map((l) => l.batchLength));
  const coarse = lists.map((l) => coarsenBatchList(l, batchLength));
  const w = first.width;
  const batches = coarse.reduce((s, l) => s + l.batches, 0);
  const values = new Float64Array(batches * w);
  const pending = new Float64Array(w);
  let pendingLength = 0;
  let at = 0;
  for (const l of coarse) {
    values.set(l.values, at);
    at += l.values.length;
    for (let k = 0; k < w; k++) pending[k] += l.pending[k];
    pendingLength += l.pendingLength;
  }
  return {
    width: w,
    unitSteps: first.unitSteps,
    batchLength,
    batches,
    values,
    pending,
    pendingLength,
    segments: coarse.flatMap((l) => l.segments),
  };
}
