/**
 * A checkpointed and resumed run gives exactly the result of the uninterrupted run (bit for bit), for a gas with
 * rotation and non-diffuse walls; damaged checkpoints are refused with a message.
 */
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { planOrThrow } from '../support/planOrThrow';
import { createSimulation, advance, runToCompletion } from '../../engine/run/simulation';
import { encodeCheckpoint, decodeCheckpoint } from '../../engine/io/checkpoint';
import { summarize } from '../../engine/run/simulationSamples';

function nitrogenCouette(transient: 'fixed' | 'auto' = 'fixed') {
  const settings: Record<string, string> = {
    gas: 'N2',
    model: 'VSS',
    knudsen: '0.3',
    cellsY: '12',
    particlesPerCell: '25',
    sampleSteps: '1200',
    seed: '21',
  };
  if (transient === 'fixed') settings.transientSteps = '300';
  const input = buildPreset('couette', settings);
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
    const expected = JSON.stringify(summarize(straight), (_, v) =>
      ArrayBuffer.isView(v) ? Array.from(v as Float64Array) : v,
    );
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

  it('resume is exact also when saved while the automatic transient is still open', () => {
    const plan = nitrogenCouette('auto');
    expect(plan.transientMode).toBe('auto');
    const straight = createSimulation(plan, { stream: 1 });
    runToCompletion(straight);
    // The monitor decided: between its minimum (20 samples) and its maximum (200 samples).
    const every = straight.monitor!.every;
    expect(straight.transientEndStep).toBeGreaterThanOrEqual(20 * every);
    expect(straight.transientEndStep).toBeLessThanOrEqual(200 * every);
    const first = createSimulation(plan, { stream: 1 });
    advance(first, 10 * every + 3);
    expect(Number.isFinite(first.transientEndStep)).toBe(false);
    const { sim } = decodeCheckpoint(encodeCheckpoint(first, 1));
    runToCompletion(sim);
    expect(sim.transientEndStep).toBe(straight.transientEndStep);
    const text = (x: typeof sim) =>
      JSON.stringify(summarize(x), (_, v) => (ArrayBuffer.isView(v) ? Array.from(v as Float64Array) : v));
    expect(text(sim)).toBe(text(straight));
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
