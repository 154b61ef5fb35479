import { describe, expect, it } from 'vitest';
import { estimateRemaining, evaluateStop, parseTarget, relativeHalfWidthOf } from '../../engine/stats/stopping';

describe('parseTarget()', () => {
  it("parseTarget('walls.top.shearStress=0.01') is that path with a relative half-width of 0.01", () => {
    expect(parseTarget('walls.top.shearStress=0.01')).toEqual({
      path: 'walls.top.shearStress',
      relativeHalfWidth: 0.01,
    });
  });

  it('accepts a percentage and spaces around the parts', () => {
    expect(parseTarget(' walls.top.heatFlux = 2.5% ')).toEqual({
      path: 'walls.top.heatFlux',
      relativeHalfWidth: 0.025,
    });
    expect(parseTarget('massFlow=1')).toEqual({ path: 'massFlow', relativeHalfWidth: 1 });
  });

  it('refuses malformed targets with a message naming the wrong part', () => {
    expect(() => parseTarget('walls.top.shearStress')).toThrow(/expected QUANTITY=RELATIVE_HALF_WIDTH/);
    expect(() => parseTarget('=0.01')).toThrow(/quantity before "=" is empty/);
    expect(() => parseTarget('walls..shearStress=0.01')).toThrow(/"" must start with a letter/);
    expect(() => parseTarget('walls.2top.shearStress=0.01')).toThrow(/"2top" must start with a letter/);
    expect(() => parseTarget('walls.top.shearStress=')).toThrow(/"" is not a number/);
    expect(() => parseTarget('walls.top.shearStress=abc')).toThrow(/"abc" is not a number/);
    expect(() => parseTarget('walls.top.shearStress=%')).toThrow(/"%" is not a number/);
    expect(() => parseTarget('walls.top.shearStress=0')).toThrow(/must be above 0 and at most 1/);
    expect(() => parseTarget('walls.top.shearStress=-0.01')).toThrow(/must be above 0 and at most 1/);
    expect(() => parseTarget('walls.top.shearStress=150%')).toThrow(/150% must be above 0 and at most 1/);
  });

  it('checks the path against known quantities when given, suggesting ones with the same last name', () => {
    const known = ['walls.top.shearStress', 'walls.bottom.shearStress', 'walls.top.heatFlux'];
    expect(parseTarget('walls.top.heatFlux=0.02', known).path).toBe('walls.top.heatFlux');
    expect(() => parseTarget('walls.upper.shearStress=0.01', known)).toThrow(
      /unknown quantity "walls.upper.shearStress"; did you mean: walls.top.shearStress, walls.bottom.shearStress/,
    );
    expect(() => parseTarget('walls.top.sheerStress=0.01', known)).toThrow(/known quantities: walls.top.shearStress, /);
  });
});

describe('evaluateStop()', () => {
  const target = { path: 'walls.top.shearStress', relativeHalfWidth: 0.01 };

  it('stops when ci95/|mean| reaches the target, also for a negative mean', () => {
    const d = evaluateStop({
      stepsDone: 500,
      maxSteps: 1e6,
      elapsedSeconds: 3,
      target,
      estimate: { mean: -2, ci95: 0.02 },
    });
    expect(d).toMatchObject({ stop: true, rule: 'target' });
    expect(d.reason).toBe('walls.top.shearStress reached its target: ±1.00 % ≤ ±1.00 % (95 %)');
  });

  it('continues while the target is not met and no budget is spent, saying where it stands', () => {
    const d = evaluateStop({
      stepsDone: 500,
      maxSteps: 1000,
      elapsedSeconds: 3,
      maxSeconds: 60,
      target,
      estimate: { mean: 2, ci95: 0.1 },
    });
    expect(d).toEqual({
      stop: false,
      rule: null,
      reason: 'continuing: walls.top.shearStress at ±5.00 %, target ±1.00 %; 500 of 1000 steps; 3.0 of 60 s',
    });
  });

  it('stops at the step budget, then the time budget, with the target progress in the reason', () => {
    const steps = evaluateStop({
      stepsDone: 1000,
      maxSteps: 1000,
      elapsedSeconds: 99,
      maxSeconds: 60,
      target,
      estimate: { mean: 2, ci95: 0.1 },
    });
    expect(steps).toMatchObject({ stop: true, rule: 'maxSteps' });
    expect(steps.reason).toBe(
      'step budget spent: 1000 of 1000 steps; walls.top.shearStress at ±5.00 %, target ±1.00 %',
    );
    const time = evaluateStop({ stepsDone: 10, maxSteps: 1000, elapsedSeconds: 60, maxSeconds: 60 });
    expect(time).toEqual({ stop: true, rule: 'maxSeconds', reason: 'time budget spent: 60.0 of 60 s' });
  });

  it('a target met at the same time as a budget is reported as the target', () => {
    const d = evaluateStop({
      stepsDone: 1000,
      maxSteps: 1000,
      elapsedSeconds: 0,
      target,
      estimate: { mean: 1, ci95: 0.001 },
    });
    expect(d.rule).toBe('target');
  });

  it('never meets a target without an estimate, with a zero mean or with a non-finite interval', () => {
    expect(evaluateStop({ stepsDone: 1, elapsedSeconds: 0, target }).reason).toBe(
      'continuing: walls.top.shearStress has no estimate yet',
    );
    const zero = evaluateStop({ stepsDone: 1, elapsedSeconds: 0, target, estimate: { mean: 0, ci95: 0 } });
    expect(zero.stop).toBe(false);
    expect(zero.reason).toContain('no finite relative half-width yet');
    expect(
      evaluateStop({ stepsDone: 1, elapsedSeconds: 0, target, estimate: { mean: 1, ci95: Number.NaN } }).stop,
    ).toBe(false);
    expect(relativeHalfWidthOf({ mean: 0, ci95: 1 })).toBe(Infinity);
  });

  it('without any rule it continues and says so', () => {
    expect(evaluateStop({ stepsDone: 1e9, elapsedSeconds: 1e9 })).toEqual({
      stop: false,
      rule: null,
      reason: 'continuing: no stopping rule set',
    });
  });
});

describe('estimateRemaining()', () => {
  // Expected values from half-width ∝ 1/sqrt(samples) (standard error of a mean; common practice):
  // total = samples × (current/target)².
  it('halving the half-width takes four times the samples: 3000 more after 1000', () => {
    expect(estimateRemaining(0.02, 0.01, 1000, 120)).toEqual({
      totalSamples: 4000,
      additionalSamples: 3000,
      additionalFraction: 3,
      additionalSeconds: 360,
    });
  });

  it('rounds up to whole samples and gives no time when none is known', () => {
    // (0.015/0.01)² × 10 = 22.5 → 23 samples.
    const r = estimateRemaining(0.015, 0.01, 10);
    expect(r.totalSamples).toBe(23);
    expect(r.additionalSamples).toBe(13);
    expect(r.additionalSeconds).toBeUndefined();
  });

  it('needs nothing more once the target is met', () => {
    expect(estimateRemaining(0.005, 0.01, 1000, 50)).toEqual({
      totalSamples: 1000,
      additionalSamples: 0,
      additionalFraction: 0,
      additionalSeconds: 0,
    });
  });

  it('refuses non-positive or non-finite inputs, naming them', () => {
    expect(() => estimateRemaining(0, 0.01, 10)).toThrow(/current relative half-width = 0/);
    expect(() => estimateRemaining(Infinity, 0.01, 10)).toThrow(/current relative half-width = Infinity/);
    expect(() => estimateRemaining(0.02, -1, 10)).toThrow(/target relative half-width = -1/);
    expect(() => estimateRemaining(0.02, 0.01, 0)).toThrow(/samples so far = 0/);
    expect(() => estimateRemaining(0.02, 0.01, 10, Number.NaN)).toThrow(/seconds so far = NaN/);
  });
});
