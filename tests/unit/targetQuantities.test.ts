/**
 * Precision-target names shared by `tenuis run --target` and the workbench: which paths a case offers, reading them
 * from a result, and the run panel's goal text. The names are summary.json's own (project convention, no source).
 */
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { planOrThrow } from '../support/planOrThrow';
import { estimateAt, targetPathsOf } from '../../engine/results/targetQuantities';
import { targetRequestOf } from '../../app/run/targetSetting';
import type { SimulationResult } from '../../engine/results/summarize';

describe('target paths of a plan', () => {
  it("a Couette gap offers each wall's quantities and no flow numbers", () => {
    const paths = targetPathsOf(planOrThrow(buildPreset('couette', {})));
    expect(paths).toContain('walls.top.shearStress');
    expect(paths).toContain('walls.bottom.heatFlux');
    expect(paths.some((p) => p.startsWith('flow.'))).toBe(false);
  });

  it("a channel between vessels offers the flow numbers and each section's mass flow rate", () => {
    const paths = targetPathsOf(planOrThrow(buildPreset('channel', {})));
    expect(paths).toContain('flow.massFlowRate');
    expect(paths).toContain('flow.conductance');
    expect(paths).toContain('flow.sections.outlet.massFlowRate');
  });
});

describe('estimateAt', () => {
  const result = {
    walls: { 'plate.left': { shearStress: { mean: 2, ci95: 0.1 } }, top: { heatFlux: { mean: -5, ci95: 0.5 } } },
    flow: { values: { massFlowRate: { mean: 1e-6, ci95: 2e-8 } }, sections: { outlet: { mean: 9e-7, ci95: 3e-8 } } },
  } as unknown as SimulationResult;

  it('reads walls whose names hold dots, flow numbers and sections', () => {
    expect(estimateAt(result, 'walls.plate.left.shearStress')).toEqual({ mean: 2, ci95: 0.1 });
    expect(estimateAt(result, 'walls.top.heatFlux')).toEqual({ mean: -5, ci95: 0.5 });
    expect(estimateAt(result, 'flow.massFlowRate')).toEqual({ mean: 1e-6, ci95: 2e-8 });
    expect(estimateAt(result, 'flow.sections.outlet.massFlowRate')).toEqual({ mean: 9e-7, ci95: 3e-8 });
  });

  it('is undefined for a path the result does not hold', () => {
    expect(estimateAt(result, 'walls.bottom.shearStress')).toBeUndefined();
    expect(estimateAt(result, 'flow.sections.inlet.massFlowRate')).toBeUndefined();
  });
});

describe("the run panel's target setting", () => {
  const known = ['walls.top.shearStress', 'flow.massFlowRate'];

  it('no quantity, or one this case does not have, means no target', () => {
    expect(targetRequestOf({ path: '', goalPercent: 'x', stopWhenReached: true }, known)).toEqual({
      ok: true,
      request: undefined,
    });
    expect(targetRequestOf({ path: 'walls.left.heatFlux', goalPercent: '2', stopWhenReached: false }, known)).toEqual({
      ok: true,
      request: undefined,
    });
  });

  it('a goal in percent becomes a relative half-width', () => {
    expect(
      targetRequestOf({ path: 'flow.massFlowRate', goalPercent: ' 2.5 % ', stopWhenReached: true }, known),
    ).toEqual({
      ok: true,
      request: { path: 'flow.massFlowRate', relativeHalfWidth: 0.025, stopWhenReached: true },
    });
  });

  it('a goal that is not a number or outside (0, 100] is refused with what is allowed', () => {
    const notNumber = targetRequestOf({ path: 'flow.massFlowRate', goalPercent: 'two', stopWhenReached: false }, known);
    expect(notNumber.ok ? '' : notNumber.message).toMatch(/not a number.*percentage/);
    for (const goal of ['0', '-1', '150']) {
      const r = targetRequestOf({ path: 'flow.massFlowRate', goalPercent: goal, stopWhenReached: false }, known);
      expect(r.ok ? '' : r.message).toMatch(/above 0 and at most 100/);
    }
  });
});
