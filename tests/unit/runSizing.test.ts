// Run sizing (engine/sizing/runSizing.ts, headlineNoise.ts): the sampling chosen for a ±1 % headline, the cap, and
// the cases it leaves alone. The noise formulas themselves are checked against measured runs in
// engine/sizing/noiseCalibration.ts (figures there); here the arithmetic and the rules.
import { describe, expect, it } from 'vitest';
import { buildPreset } from '../../engine/case/presets';
import { planFromInput, type Plan } from '../../engine/plan/plan';
import { caseModelsOf } from '../../engine/continuum/caseModels';
import { sizeRun, sizedCase, sizingLines, type RunSizing } from '../../engine/sizing/runSizing';
import { expectedRelativeHalfWidth, headlineNoiseOf } from '../../engine/sizing/headlineNoise';
import { BOLTZMANN_J_PER_K } from '../../engine/physics/constants';

function planOf(preset: string, set: Record<string, string>, edit?: (c: Record<string, any>) => void): Plan {
  const input = buildPreset(preset, set) as Record<string, any>;
  edit?.(input);
  const p = planFromInput(input);
  if (!p.ok) throw new Error(p.errors.join('\n'));
  return p.plan;
}

function sized(plan: Plan, options = {}): RunSizing {
  const s = sizeRun(plan, caseModelsOf(plan), options);
  if (!s.sized) throw new Error(s.reason);
  return s;
}

describe('run sizing', () => {
  const tube = planOf('tube', { knudsen: '100' });

  it('sizes a duct that leaves its sampling open: steps for ±1 %, whole batches, within the cap', () => {
    const s = sized(tube);
    expect(s.applied).toBe(true);
    expect(s.path).toBe('flow.massFlowRate');
    const batch = Math.max(10, Math.ceil(s.sampleSteps / 8192));
    expect(s.sampleSteps % batch).toBe(0);
    expect(s.sampleSteps).toBeGreaterThanOrEqual(s.stepsForTarget);
    expect(s.sampleSteps - s.stepsForTarget).toBeLessThan(2 * batch);
    // At the steps for the target the expected half-width is the target (error ∝ 1/√steps).
    const noise = headlineNoiseOf(tube, caseModelsOf(tube));
    if (!noise.sized) throw new Error(noise.reason);
    expect(expectedRelativeHalfWidth(noise, s.stepsForTarget * tube.timeStepS)).toBeCloseTo(0.01, 4);
    expect(s.capAllows).toBe(s.secondsForTarget <= 300);
  });

  it('free-molecular tube: expected flow is the long-tube flow in series with the entrance (below both)', () => {
    const noise = headlineNoiseOf(tube, caseModelsOf(tube));
    if (!noise.sized) throw new Error(noise.reason);
    const c = tube.caseData;
    const r = c.flowReport!;
    const left = c.boundaries.left as { pressurePa: number };
    const right = c.boundaries.right as { pressurePa: number };
    const m = tube.gas.model.massKg;
    const entrance =
      Math.PI *
      r.sizeM ** 2 *
      (left.pressurePa - right.pressurePa) *
      Math.sqrt(m / (2 * Math.PI * BOLTZMANN_J_PER_K * tube.reference.temperatureK));
    const w = noise.expectedMean / entrance;
    // Series combination for L/R = 5: 1/(1 + 3L/(8R)) = 0.348 with the long-tube free-molecular 8R/(3L) (common
    // practice, no source); the unified model is a little below the free-molecular limit at Kn 100.
    expect(w).toBeGreaterThan(0.3);
    expect(w).toBeLessThan(1 / (1 + 15 / 8) + 1e-3);
  });

  it('a short cap shortens the run and says the target is out of reach', () => {
    const s = sized(tube, { capSeconds: 5 });
    expect(s.capAllows).toBe(false);
    expect(s.sampleSteps).toBeLessThan(s.stepsForTarget);
    expect(s.expectedSeconds).toBeLessThanOrEqual(5 * 1.01 + (tube.batchSteps * tube.initialParticles) / 1e7);
    expect(s.expectedRelativeHalfWidth).toBeGreaterThan(0.01);
    expect(sizingLines(s).join('\n')).toMatch(/cap does not allow the target: it needs \d+ steps/);
  });

  it('more replicas share the sampling: each samples about 1/R of the steps', () => {
    const one = sized(tube);
    const two = sized(tube, { replicas: 2 });
    expect(two.stepsForTarget).toBeGreaterThanOrEqual(Math.floor(one.stepsForTarget / 2));
    expect(two.stepsForTarget).toBeLessThanOrEqual(Math.ceil(one.stepsForTarget / 2) + 1);
  });

  it('a case that fixes sampling.sampleSteps runs them: sizing shown, not applied', () => {
    const fixed = planOf('tube', { knudsen: '100', sampleSteps: '4000' });
    const s = sized(fixed);
    expect(s.applied).toBe(false);
    expect(s.sampleSteps).toBe(fixed.sampleSteps);
    expect(s.notAppliedBecause).toMatch(/sampling\.sampleSteps/);
    expect(sizingLines(s)[0]).toMatch(/^not applied: the case fixes sampling\.sampleSteps/);
  });

  it('a run with a budget of its own keeps the planned sampling', () => {
    const s = sized(tube, { keepSamplingBecause: 'the run sets its own budget' });
    expect(s.applied).toBe(false);
    expect(s.sampleSteps).toBe(tube.sampleSteps);
  });

  it('the cavity (a profile headline) is not sized, and says why', () => {
    const cavity = planOf('cavity', {});
    const s = sizeRun(cavity, caseModelsOf(cavity));
    expect(s.sized).toBe(false);
    if (!s.sized) expect(s.reason).toMatch(/profile/);
  });

  it('the sized case records its sampling, and plans to the same steps', () => {
    const s = sized(tube);
    const again = planFromInput(sizedCase(tube.caseData, s));
    expect(again.ok && again.plan.sampleSteps).toBe(s.sampleSteps);
  });

  it('refuses a target or cap that is not a positive number, naming it', () => {
    expect(() => sizeRun(tube, caseModelsOf(tube), { capSeconds: 0 })).toThrow(/time cap/);
    expect(() => sizeRun(tube, caseModelsOf(tube), { targetRelativeHalfWidth: 2 })).toThrow(/target relative/);
  });
});
