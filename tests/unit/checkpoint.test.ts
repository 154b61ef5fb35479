/**
 * A checkpointed and resumed run gives exactly the result of the uninterrupted run (bit for bit), for a gas with
 * rotation and non-diffuse walls; damaged checkpoints are refused with a message.
 */
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { planOrThrow } from '../support/planOrThrow';
import { createSimulation, advance } from '../../engine/simulation';
import { summarize } from '../../engine/results/summarize';
import { encodeCheckpoint, decodeCheckpoint } from '../../engine/io/checkpoint';

function nitrogenCouette() {
  const input = buildPreset('couette', { gas: 'N2', model: 'VSS', knudsen: '0.3', cellsY: '12', particlesPerCell: '25', transientSteps: '300', sampleSteps: '1200', seed: '21' });
  const b = input.boundaries as Record<string, Record<string, unknown>>;
  b.top = { ...b.top, model: 'cercignaniLampis', normalAccommodation: 0.7, tangentialAccommodation: 0.8 };
  return planOrThrow(input);
}

describe('checkpoints', () => {
  it('resume gives exactly the uninterrupted result, whether saved in the transient or while sampling', () => {
    const plan = nitrogenCouette();
    const total = plan.transientSteps + plan.sampleSteps;
    const straight = createSimulation(plan, { stream: 3 });
    advance(straight, total);
    const expected = JSON.stringify(summarize(straight), (_, v) => (ArrayBuffer.isView(v) ? Array.from(v as Float64Array) : v));
    for (const stopAt of [137, 777]) {
      const first = createSimulation(plan, { stream: 3 });
      advance(first, stopAt);
      const saved = encodeCheckpoint(first, 3);
      const { sim, stream } = decodeCheckpoint(saved.slice(0));
      expect(stream).toBe(3);
      advance(sim, total - stopAt);
      const got = JSON.stringify(summarize(sim), (_, v) => (ArrayBuffer.isView(v) ? Array.from(v as Float64Array) : v));
      expect(got).toBe(expected);
    }
  });

  it('refuses a file that is not a checkpoint, a future version and a truncated one', () => {
    const plan = nitrogenCouette();
    const sim = createSimulation(plan);
    advance(sim, 50);
    const good = encodeCheckpoint(sim, 0);
    expect(() => decodeCheckpoint(new ArrayBuffer(64))).toThrow(/not a checkpoint/);
    const future = good.slice(0);
    new DataView(future).setUint32(8, 99, true);
    expect(() => decodeCheckpoint(future)).toThrow(/version 99/);
    expect(() => decodeCheckpoint(good.slice(0, good.byteLength - 100))).toThrow(/truncated/);
  });
});
