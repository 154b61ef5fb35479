import { describe, expect, it } from 'vitest';
import {
  createBatchStore,
  addToBatches,
  totalOf,
  batchView,
  batchSteps,
  storedSteps,
} from '../../engine/stats/doublingBatches';
import { batchListOf, coarsenBatchList, mergeBatchLists } from '../../engine/stats/batchList';

const UNIT_STEPS = 10;

/** A store fed `units` base units; each unit holds (unitSteps, replica marker) so batches show what they contain. */
function fedStore(units: number, marker: number) {
  const store = createBatchStore(2, UNIT_STEPS);
  for (let u = 0; u < units; u++) addToBatches(store, Float64Array.of(UNIT_STEPS, marker));
  return store;
}

describe('batch lists', () => {
  it('coarsenBatchList() joins pairs as the doubling store does: equal batch steps, no sample lost', () => {
    const list = batchListOf(fedStore(100, 1)); // 25 batches of 4 units
    expect([list.batches, list.batchLength]).toEqual([25, 4]);
    const coarse = coarsenBatchList(list, 16);
    expect([coarse.batches, coarse.batchLength, coarse.pendingLength]).toEqual([6, 16, 4]);
    for (let b = 0; b < coarse.batches; b++) expect(batchView(coarse, b)[0]).toBe(batchSteps(coarse));
    expect(storedSteps(coarse)).toBe(100 * UNIT_STEPS);
    expect(Array.from(totalOf(coarse))).toEqual(Array.from(totalOf(list)));
    expect(coarsenBatchList(list, 4)).toBe(list);
    expect(() => coarsenBatchList(list, 12)).toThrow(/power of two/);
    expect(() => coarsenBatchList(list, 2)).toThrow(/power of two/);
  });

  it('mergeBatchLists() never joins batches of two replicas and may hold more than FIELD_BATCH_CAPACITY batches', () => {
    // Replica markers 1, 2, 4: a batch of one replica holds marker × its units; a mixed batch could not.
    const lists = [batchListOf(fedStore(100, 1)), batchListOf(fedStore(37, 2)), batchListOf(fedStore(63, 4))];
    const merged = mergeBatchLists(lists);
    expect(merged.batchLength).toBe(4);
    expect(merged.segments).toEqual([25, 9, 15]);
    expect(merged.batches).toBe(49); // more than FIELD_BATCH_CAPACITY = 32
    let b = 0;
    merged.segments.forEach((n, r) => {
      for (let k = 0; k < n; k++, b++) expect(batchView(merged, b)[1]).toBe([1, 2, 4][r] * merged.batchLength);
    });
    expect(storedSteps(merged)).toBe(200 * UNIT_STEPS);
    expect(totalOf(merged)[1]).toBe(100 * 1 + 37 * 2 + 63 * 4);
    // Associative: merging in two steps gives the same batches.
    const twoSteps = mergeBatchLists([mergeBatchLists(lists.slice(0, 2)), lists[2]]);
    expect(Array.from(twoSteps.values)).toEqual(Array.from(merged.values));
    expect(twoSteps.segments).toEqual(merged.segments);
  });

  it('mergeBatchLists() refuses lists of different shapes', () => {
    const a = batchListOf(createBatchStore(2, 10));
    const b = batchListOf(createBatchStore(3, 10));
    expect(() => mergeBatchLists([a, b])).toThrow(/cannot merge batches of 3 numbers/);
    expect(() => mergeBatchLists([])).toThrow(/nothing to merge/);
  });
});
