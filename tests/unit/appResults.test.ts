/** Reading the engine's optional result sections for display: flow numbers and the continuum comparison. */
import { describe, expect, it } from 'vitest';
import { flowNumbersOf } from '../../app/results/flowNumbers';
import { comparisonView } from '../../app/results/comparisonView';
import type { SimulationResult } from '../../engine/results/summarize';
import type { ContinuumComparisonResult } from '../../engine/report/comparison';
import { estimateText, sig } from '../../app/format';

describe('flowNumbersOf()', () => {
  it('reads the engine FlowResult: values by name with the given units and the section and vessel pressures', () => {
    const result = {
      flow: {
        section: 'exit',
        sections: {},
        upstreamPressurePa: 200,
        downstreamPressurePa: 100,
        temperatureK: 300,
        values: { massFlowRate: { mean: 1e-9, ci95: 1e-11 }, conductance: { mean: 2e-3, ci95: 3e-5 } },
      },
    } as unknown as SimulationResult;
    const flow = flowNumbersOf(result, { massFlowRate: 'kg/s', conductance: 'm^3/s' });
    expect(flow.rows).toEqual([
      { name: 'massFlowRate', label: 'mass flow rate', mean: 1e-9, ci95: 1e-11, unit: 'kg/s' },
      { name: 'conductance', label: 'conductance', mean: 2e-3, ci95: 3e-5, unit: 'm^3/s' },
    ]);
    expect(flow.context).toBe('through section exit, upstream 200.0 Pa, downstream 100.0 Pa, 300.0 K');
  });

  it('shows nothing when the result has no flow sections (no made-up content)', () => {
    expect(flowNumbersOf({} as SimulationResult)).toMatchObject({ rows: [], context: null });
  });
});

describe('comparisonView()', () => {
  it('turns profiles into overlay curves (centrelines keep their line) and verdicts into rows with the model values', () => {
    const c = {
      recognised: true,
      predictions: {
        description: 'planar Couette flow',
        profiles: [
          {
            key: 'profile.velocityX',
            field: 'velocityX',
            unit: 'm/s',
            line: { kind: 'rows' },
            positionsM: Float64Array.of(1, 2),
            values: { noSlip: Float64Array.of(-1, 1) },
            scale: { kind: 'fixed', value: 2, what: 'U' },
          },
          {
            key: 'centerline.x.velocityX',
            field: 'velocityX',
            unit: 'm/s',
            line: { kind: 'column', atM: 0.5 },
            positionsM: Float64Array.of(1),
            values: { noSlip: Float64Array.of(0) },
            scale: { kind: 'fixed', value: 2, what: 'U' },
          },
        ],
      },
      continuum: { noSlip: { 'walls.top.shearStress': -1.5 } },
      units: {},
      verdict: {
        'walls.top.shearStress': {
          quantity: 'walls.top.shearStress',
          kind: 'integral',
          unit: 'Pa',
          status: 'adequate',
          text: 'no-slip adequate',
          models: [{ model: 'noSlip', status: 'adequate' }],
        },
      },
      profiles: {},
    } as unknown as ContinuumComparisonResult;
    const api = {
      MODEL_LABELS: { noSlip: 'no-slip' },
      verdictHeadline: () => ({
        quantity: 'walls.top.shearStress',
        text: 'For the wall shear stress, no-slip is the simplest adequate model.',
        halfWidthToDecide: 0,
        samplingFactor: 1,
        relativeHalfWidth: 0.01,
      }),
      extraTimeText: () => '',
    };
    const v = comparisonView(c, api)!;
    expect(v.headline).toEqual({
      text: 'For the wall shear stress, no-slip is the simplest adequate model.',
      status: 'adequate',
      time: '',
    });
    expect(v.curves).toEqual([
      { model: 'no-slip', quantity: 'velocityX', values: [-1, 1], y: [1, 2] },
      { model: 'no-slip', quantity: 'velocityX', values: [0], y: [1], line: { kind: 'column', atM: 0.5 } },
    ]);
    expect(v.verdicts).toEqual([
      {
        quantity: 'walls.top.shearStress',
        unit: 'Pa',
        status: 'adequate',
        text: 'no-slip adequate',
        values: [{ label: 'no-slip', value: -1.5 }],
        models: [{ label: 'no-slip', status: 'adequate' }],
      },
    ]);
    expect(comparisonView({ recognised: false, reason: 'not a known problem' }, null)).toEqual({
      recognised: false,
      description: 'not a known problem',
      curves: [],
      verdicts: [],
      headline: null,
    });
  });
});

describe('format', () => {
  it('estimateText() rounds the half-width to two digits and the mean to the same place', () => {
    expect(estimateText(63.712, 7.04)).toBe('63.7 ± 7.0');
    expect(estimateText(-0.012345, 0.00031)).toBe('-0.01235 ± 0.00031');
    expect(estimateText(1.193e26, 3.5e23)).toBe('1.193e+26 ± 3.5e+23');
    expect(estimateText(5, NaN)).toBe('5 ± —');
    expect(sig(0)).toBe('0');
  });
});
