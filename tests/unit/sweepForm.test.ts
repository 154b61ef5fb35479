// The browser's sweep form (app/sweep/sweepForm.ts): the same rules as `tenuis sweep`, each message naming its field.
import { describe, expect, it } from 'vitest';
import { readSweepForm } from '../../app/sweep/sweepForm';
import type { SweepFormState } from '../../app/sweep/sweepForm';
import { convertToSI, PA_PER_TORR } from '../../engine/units/engineeringUnits';

const form = (patch: Partial<SweepFormState>): SweepFormState => ({
  parameter: 'knudsen',
  fromText: '0.1',
  toText: '10',
  pressureUnit: 'Pa',
  pointsText: '5',
  spacing: 'log',
  quantity: 'flow.massFlowRate',
  ...patch,
});

describe('readSweepForm()', () => {
  it("reads a Knudsen sweep as it is and a pressure sweep into Pa with the engine's units", () => {
    expect(readSweepForm(form({}), convertToSI)).toEqual({
      ok: true,
      request: { parameter: 'knudsen', from: 0.1, to: 10, points: 5, spacing: 'log' },
    });
    const p = readSweepForm(
      form({
        parameter: 'pressure',
        fromText: '0.2',
        toText: '8',
        pressureUnit: 'mbar',
        pointsText: '4',
        spacing: 'linear',
      }),
      convertToSI,
    );
    expect(p).toEqual({
      ok: true,
      request: { parameter: 'pressure', from: 20, to: 800, points: 4, spacing: 'linear' },
    });
    const t = readSweepForm(
      form({ parameter: 'pressure', fromText: '1', toText: '2', pressureUnit: 'Torr' }),
      convertToSI,
    );
    expect(t.ok && [t.request.from, t.request.to]).toEqual([PA_PER_TORR, 2 * PA_PER_TORR]);
  });

  it('refuses ends at or below 0 or not numbers, points outside 1 to 999, and equal ends, naming the field', () => {
    const r = readSweepForm(form({ fromText: '0', toText: 'ten', pointsText: '2.5' }), convertToSI);
    expect(r).toEqual({
      ok: false,
      errors: {
        from: 'from: give a Knudsen number above 0, not “0”',
        to: 'to: give a Knudsen number above 0, not “ten”',
        points: 'points: give a whole number from 1 to 999, not “2.5”',
      },
    });
    expect(
      readSweepForm(form({ parameter: 'pressure', pressureUnit: 'mbar', fromText: '-1' }), convertToSI),
    ).toMatchObject({ ok: false, errors: { from: 'from: give a pressure in mbar above 0, not “-1”' } });
    expect(readSweepForm(form({ pointsText: '1000' }), convertToSI)).toMatchObject({
      ok: false,
      errors: { points: expect.stringMatching(/^points: give a whole number from 1 to 999/) },
    });
    expect(readSweepForm(form({ fromText: '2', toText: '2', pointsText: '3' }), convertToSI)).toMatchObject({
      ok: false,
      errors: { to: 'to: the same as from; give two different ends, or 1 point' },
    });
    expect(readSweepForm(form({ fromText: '2', toText: '2', pointsText: '1' }), convertToSI).ok).toBe(true);
  });
});
