import { describe, expect, it } from 'vitest';
import {
  createBatchStore,
  addToBatches,
  totalOf,
  batchView,
  batchSteps,
  storedSteps,
  FIELD_BATCH_CAPACITY,
} from '../../engine/stats/doublingBatches';

describe('doubling batch store', () => {
  it('keeps between capacity/2 and capacity batches, each exactly batchSteps() long, and loses no sample', () => {
    const unitSteps = 7;
    const store = createBatchStore(2, unitSteps);
    let total0 = 0;
    for (let u = 1; u <= 1000; u++) {
      // One unit of sums: "count" = unitSteps (so each batch's count equals its length in steps) and a value.
      addToBatches(store, Float64Array.of(unitSteps, u));
      total0 += u;
      if (store.batches > 0) {
        expect(store.batches).toBeLessThan(FIELD_BATCH_CAPACITY);
        for (let b = 0; b < store.batches; b++) expect(batchView(store, b)[0]).toBe(batchSteps(store));
      }
    }
    expect(store.batches).toBeGreaterThanOrEqual(FIELD_BATCH_CAPACITY / 2);
    expect(storedSteps(store)).toBe(1000 * unitSteps);
    const total = totalOf(store);
    expect(total[0]).toBe(1000 * unitSteps);
    expect(total[1]).toBe(total0);
  });
});
