/**
 * Batch means for large fields (every cell or wall bin × every raw sum) in fixed memory.
 *
 * The store keeps between CAPACITY/2 and CAPACITY complete batches of equal length. When it fills, neighbouring
 * batches are merged pairwise and the batch length doubles. So however long a run is, its field estimates rest on
 * 16–32 batches whose length grows with the run — long enough, once the run is long, to make batch means nearly
 * independent (the batch length is checked against the integral quantities' correlation time in the report).
 * Raw sums, not derived values, are stored, so ratio quantities (velocity, temperature) are formed per batch
 * (batch-level ratios) and the merge is exact.
 */

export const FIELD_BATCH_CAPACITY = 32;

/**
 * What estimates read from batch sums: complete batches of equal length (any number of them) and the sums not in a
 * complete batch. Both the doubling store below and a merged BatchList (stats/batchList.ts) are BatchSums.
 */
export interface BatchSums {
  /** Numbers per batch (e.g. cells × raw sums). */
  readonly width: number;
  /** Complete batches, batch-major: values[b * width + k]; may be longer than batches × width. */
  readonly values: Float64Array;
  readonly batches: number;
  /** Steps in one base unit (one call of addToBatches). */
  readonly unitSteps: number;
  /** Base units per complete batch. */
  readonly batchLength: number;
  /** Sums of the base units not in a complete batch, and how many units they hold. */
  readonly pending: Float64Array;
  readonly pendingLength: number;
}

export interface DoublingBatchStore extends BatchSums {
  values: Float64Array;
  batches: number;
  batchLength: number;
  /** The batch being filled, and how many base units it holds (always fewer than batchLength). */
  pending: Float64Array;
  pendingLength: number;
}

export function createBatchStore(width: number, unitSteps: number): DoublingBatchStore {
  return {
    width,
    unitSteps,
    values: new Float64Array(FIELD_BATCH_CAPACITY * width),
    batches: 0,
    batchLength: 1,
    pending: new Float64Array(width),
    pendingLength: 0,
  };
}

/**
 * Adds one base unit (unitSteps steps) of sums to the pending batch, closing it when it reaches the batch length.
 * Counting whole units keeps every complete batch exactly batchLength × unitSteps steps long.
 */
export function addToBatches(store: DoublingBatchStore, sums: Float64Array): void {
  const p = store.pending;
  const w = store.width;
  for (let k = 0; k < w; k++) p[k] += sums[k];
  store.pendingLength += 1;
  if (store.pendingLength < store.batchLength) return;
  store.values.set(p, store.batches * w);
  store.batches++;
  p.fill(0);
  store.pendingLength = 0;
  if (store.batches === FIELD_BATCH_CAPACITY) mergePairs(store);
}

function mergePairs(store: DoublingBatchStore): void {
  const w = store.width;
  const v = store.values;
  const half = store.batches >> 1;
  for (let b = 0; b < half; b++) {
    const a = 2 * b * w;
    const c = (2 * b + 1) * w;
    const o = b * w;
    for (let k = 0; k < w; k++) v[o + k] = v[a + k] + v[c + k];
  }
  v.fill(0, half * w);
  store.batches = half;
  store.batchLength *= 2;
}

/** Sum over every complete batch and the pending one: the run's total, for the mean. */
export function totalOf(store: BatchSums): Float64Array {
  const w = store.width;
  const out = Float64Array.from(store.pending);
  for (let b = 0; b < store.batches; b++) {
    const o = b * w;
    for (let k = 0; k < w; k++) out[k] += store.values[o + k];
  }
  return out;
}

/** Steps in each complete batch. */
export function batchSteps(store: BatchSums): number {
  return store.batchLength * store.unitSteps;
}

/** Steps in all complete batches and the pending one. */
export function storedSteps(store: BatchSums): number {
  return (store.batches * store.batchLength + store.pendingLength) * store.unitSteps;
}

/** View of complete batch b. */
export function batchView(store: BatchSums, b: number): Float64Array {
  return store.values.subarray(b * store.width, (b + 1) * store.width);
}
